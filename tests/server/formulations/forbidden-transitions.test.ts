import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import type { User } from '../../../src/lib/server/accounts/users';
import { createFormulationWithDraft, createRevision, updateDraft } from '../../../src/lib/server/formulations/save';
import { returnRevision, sign, submit, withdraw } from '../../../src/lib/server/formulations/workflow';
import { ConflictError, PermissionError } from '../../../src/lib/server/formulations/errors';
import { REVISION_STATES, type RevisionState } from '../../../src/lib/formulations/workflow-rules';
import type { RevisionContent } from '../../../src/lib/recipe';
import type { RevisionCommand } from '../../../src/lib/formulations/workflow-rules';
import { ALLOWED, type Person } from '../../lib/formulations/permission-table';
import { DEMO_PASSWORD, cast, uniqueCode, warmWhite, type Cast } from './support';

// Every forbidden command × state × person, through the services the API and the pages call:
// each is refused (403 for the wrong person, 409 for the wrong state) and the row stays as it was.
let c: Cast;
let content: RevisionContent;
const ids = {} as Record<RevisionState, number>;
const sig = { password: DEMO_PASSWORD, comment: '' };

function run(command: RevisionCommand, user: User, id: number, version: number) {
  switch (command) {
    case 'edit':
      return updateDraft(user, id, version, content);
    case 'submit':
      return submit(user, id, version);
    case 'review':
      return sign(user, id, 'reviewed', sig, version);
    case 'approve':
      return sign(user, id, 'approved', sig, version);
    case 'return':
      return returnRevision(user, id, { password: DEMO_PASSWORD, reason: 'matrix probe' }, version);
    case 'withdraw':
      return withdraw(user, id, 'matrix probe', version);
  }
}

describe('forbidden transitions through the services, per person and state', () => {
  beforeAll(async () => {
    c = await cast();
    content = await warmWhite();
    const code = uniqueCode('MX');
    const f = await createFormulationWithDraft(c.rhea, { code, name: code, content });
    const next = async () => (await createRevision(c.rhea, f.formulationId, content)).revisionId;
    // superseded: approved, then replaced by a newer approval (which stays approved).
    ids.superseded = f.revisionId;
    await submit(c.rhea, ids.superseded);
    await sign(c.ines, ids.superseded, 'approved', sig);
    ids.approved = await next();
    await submit(c.rhea, ids.approved);
    await sign(c.ines, ids.approved, 'approved', sig);
    ids.draft = await next();
    ids.submitted = await next();
    await submit(c.rhea, ids.submitted);
    ids.returned = await next();
    await submit(c.rhea, ids.returned);
    await returnRevision(c.ines, ids.returned, { password: DEMO_PASSWORD, reason: 'set-up' });
    ids.withdrawn = await next();
    await withdraw(c.rhea, ids.withdrawn, 'set-up');
  });
  afterAll(closeDb);

  it('has one revision in every state', async () => {
    for (const state of REVISION_STATES) expect((await db()('formulation_revisions').where({ id: ids[state] }).first())!.state).toBe(state);
  });

  const people: Person[] = ['author (formulator)', 'other formulator', 'technician', 'quality reviewer', 'administrator'];
  const commands: RevisionCommand[] = ['edit', 'submit', 'review', 'approve', 'return', 'withdraw'];
  for (const person of people) {
    it(`refuses every command the rules do not give the ${person}, leaving the revision unchanged`, async () => {
      const user = {
        'author (formulator)': c.rhea,
        'other formulator': c.jonah,
        technician: c.tomas,
        'quality reviewer': c.ines,
        administrator: c.admin
      }[person];
      let refused = 0;
      for (const state of REVISION_STATES) {
        for (const command of commands.filter((x) => !(ALLOWED[person][state] ?? []).includes(x))) {
          const before = (await db()('formulation_revisions').where({ id: ids[state] }).first())!;
          const attempt = run(command, user, ids[state], before.version);
          await expect(attempt, `${command} on ${state}`).rejects.toSatisfy(
            (e) => e instanceof PermissionError || e instanceof ConflictError
          );
          expect(await db()('formulation_revisions').where({ id: ids[state] }).first(), `${command} on ${state}`).toEqual(before);
          refused++;
        }
      }
      expect(refused).toBeGreaterThan(25);
    });
  }
});
