import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../src/lib/server/db/index';
import { getRevision, listSignatures, storedContentVerified } from '../../src/lib/server/formulations/read';
import { sign, submit } from '../../src/lib/server/formulations/workflow';
import { canonicalJson } from '../../src/lib/formulations/canonical-json';
import { storedContentSha256 } from '../../src/lib/server/formulations/hash';
import { fractionsWithLeak, parseRecipe } from '../../src/lib/recipe';
import { DEMO_PASSWORD, cast, uniqueCode, type Cast } from '../server/formulations/support';
import { createHash } from 'node:crypto';

// Signed rows are never rewritten (the lock trigger refuses it); newer code must read them as stored
// and their SHA-256 (FIPS 180-4, over the canonical JSON; model: 21 CFR 11.70) must still verify.
const sha256 = (text: string) => createHash('sha256').update(text, 'utf8').digest('hex');

let c: Cast;
const approvedRow = () =>
  db()('formulation_revisions as r')
    .join('formulations as f', 'f.id', 'r.formulation_id')
    .where({ 'f.code': 'KH-W30-90', 'r.state': 'approved' })
    .first('r.*');

describe('stored revisions in the database, read through the recipe reader', () => {
  beforeAll(async () => {
    c = await cast();
  });
  afterAll(closeDb);

  it('the approved seeded revision verifies its signature hash over the stored text and reads through parseRecipe', async () => {
    const row = await approvedRow();
    expect(row, 'seeded KH-W30-90 approved revision').toBeTruthy();
    expect(sha256(canonicalJson(JSON.parse(row.content_json)))).toBe(row.content_sha256);
    expect(storedContentSha256(row.content_json)).toBe(row.content_sha256);
    const signatures = await listSignatures(row.id);
    expect(signatures.length).toBeGreaterThan(0);
    for (const s of signatures) expect(s.contentSha256).toBe(row.content_sha256);
    const content = parseRecipe(row.content_json);
    // Seeded rows are written as version 3 (citing no package model); any stored version reads as the current one.
    expect(JSON.parse(row.content_json)).toMatchObject({ contentVersion: 3, packageModelRef: null });
    expect(content.contentVersion).toBe(3);
    // Pump leak + phosphor optical fractions add up to 1 (optical superposition; rounded to 4 decimals on entry).
    expect(fractionsWithLeak(content).reduce((a, f) => a + f, 0)).toBeCloseTo(1, 3);
    expect((await getRevision(row.id))!.content).toEqual(content);
    expect(await storedContentVerified(row.id)).toBe(true);
    expect((await approvedRow()).content_json).toBe(row.content_json);
  });

  it('a row written before the version tag is submitted, signed and read, and keeps its bytes and its hash', async () => {
    const seeded = await approvedRow();
    const { contentVersion: _tag, packageModelRef: _ref, ...untagged } = JSON.parse(seeded.content_json);
    const legacyText = JSON.stringify({ ...untagged, notes: 'Stored before content carried a version.' });
    const legacyHash = sha256(canonicalJson(JSON.parse(legacyText)));
    const code = uniqueCode('LG');
    const [formulationId] = await db()('formulations').insert({ code, name: `Legacy ${code}`, created_by: c.rhea.id });
    const [id] = await db()('formulation_revisions').insert({
      formulation_id: formulationId,
      revision_no: 1,
      state: 'draft',
      content_json: legacyText,
      predicted_json: seeded.predicted_json,
      core_version: seeded.core_version,
      content_sha256: legacyHash,
      created_by: c.rhea.id
    });
    await submit(c.rhea, id);
    await sign(c.ines, id, 'approved', { password: DEMO_PASSWORD, comment: 'legacy row' });
    const row = await db()('formulation_revisions').where({ id }).first('state', 'content_json', 'content_sha256');
    expect(row).toEqual({ state: 'approved', content_json: legacyText, content_sha256: legacyHash });
    expect((await listSignatures(id)).map((s) => s.contentSha256)).toEqual([legacyHash]);
    expect(await storedContentVerified(id)).toBe(true);
    const rev = (await getRevision(id))!;
    expect(rev.content).toMatchObject({ contentVersion: 3, packageModelRef: null });
    expect(rev.content.phosphors).toEqual(untagged.phosphors);
  });

  it('a stored row whose text no longer matches its hash is reported as not verified', async () => {
    const seeded = await approvedRow();
    const code = uniqueCode('LG');
    const [formulationId] = await db()('formulations').insert({ code, name: `Altered ${code}`, created_by: c.rhea.id });
    const [id] = await db()('formulation_revisions').insert({
      formulation_id: formulationId,
      revision_no: 1,
      state: 'draft',
      content_json: seeded.content_json,
      predicted_json: seeded.predicted_json,
      core_version: seeded.core_version,
      content_sha256: sha256('something else'),
      created_by: c.rhea.id
    });
    expect(await storedContentVerified(id)).toBe(false);
    await expect(submit(c.rhea, id)).rejects.toThrow(/no longer matches its recorded SHA-256/);
  });
});
