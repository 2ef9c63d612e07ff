/** The home page's work queues, against the demo data and revisions made here. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb } from '../../../src/lib/server/db/index';
import { createFormulationWithDraft } from '../../../src/lib/server/formulations/save';
import { returnRevision, submit } from '../../../src/lib/server/formulations/workflow';
import { workQueues } from '../../../src/lib/server/home/work-queues';
import { DEMO_PASSWORD, cast, uniqueCode, warmWhite, type Cast } from '../formulations/support';

let c: Cast;
const queue = async (user: Cast['rhea'], kind: string) => (await workQueues(user)).find((q) => q.kind === kind)!;

describe('work queues', () => {
  beforeAll(async () => {
    c = await cast();
  });
  afterAll(closeDb);

  it('give each role its own queues, and an admin none', async () => {
    expect((await workQueues(c.ines)).map((q) => q.kind)).toEqual(['revisionsToReview', 'batchesToDecide', 'deviationsToAccept']);
    expect((await workQueues(c.tomas)).map((q) => q.kind)).toEqual(['batchesToWeigh', 'slurriesNearLimit']);
    expect((await workQueues(c.rhea)).map((q) => q.kind)).toEqual(['drafts', 'returnedRevisions', 'correctionDrafts']);
    expect(await workQueues({ id: c.admin.id, roles: ['admin'] })).toEqual([]);
  });

  it('count a newly submitted revision for quality and list the oldest first, at most three', async () => {
    const before = await queue(c.ines, 'revisionsToReview');
    const code = uniqueCode('WQ');
    const made = await createFormulationWithDraft(c.rhea, { code, name: `Queue ${code}`, content: await warmWhite() });
    expect((await queue(c.rhea, 'drafts')).count).toBeGreaterThan(0);
    await submit(c.rhea, made.revisionId);
    const after = await queue(c.ines, 'revisionsToReview');
    expect(after.count).toBe(before.count + 1);
    expect(after.oldest.length).toBe(Math.min(3, after.count));
    const times = after.oldest.map((i) => i.since.getTime());
    expect(times).toEqual([...times].sort((a, b) => a - b));
    if (after.count <= 3) expect(after.oldest.map((i) => i.label)).toContain(`${code} rev. 1 — Queue ${code}`);

    const returnedBefore = (await queue(c.rhea, 'returnedRevisions')).count;
    await returnRevision(c.ines, made.revisionId, { password: DEMO_PASSWORD, reason: 'Ra floor missed on trial builds' });
    const returned = await queue(c.rhea, 'returnedRevisions');
    expect(returned.count).toBe(returnedBefore + 1);
    expect((await queue(c.ines, 'revisionsToReview')).count).toBe(before.count);
  });

  it('show the demo batch waiting for a decision to quality', async () => {
    const decide = await queue(c.ines, 'batchesToDecide');
    expect(decide.count).toBeGreaterThan(0);
    expect(decide.oldest[0].href).toMatch(/^\/measurements\/\d+$/);
  });
});
