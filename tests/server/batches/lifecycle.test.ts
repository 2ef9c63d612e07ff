import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import { createBatch } from '../../../src/lib/server/batches/create';
import { getBatch, listBatches, traceLot } from '../../../src/lib/server/batches/read';
import { acceptDeviation, markMixed, recordLine } from '../../../src/lib/server/batches/weighing';
import { completeBatch } from '../../../src/lib/server/batches/complete';
import { scaleBatch } from '../../../src/lib/server/batches/scale';
import { DomainError } from '../../../src/lib/errors/domain-error';
import { createBatchSchema } from '../../../src/lib/batches/schema';
import { getFile } from '../../../src/lib/server/storage/objects';
import { pdfToText } from '../pdf/pdf-text';
import { DEMO_PASSWORD, demoUser, makeFixture, request, type Fixture } from './support';
import type { User } from '../../../src/lib/server/accounts/users';

let fx: Fixture;
let tech: User;
let tech2: User;
let quality: User;

beforeAll(async () => {
  fx = await makeFixture();
  [tech, tech2, quality] = await Promise.all([demoUser('technician'), demoUser('technician2'), demoUser('quality')]);
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

const plan = (over: object = {}) => createBatchSchema.parse({ ...request(fx.revisionId), ...over });

describe('planning a batch', () => {
  it('computes the lines of the hand-worked 10:1 example and stores them with the revision snapshot', async () => {
    const { id, batchNumber } = await createBatch(tech, plan());
    expect(batchNumber).toMatch(/^BT-\d{6}-\d{3}$/);
    const d = (await getBatch(id))!;
    expect(d.batch.state).toBe('planned');
    expect(d.batch.formulationCode).toBe(fx.formulationCode);
    // 10.000 g: A 8.227, green 0.700, red 0.250, B 0.823 (worked in tests/lib/batches/weighout/compute.test.ts).
    expect(d.lines.map((l) => [l.code, l.targetG, l.lowG, l.highG])).toEqual([
      ['PART A', '8.227', '8.145', '8.309'],
      [fx.green.code, '0.700', '0.697', '0.703'],
      [fx.red.code, '0.250', '0.249', '0.251'],
      ['PART B', '0.823', '0.815', '0.830']
    ]);
    expect(d.batch.batchMassG).toBe('10.000');
    expect(d.batch.target.ansiBin).toBe(3000); // 3000 K, Duv 0 lies in the ANSI C78.377 3000 K quadrangle
    expect(d.revision?.id).toBe(fx.revisionId);
    expect(d.silicone.degasNotes).toMatch(/5 kPa/);
    const audit = await db()('audit_events').where({ entity_type: 'batch', entity_id: String(id), action: 'create' });
    expect(audit).toHaveLength(1);
  });

  it('refuses a revision that is not approved', async () => {
    const e = await refusal(createBatch(tech, plan({ revisionId: fx.draftRevisionId })));
    expect(e.status).toBe(409);
    expect(e.message).toMatch(/draft: batches are made from the approved revision only/);
  });

  it('refuses an impossible batch with the weigh-out reasons and saves nothing', async () => {
    const before = await db()('batches').count({ n: '*' });
    const e = await refusal(createBatch(tech, plan({ loading: { mode: 'total', basis: 'wtPctOfSlurry', totalPct: 100 } })));
    expect(e.status).toBe(422);
    expect(e.message).toMatch(/below 100 %/);
    expect(await db()('batches').count({ n: '*' })).toEqual(before);
  });

  it("refuses a silicone system other than the revision's", async () => {
    const e = await refusal(createBatch(tech, plan({ siliconeSystemId: fx.siliconeSystemId + 1000 })));
    expect(e.status).toBe(400);
    expect(e.message).toMatch(/needs a new revision/);
  });

  it('scales a planned batch and recomputes every line exactly', async () => {
    const { id } = await createBatch(tech, plan());
    const v = (await getBatch(id))!.batch.version;
    await scaleBatch(tech, id, { version: v, factor: 3 });
    const d = (await getBatch(id))!;
    // 30.000 g: green 2.100, red 0.750; silicone 27.150 → A 24.681818…, B 2.468181… → steps
    // 24681.82 + 2468.18 → floors 27149, one left → A (remainder .82): A 24.682, B 2.468.
    expect(d.lines.map((l) => l.targetG)).toEqual(['24.682', '2.100', '0.750', '2.468']);
    const stale = await refusal(scaleBatch(tech, id, { version: v, factor: 2 }));
    expect(stale.status).toBe(409);
  });
});

describe('weighing, deviations and completion', () => {
  let id: number;
  beforeAll(async () => {
    id = (await createBatch(tech, plan())).id;
  });
  const line = async (seq: number) => (await getBatch(id))!.lines[seq - 1];

  it('checks each reading against its range at once and moves the batch to weighing', async () => {
    const r = await recordLine(tech, id, 1, { actualG: '8.230', lotNumber: 'BS-A-2611', version: (await line(1)).version });
    expect(r.status).toBe('in');
    expect((await getBatch(id))!.batch.state).toBe('weighing');
  });

  it("accepts only a known, current lot of the line's material", async () => {
    const v = (await line(2)).version;
    const unknown = await refusal(recordLine(tech, id, 2, { actualG: '0.700', lotNumber: 'NOPE-1', version: v }));
    expect(unknown.status).toBe(400);
    expect(unknown.message).toMatch(new RegExp(`not a known lot of ${fx.green.code}.*${fx.green.lot}`));
    const expired = await refusal(recordLine(tech, id, 2, { actualG: '0.700', lotNumber: fx.green.expiredLot, version: v }));
    expect(expired.message).toMatch(/expired on 2020-01-31/);
    const wrongMaterial = await refusal(recordLine(tech, id, 2, { actualG: '0.700', lotNumber: fx.red.lot, version: v }));
    expect(wrongMaterial.message).toMatch(/not a known lot/);
    const ok = await recordLine(tech, id, 2, { actualG: '0.700', lotNumber: fx.green.lot, version: v });
    expect(ok.status).toBe('in');
    expect((await line(2)).lotId).not.toBeNull();
  });

  it('flags an out-of-range reading; a stale version is refused', async () => {
    const v = (await line(3)).version;
    // 0.2530 g > 0.251 g (upper limit of the red line).
    const r = await recordLine(tech, id, 3, { actualG: '0.2530', lotNumber: fx.red.lot, version: v });
    expect(r.status).toBe('above');
    expect(r.deviationG).toBe('0.003');
    const stale = await refusal(recordLine(tech, id, 3, { actualG: '0.250', lotNumber: fx.red.lot, version: v }));
    expect(stale.status).toBe(409);
  });

  it('cannot complete before part B, the mixing time and the quality decision', async () => {
    const e = await refusal(completeBatch(tech, id, (await getBatch(id))!.batch.version));
    expect(e.status).toBe(409);
    expect(e.message).toMatch(/line 3 .* needs a quality decision/);
    expect(e.message).toMatch(/line 4 .* has no reading/);
    expect(e.message).toMatch(/part B was mixed in is not noted/);
  });

  it('lets only quality accept a deviation, signed with the password, not by the person who weighed it', async () => {
    const v = (await line(3)).version;
    expect(
      (await refusal(acceptDeviation(tech2, id, 3, { reason: 'looks fine to me, honestly', password: DEMO_PASSWORD, version: v }))).status
    ).toBe(403);
    const wrong = await refusal(
      acceptDeviation(quality, id, 3, { reason: 'Within the colour window of the revision.', password: 'wrong-password', version: v })
    );
    expect(wrong.status).toBe(403);
    expect(wrong.message).toMatch(/password is not correct/);
    const inRange = await refusal(
      acceptDeviation(quality, id, 2, {
        reason: 'Within the colour window of the revision.',
        password: DEMO_PASSWORD,
        version: (await line(2)).version
      })
    );
    expect(inRange.status).toBe(409);
    await acceptDeviation(quality, id, 3, { reason: 'Within the colour window of the revision.', password: DEMO_PASSWORD, version: v });
    expect((await line(3)).overrideByName).toBe(quality.name);
  });

  it('notes the mixing time after part B and shows the slurry limit', async () => {
    const early = await refusal(markMixed(tech, id, { version: (await getBatch(id))!.batch.version }));
    expect(early.message).toMatch(/Record the part B reading/);
    await recordLine(tech, id, 4, { actualG: '0.823', lotNumber: 'BS-B-2611', version: (await line(4)).version });
    const { mixedAt, expiresAt } = await markMixed(tech, id, { version: (await getBatch(id))!.batch.version });
    // Plant limit 120 min is shorter than the 240 min pot life.
    expect(expiresAt.getTime() - mixedAt.getTime()).toBe(120 * 60_000);
  });

  it('completes, stores the batch record PDF and freezes the readings', async () => {
    const { recordFileId } = await completeBatch(tech, id, (await getBatch(id))!.batch.version);
    const d = (await getBatch(id))!;
    expect(d.batch.state).toBe('complete');
    expect(d.batch.recordFileId).toBe(recordFileId);
    const file = (await getFile(recordFileId))!;
    expect(file.row.contentType).toBe('application/pdf');
    const text = pdfToText(file.body, false).replace(/\s+/g, ' ');
    expect(text).toContain(`Batch record ${d.batch.batchNumber}`);
    expect(text).toContain(fx.red.lot);
    expect(text).toMatch(/Accepted by Ines Halloran/);
    expect(text).toContain('Within the colour window of the revision.');
    const late = await refusal(recordLine(tech, id, 1, { actualG: '8.2', lotNumber: 'X', version: d.lines[0].version }));
    expect(late.status).toBe(409);
  });

  it('traces a lot to its batches and finds batches by lot or number', async () => {
    const trace = await traceLot(fx.red.lot);
    expect(trace.lots).toHaveLength(1);
    expect(trace.lots[0].batches.map((b) => b.id)).toContain(id);
    const d = (await getBatch(id))!;
    expect((await listBatches({ q: fx.green.lot })).items.map((b) => b.id)).toContain(id);
    expect((await listBatches({ q: d.batch.batchNumber })).items.map((b) => b.id)).toEqual([id]);
    expect((await listBatches({ state: 'complete', lot: fx.red.lot })).items.map((b) => b.id)).toEqual([id]);
    expect((await traceLot('BS-A-2611')).unlinked.map((b) => b.id)).toContain(id);
  });
});
