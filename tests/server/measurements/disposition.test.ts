import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createHash } from 'node:crypto';
import { closeDb, db } from '../../../src/lib/server/db/index';
import { uploadMeasurements } from '../../../src/lib/server/measurements/upload';
import { disposeBatch } from '../../../src/lib/server/measurements/disposition';
import { DomainError } from '../../../src/lib/errors/domain-error';
import { getBatch } from '../../../src/lib/server/batches/read';
import { getFile } from '../../../src/lib/server/storage/objects';
import type { User } from '../../../src/lib/server/accounts/users';
import { pdfToText } from '../pdf/pdf-text';
import { caughtMail, recipients } from '../formulations/support';
import { completedBatch, csvFile, demoUser, DEMO_PASSWORD, partsCsv } from './support';

// E-signature rules as for revision approval (21 CFR 11 as the model): quality role,
// password re-entered, meaning and comment, SHA-256 of the signed content, nobody signs their own work.
let quality: User;
let admin: User;
let tech: User;
let b: { batchId: number; batchNumber: string; revisionId: number };
const sign = (over: object = {}) => ({
  decision: 'release' as const,
  meaning: 'Release approval: the batch meets its revision',
  comment: 'All parts inside the 3000 K bin.',
  password: DEMO_PASSWORD,
  version: 0,
  ...over
});
const version = async (id: number) => (await getBatch(id))!.batch.version;

beforeAll(async () => {
  [quality, admin, tech] = await Promise.all([demoUser('quality'), demoUser('admin'), demoUser('technician')]);
  b = await completedBatch();
  await uploadMeasurements(quality, b.batchId, csvFile(await partsCsv(b.revisionId, 8, `D${b.batchId}`)));
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

describe('releasing a batch with an e-signature', () => {
  it('needs the quality role', async () => {
    const e = await refusal(disposeBatch(tech, b.batchId, sign({ version: await version(b.batchId) }), 'http://local'));
    expect(e.status).toBe(403);
  });

  it('refuses a wrong password, records the refusal and changes nothing', async () => {
    const v = await version(b.batchId);
    const e = await refusal(disposeBatch(quality, b.batchId, sign({ password: 'not-my-password', version: v }), 'http://local'));
    expect(e.status).toBe(403);
    expect(e.message).toMatch(/password is not correct, so nothing was signed/);
    expect((await getBatch(b.batchId))!.batch.state).toBe('complete');
    expect(await db()('batch_dispositions').where({ batch_id: b.batchId })).toHaveLength(0);
    expect(
      await db()('audit_events').where({ entity_type: 'batch', entity_id: String(b.batchId), action: 'e-signature-refused' })
    ).toHaveLength(1);
  });

  it('refuses someone who worked on the batch', async () => {
    await db()('batches').where({ id: b.batchId }).update({ created_by: admin.id });
    try {
      const e = await refusal(disposeBatch(admin, b.batchId, sign({ version: await version(b.batchId) }), 'http://local'));
      expect(e.status).toBe(403);
      expect(e.message).toMatch(/someone else in quality must sign it off/);
    } finally {
      await db()('batches').where({ id: b.batchId }).update({ created_by: tech.id });
    }
  });

  it('refuses a stale version', async () => {
    const e = await refusal(disposeBatch(quality, b.batchId, sign({ version: (await version(b.batchId)) - 1 }), 'http://local'));
    expect(e.status).toBe(409);
  });

  it('releases: state, signature with the SHA-256 of the signed JSON, audit, record PDF with the measurement summary, mail', async () => {
    const v = await version(b.batchId);
    const out = await disposeBatch(quality, b.batchId, sign({ version: v }), 'http://local');
    expect(out.decision).toBe('released');
    const d = (await getBatch(b.batchId))!;
    expect(d.batch.state).toBe('released');
    expect(d.batch.version).toBe(v + 1);
    expect(d.batch.recordFileId).toBe(out.recordFileId);
    const row = (await db()('batch_dispositions').where({ batch_id: b.batchId }).first())!;
    expect(row.signer_name).toBe(quality.name);
    expect(row.meaning).toBe('Release approval: the batch meets its revision');
    // The stored hash is the SHA-256 of the stored canonical JSON (recomputed here with node:crypto).
    expect(createHash('sha256').update(row.signed_json, 'utf8').digest('hex')).toBe(row.content_sha256);
    const signed = JSON.parse(row.signed_json);
    expect(signed.parts).toHaveLength(8);
    expect(signed.comment).toBe('All parts inside the 3000 K bin.');
    expect(signed.files[0].sha256).toMatch(/^[0-9a-f]{64}$/);
    const actions = (await db()('audit_events').where({ entity_type: 'batch', entity_id: String(b.batchId) })).map((a) => a.action);
    expect(actions).toEqual(expect.arrayContaining(['release', 'e-signature']));
    const pdf = pdfToText((await getFile(out.recordFileId))!.body, false).replace(/\s+/g, ' ');
    expect(pdf).toContain('Measurement summary and disposition');
    expect(pdf).toContain('RELEASED');
    expect(pdf).toContain(quality.name);
    expect(pdf).toContain('8 of 8 pass');
    // Lot statistics in the record: capability per the NIST/SEMATECH definition, the mean's Hotelling T² ellipse.
    expect(pdf).toContain('Capability, CCT');
    expect(pdf).toContain('Hotelling T²');
    expect(pdf.replace(/\s+/g, '')).toContain(row.content_sha256); // the long hash wraps in the table cell
    const mails = await caughtMail(`Batch ${b.batchNumber} released`);
    expect(mails).toHaveLength(1);
    // Formulator who wrote the revision (seeded: Rhea Okafor) and the technician who made the batch.
    expect(recipients(mails)).toEqual(expect.arrayContaining(['rhea.okafor@kestrelhollow.example', tech.email]));
  });

  it('a decided batch cannot be signed again, and its signature row cannot be changed', async () => {
    const e = await refusal(
      disposeBatch(
        quality,
        b.batchId,
        sign({ decision: 'reject', meaning: 'Rejection for rework', version: await version(b.batchId) }),
        'http://local'
      )
    );
    expect(e.status).toBe(409);
    await expect(db()('batch_dispositions').where({ batch_id: b.batchId }).update({ comment: 'edited' })).rejects.toThrow(
      /cannot be changed/
    );
    await expect(db()('batch_dispositions').where({ batch_id: b.batchId }).delete()).rejects.toThrow(/append-only/);
  });
});

describe('rejecting a batch', () => {
  it('rejects without measurements; releasing needs them', async () => {
    const r = await completedBatch();
    const noParts = await refusal(disposeBatch(quality, r.batchId, sign({ version: await version(r.batchId) }), 'http://local'));
    expect(noParts.status).toBe(409);
    expect(noParts.message).toMatch(/no measured parts/);
    const out = await disposeBatch(
      quality,
      r.batchId,
      sign({ decision: 'reject', meaning: 'Rejection for rework', comment: 'Slurry contaminated.', version: await version(r.batchId) }),
      'http://local'
    );
    expect(out.decision).toBe('rejected');
    expect((await getBatch(r.batchId))!.batch.state).toBe('rejected');
  });
});
