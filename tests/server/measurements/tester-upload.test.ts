/**
 * A tester's per-part table uploaded to a batch with a saved profile: parts stored with what the table
 * carries (no spectrum), judged on it, the profile version recorded; a table that does not fit its
 * profile saves nothing and names the line; profiles refuse a stale edit and a name in use.
 * Tester values invented; the 3000 K target is the seeded revision's.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import { uploadMeasurements } from '../../../src/lib/server/measurements/upload';
import { batchResults } from '../../../src/lib/server/measurements/results';
import { createTesterProfile, getTesterProfile, updateTesterProfile } from '../../../src/lib/server/measurements/tester-profiles';
import { testerProfileSchema } from '../../../src/lib/tester-table/profile';
import type { User } from '../../../src/lib/server/accounts/users';
import { completedBatch, countRows, csvFile, demoUser } from './support';

let quality: User;
let b: Awaited<ReturnType<typeof completedBatch>>;
let profileId: number;
const name = `Line 2 tester ${Math.random().toString(36).slice(2, 7)}`;
const profile = testerProfileSchema.parse({
  name,
  headerLines: 1,
  delimiter: ';',
  decimalMark: ',',
  chromaticity: 'xy',
  columns: { label: 'Serial', x: 'x', y: 'y', ra: 'Ra', flux: 'Flux (mlm)' },
  fluxUnit: 'mlm',
  voltageUnit: 'V'
});

beforeAll(async () => {
  quality = await demoUser('quality');
  b = await completedBatch();
  profileId = await createTesterProfile(quality, profile);
});
afterAll(closeDb);

const table = (rows: string[]) => ['Tester T-7, lot export', 'Serial;x;y;Ra;Flux (mlm)', ...rows].join('\n');

describe('tester table upload', () => {
  it('stores the parts with what the table carries and judges them on it', async () => {
    const before = await countRows('part_measurements', { batch_id: b.batchId });
    const rows = Array.from(
      { length: 40 },
      (_, i) => `T${b.batchId}-${i + 1};0,43${38 + (i % 3)};0,40${30 - (i % 4)};${90 + (i % 5) / 2};118${i % 10}00`
    );
    const res = await uploadMeasurements(quality, b.batchId, { ...csvFile(table(rows), 't7.csv'), testerProfileId: profileId });
    expect(res.parts).toBe(40);
    expect(res.warnings[0]).toBe(`read with tester profile "${name}" (version 1)`);
    expect(await countRows('part_measurements', { batch_id: b.batchId })).toBe(before + 40);
    const upload = await db()('measurement_uploads').where({ id: res.uploadId }).first();
    expect(upload).toMatchObject({ source_kind: 'table', tester_profile_id: profileId, tester_profile_version: 1 });
    const view = (await batchResults(b.batchId))!;
    const part = view.parts.find((p) => p.label === `T${b.batchId}-1`)!;
    expect(part.metrics).toMatchObject({ source: 'table', x: 0.4338, y: 0.403, ra: 90, ler: null, rf: null, fluxLm: 118 });
    // The seeded revision has Ra ≥ 90 and R9 ≥ 50 floors: Ra is judged, R9 is not measured.
    expect(part.verdict.notMeasured).toContain('R9 ≥ 50: not measured');
    expect(part.verdict.failures.map((f) => f.code)).not.toContain('ra');
  });

  it('saves nothing when a row does not fit the profile, naming the line', async () => {
    const before = await countRows('part_measurements', { batch_id: b.batchId });
    const uploads = await countRows('measurement_uploads', { batch_id: b.batchId });
    const rows = [`U${b.batchId}-1;0,4338;0,4030;91;118000`, `U${b.batchId}-2;0.4338,0,4030;91;118000`];
    await expect(
      uploadMeasurements(quality, b.batchId, { ...csvFile(table(rows), 'bad.csv'), testerProfileId: profileId })
    ).rejects.toThrow(/line 4, column "y": "4030" is outside 0–1|line 4/);
    expect(await countRows('part_measurements', { batch_id: b.batchId })).toBe(before);
    expect(await countRows('measurement_uploads', { batch_id: b.batchId })).toBe(uploads);
  });

  it('refuses a stale profile edit and a name already in use', async () => {
    const v2 = await updateTesterProfile(quality, profileId, 1, { ...profile, headerLines: 2 });
    expect(v2).toBe(2);
    await expect(updateTesterProfile(quality, profileId, 1, profile)).rejects.toThrow(/changed by someone else/);
    await expect(createTesterProfile(quality, profile)).rejects.toThrow(/already exists/);
    expect((await getTesterProfile(profileId)).profile.headerLines).toBe(2);
  });
});
