import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import { uploadMeasurements } from '../../../src/lib/server/measurements/upload';
import { makeCorrectionDraft } from '../../../src/lib/server/measurements/correction';
import { DomainError } from '../../../src/lib/errors/domain-error';
import { getRevision } from '../../../src/lib/server/formulations/read';
import { loadBlendComponents } from '../../../src/lib/server/library/components';
import { syntheticPartsCsv } from '../../../src/lib/measurements/syntheticParts';
import { mix } from '../../../src/lib/blend/mix';
import { colourDistance } from '../../../src/lib/aim';
import { batchResults } from '../../../src/lib/server/measurements/results';
import { POST as correctionPost } from '../../../src/routes/api/v1/measurements/[batchId]/correction/+server';
import type { User } from '../../../src/lib/server/accounts/users';
import { caughtMail } from '../formulations/support';
import { call, jsonEvent } from '../../routes/api/support';
import { snapshot } from '../../support/faults';
import { completedBatch, csvFile, demoUser, partsCsv } from './support';

// Measure → correct (common practice): a trim is a small, damped move from the measured mean. A
// gross offset is a build problem, not a recipe to trim: the correction is refused with its reason
// and nothing is saved or mailed. A trim that is capped says by how much and which colour to expect.
let quality: User;
const TABLES = ['formulation_revisions', 'batch_corrections', 'audit_events'] as const;

beforeAll(async () => {
  quality = await demoUser('quality');
});
afterAll(closeDb);

/** Synthetic parts of the revision with the pump leak scaled (a gross blue offset: far too little phosphor on the parts). */
async function bluePartsCsv(revisionId: number, pumpScale: number, prefix: string): Promise<string> {
  const rev = (await getRevision(revisionId))!;
  const components = await loadBlendComponents(
    rev.content.pump.materialId,
    rev.content.phosphors.map((p) => p.materialId)
  );
  const fractions = [rev.content.pumpLeakFraction * pumpScale, ...rev.content.phosphors.map((p) => p.opticalFraction)];
  return syntheticPartsCsv(components, fractions, { parts: 6, prefix: `${prefix}-`, scatter: 0.005 });
}

describe('a gross offset that would run a phosphor to 0 wt % is refused', () => {
  // Five times the designed pump leak: before this check the trim did not converge, ran the green and
  // yellow phosphors down to 0 wt % (to 4 decimals) and the red to an absurd loading, and the draft
  // was still saved and mailed.
  let b: { batchId: number; batchNumber: string; revisionId: number };
  beforeAll(async () => {
    b = await completedBatch();
    await uploadMeasurements(quality, b.batchId, csvFile(await bluePartsCsv(b.revisionId, 5, `G${b.batchId}`)));
  });

  it('the service answers 422 with the reason and leaves the database unchanged', async () => {
    expect((await batchResults(b.batchId))!.summary.meanOffset!.steps).toBeGreaterThan(20);
    const before = await snapshot(TABLES);
    const err = await makeCorrectionDraft(quality, b.batchId, 0.8, 'http://local').then(
      () => null,
      (e: unknown) => e
    );
    expect(err).toBeInstanceOf(DomainError);
    expect((err as DomainError).status).toBe(422);
    expect((err as DomainError).message).toMatch(
      /^No correction draft was made: the target cannot be reached without taking .+ to zero or below/
    );
    expect(await snapshot(TABLES)).toEqual(before);
    expect(await db()('batch_corrections').where({ batch_id: b.batchId }).count({ n: '*' }).first()).toEqual({ n: 0 });
    expect(await caughtMail(`from batch ${b.batchNumber}`, 1, 1500)).toEqual([]);
  });

  it('the API answers 422 with the same reason', async () => {
    const before = await snapshot(TABLES);
    const event = {
      ...jsonEvent({ stepFraction: 0.8 }, ['quality']),
      params: { batchId: String(b.batchId) },
      url: new URL('http://local/')
    };
    event.locals.user = { ...event.locals.user!, id: quality.id, email: quality.email, name: quality.name };
    const { status, body } = await call(correctionPost, event);
    expect(status).toBe(422);
    expect(body.error).toMatch(/to zero or below/);
    expect(await snapshot(TABLES)).toEqual(before);
  });
});

describe('a capped trim records the cap and the colour point to expect', () => {
  // Three times the designed red on every part: the full correction would more than halve the red,
  // so the trim is held to ×2 per phosphor and applied only in part.
  let b: { batchId: number; batchNumber: string; revisionId: number };
  beforeAll(async () => {
    b = await completedBatch();
    await uploadMeasurements(quality, b.batchId, csvFile(await partsCsv(b.revisionId, 6, `R${b.batchId}`, 3, 0.005)));
  });

  it('the draft says by how much the trim was capped and which colour to expect; the row keeps the cap', async () => {
    const out = await makeCorrectionDraft(quality, b.batchId, 0.8, 'http://local');
    expect(out.cap.limitedBy).toBe('maxChange');
    expect(out.cap.requestedShare).toBe(0.8);
    expect(out.cap.appliedShare).toBeLessThan(0.8);
    const share = Math.round(out.cap.appliedShare * 100);
    const draft = (await getRevision(out.revisionId))!;
    const p = out.predicted;
    expect(draft.content.notes).toContain(
      `Trim capped at ${share} % of the full correction (by ${100 - share} %: 80 % was asked for, ` +
        'and no phosphor may change by more than ×2 in one trim)'
    );
    expect(draft.content.notes).toContain(`expect x ${p.x.toFixed(4)}, y ${p.y.toFixed(4)} (${Math.round(p.cct)} K, Duv `);
    expect(draft.content.notes).toContain(`${out.predictedSteps.toFixed(1)} steps from target.`);
    const row = await db()('batch_corrections').where({ batch_id: b.batchId }).first();
    expect(JSON.parse(row!.detail_json).cap).toEqual(out.cap);

    // The colour to expect is the model of the recipe handed over plus the bias measured on this batch
    // (the correction's own definition), checked here from the draft's wt % as saved.
    const base = (await getRevision(b.revisionId))!;
    const components = await loadBlendComponents(
      base.content.pump.materialId,
      base.content.phosphors.map((q) => q.materialId)
    );
    const { basis: _basis, ...loading } = base.content.loading!;
    const at = (wt: number[]) => mix(components, { kind: 'loading', concentrationsWtPct: wt, loading }).evaluation;
    const was = at(base.content.phosphors.map((q) => q.wtPct!));
    const now = at(draft.content.phosphors.map((q) => q.wtPct!));
    const expected = { x: now.x + out.measuredMean.x - was.x, y: now.y + out.measuredMean.y - was.y };
    expect(Math.abs(expected.x - p.x)).toBeLessThan(1e-4);
    expect(Math.abs(expected.y - p.y)).toBeLessThan(1e-4);
    const target = (await batchResults(b.batchId))!.target;
    expect(colourDistance(p.x, p.y, target).steps).toBeCloseTo(out.predictedSteps, 1);
    // Capped means the draft does not promise the target: the expected point is still off, but nearer than the batch.
    expect(out.predictedSteps).toBeGreaterThan(3);
    expect(out.predictedSteps).toBeLessThan((await batchResults(b.batchId))!.summary.meanOffset!.steps);
  });
});
