import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import { uploadMeasurements, withdrawUpload } from '../../../src/lib/server/measurements/upload';
import { batchResults } from '../../../src/lib/server/measurements/results';
import { DomainError } from '../../../src/lib/errors/domain-error';
import { getFile } from '../../../src/lib/server/storage/objects';
import type { User } from '../../../src/lib/server/accounts/users';
import { completedBatch, countRows, csvFile, demoUser, partsCsv } from './support';

let quality: User;
let tech: User;
let batch: { batchId: number; batchNumber: string; revisionId: number };
let csv: string;

beforeAll(async () => {
  [quality, tech] = await Promise.all([demoUser('quality'), demoUser('technician')]);
  batch = await completedBatch();
  csv = await partsCsv(batch.revisionId, 12, `U${batch.batchId}`);
});
afterAll(closeDb);

async function refusal(p: Promise<unknown>): Promise<DomainError> {
  try {
    await p;
  } catch (err) {
    if (err instanceof DomainError) return err;
    throw err;
  }
  throw new Error('expected a refusal');
}

describe('uploading the measured spectra of a batch', () => {
  it('measures every part of a multi-column file, keeps the raw file and reports progress', async () => {
    const phases: string[] = [];
    const res = await uploadMeasurements(quality, batch.batchId, csvFile(csv), (p) =>
      phases.push(p.phase === 'measuring' ? `m${p.done}` : p.phase)
    );
    expect(res.parts).toBe(12);
    expect(phases[0]).toBe('parsing');
    expect(phases).toContain('m12');
    expect(phases.at(-1)).toBe('saving');
    const up = (await db()('measurement_uploads').where({ id: res.uploadId }).first())!;
    const stored = (await getFile(up.stored_file_id))!;
    expect(stored.body.toString('utf8')).toBe(csv);
    expect(stored.row.purpose).toBe('measurement');
    const view = (await batchResults(batch.batchId))!;
    expect(view.parts).toHaveLength(12);
    expect(view.parts[0].label).toBe(`U${batch.batchId}-001`);
    // Built at the revision's own ratios with ±1 % scatter: all in the 3000 K bin of the target.
    expect(view.summary.bins).toEqual([{ nominalCct: 3000, count: 12 }]);
    expect(view.prediction).not.toBeNull();
    const audit = await db()('audit_events').where({
      entity_type: 'batch',
      entity_id: String(batch.batchId),
      action: 'measurements-upload'
    });
    expect(audit).toHaveLength(1);
  });

  it('refuses a file with a bad line, naming it, and saves nothing', async () => {
    const before = [await countRows('measurement_uploads'), await countRows('part_measurements'), await countRows('stored_files')];
    const lines = csv.replace(/U\d+-/g, 'BAD-').split('\n');
    lines[5] = lines[5].replace(/,[^,]+$/, ',abc');
    const e = await refusal(uploadMeasurements(quality, batch.batchId, csvFile(lines.join('\n'), 'broken.csv')));
    expect(e.status).toBe(422);
    expect(e.message).toMatch(/broken\.csv was not saved/);
    expect(e.issues[0].line).toBe(6);
    expect(e.issues[0].message).toMatch(/^Line 6:/);
    expect([await countRows('measurement_uploads'), await countRows('part_measurements'), await countRows('stored_files')]).toEqual(before);
  });

  it('refuses a part the core cannot measure, naming the part and column, and saves nothing', async () => {
    const before = await countRows('part_measurements');
    // Z-2 has power only beyond 830 nm: the parser accepts the file, the core's working range (360–830 nm) holds nothing.
    const text =
      'nm,Z-1,Z-2\n' + Array.from({ length: 53 }, (_, i) => `${380 + 10 * i},${1 + (i % 3)},${380 + 10 * i > 830 ? 1 : 0}`).join('\n');
    const e = await refusal(uploadMeasurements(quality, batch.batchId, csvFile(text, 'dark.csv')));
    expect(e.status).toBe(422);
    expect(e.issues.map((i) => i.message)).toEqual(['Part Z-2 (column 3): spectrum has no power inside 360–830 nm']);
    expect(await countRows('part_measurements')).toBe(before);
  });

  it('refuses parts already measured for the batch', async () => {
    const e = await refusal(uploadMeasurements(quality, batch.batchId, csvFile(csv, 'again.csv')));
    expect(e.status).toBe(409);
    expect(e.message).toMatch(new RegExp(`parts U${batch.batchId}-001, .* already measured`));
  });

  it('lets only quality upload', async () => {
    expect((await refusal(uploadMeasurements(tech, batch.batchId, csvFile(csv)))).status).toBe(403);
  });

  it('a withdrawn upload leaves the results but stays on record; then the parts can be measured again', async () => {
    const up = (await db()('measurement_uploads').where({ batch_id: batch.batchId }).first('id'))!;
    await withdrawUpload(quality, batch.batchId, up.id, 'Sphere not warmed up');
    const view = (await batchResults(batch.batchId))!;
    expect(view.parts).toHaveLength(0);
    expect(view.uploads[0].withdrawReason).toBe('Sphere not warmed up');
    expect((await uploadMeasurements(quality, batch.batchId, csvFile(csv, 'remeasured.csv'))).parts).toBe(12);
    expect((await refusal(withdrawUpload(quality, batch.batchId, up.id, 'twice'))).status).toBe(409);
  });

  it('refuses a batch that is not complete', async () => {
    await db()('batches').where({ id: batch.batchId }).update({ state: 'weighing' });
    try {
      const e = await refusal(uploadMeasurements(quality, batch.batchId, csvFile(csv.replace(/U\d+-/g, 'W-'))));
      expect(e.status).toBe(409);
      expect(e.message).toMatch(/weighing: parts are measured once the weigh-out is complete/);
    } finally {
      await db()('batches').where({ id: batch.batchId }).update({ state: 'complete' });
    }
  });
});

describe('the test condition of an upload', () => {
  it('a file measured hot for a revision aimed at the bench is refused with the reason, and nothing is saved', async () => {
    const before = [await countRows('measurement_uploads'), await countRows('part_measurements')];
    const hot = { reference: 'junction' as const, temperatureC: 85, driveCurrentMa: 350 };
    const e = await refusal(
      uploadMeasurements(quality, batch.batchId, { ...csvFile(csv.replace(/U\d+-/g, 'HOT-'), 'hot.csv'), condition: hot })
    );
    expect(e.status).toBe(422);
    expect(e.message).toBe('hot.csv was not saved: The revision is aimed at the bench; it has no prediction at Tj 85 °C, 350 mA.');
    expect([await countRows('measurement_uploads'), await countRows('part_measurements')]).toEqual(before);
  });

  it('bench files are listed at the bench and compared with the prediction for the bench', async () => {
    const view = (await batchResults(batch.batchId))!;
    expect(view.uploads.every((u) => u.condition === null)).toBe(true);
    expect(view.conditionChecks.map((c) => c.label)).toEqual(['bench (25 °C)']);
    expect(view.conditionChecks[0].parts).toBe(view.parts.length);
    expect(view.parts.every((p) => p.conditionLabel === 'bench (25 °C)')).toBe(true);
  });
});
