import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import { uploadMeasurements } from '../../../src/lib/server/measurements/upload';
import { makeCorrectionDraft } from '../../../src/lib/server/measurements/correction';
import { setAcceptance } from '../../../src/lib/server/measurements/acceptance';
import { batchResults } from '../../../src/lib/server/measurements/results';
import { DomainError } from '../../../src/lib/errors/domain-error';
import { getRevision } from '../../../src/lib/server/formulations/read';
import { xyToUvPrime } from '../../../src/lib/spectral/colorimetry/chromaticity';
import type { User } from '../../../src/lib/server/accounts/users';
import { caughtMail } from '../formulations/support';
import { completedBatch, csvFile, demoUser, partsCsv } from './support';
import { INJECTED, dropLeftoverFaults, failureOf, snapshot, withFailingWrite, type Fault } from '../../support/faults';

// Measure → correct loop (common practice): the line put 15 % more red into every part
// than the revision says (known bias); the correction should take red out and predict a point nearer
// the target than the measured mean.
let quality: User;
let b: { batchId: number; batchNumber: string; revisionId: number };
const duvp = (p: { x: number; y: number }, q: { x: number; y: number }) => {
  const [a, c] = xyToUvPrime(p.x, p.y);
  const [d, e] = xyToUvPrime(q.x, q.y);
  return Math.hypot(a - d, c - e);
};

beforeAll(async () => {
  quality = await demoUser('quality');
  b = await completedBatch();
  await uploadMeasurements(quality, b.batchId, csvFile(await partsCsv(b.revisionId, 10, `C${b.batchId}`, 1.15, 0.005)));
});
afterAll(closeDb);

describe('correction draft from a biased batch', () => {
  it('the biased batch misses the target and fails a 3-step ellipse', async () => {
    const view = (await batchResults(b.batchId))!;
    expect(view.summary.meanOffset!.steps).toBeGreaterThan(3);
    expect(view.summary.yieldFraction).toBe(0);
    expect(view.prediction!.offset.dx).toBeGreaterThan(0); // more red: x up (common practice)
  });

  it('makes a draft revision linked to the batch with less red, predicting a point nearer the target', async () => {
    const view = (await batchResults(b.batchId))!;
    const out = await makeCorrectionDraft(quality, b.batchId, 1, 'http://local');
    const draft = (await getRevision(out.revisionId))!;
    const base = (await getRevision(b.revisionId))!;
    expect(draft.state).toBe('draft');
    expect(draft.sourceBatchId).toBe(b.batchId);
    expect(draft.formulationId).toBe(base.formulationId);
    const red = (r: typeof draft) => r.content.phosphors.at(-1)!.opticalFraction / r.content.pumpLeakFraction;
    expect(red(draft)).toBeLessThan(red(base));
    expect(draft.content.notes).toContain(`Correction from batch ${b.batchNumber}`);
    const target = view.target;
    expect(duvp(out.predicted, target)).toBeLessThan(0.1 * duvp(out.measuredMean, target));
    const row = (await db()('batch_corrections').where({ batch_id: b.batchId }).first())!;
    expect(row.revision_id).toBe(out.revisionId);
    expect((await batchResults(b.batchId))!.corrections[0].revisionNo).toBe(draft.revisionNo);
    expect((await batchResults(b.batchId))!.plot.markers.map((m) => m.kind)).toContain('corrected');
    const mails = await caughtMail(`from batch ${b.batchNumber}`);
    expect(mails.map((m) => m.to[0].address)).toContain('rhea.okafor@kestrelhollow.example');
  });

  it('a failure while recording the correction leaves no draft, no correction and no audit event', async () => {
    const tables = ['formulation_revisions', 'batch_corrections', 'audit_events'] as const;
    await dropLeftoverFaults();
    const before = await snapshot(tables);
    const fault: Fault = { label: 'the correction record', table: 'batch_corrections', event: 'INSERT' };
    const err = await withFailingWrite(fault, () => failureOf(makeCorrectionDraft(quality, b.batchId, 0.5, 'http://local')));
    expect(err.message).toContain(INJECTED);
    expect(await snapshot(tables)).toEqual(before);
  });

  it('needs measured parts', async () => {
    const empty = await completedBatch();
    await expect(makeCorrectionDraft(quality, empty.batchId, 0.8, 'http://local')).rejects.toThrow(/no measured parts/);
  });
});

describe('acceptance chosen for the batch', () => {
  it('a wider step ellipse changes the verdicts; a stale version is refused', async () => {
    const before = (await batchResults(b.batchId))!;
    expect(before.acceptance.version).toBe(0);
    await setAcceptance(quality, b.batchId, { mode: 'steps', steps: 7, requireTargetBin: false, version: 0 });
    const after = (await batchResults(b.batchId))!;
    expect(after.acceptance.label).toBe('7-step ellipse');
    expect(after.summary.passed).toBeGreaterThanOrEqual(before.summary.passed);
    try {
      await setAcceptance(quality, b.batchId, { mode: 'revision', requireTargetBin: true, version: 0 });
      throw new Error('expected a refusal');
    } catch (err) {
      expect(err).toBeInstanceOf(DomainError);
      expect((err as DomainError).status).toBe(409);
    }
  });
});
