/**
 * A new formulation is written in steps inside one transaction: the formulation row, its audit
 * event, the first draft revision, the formulation's updated_at, the draft's audit event. A new
 * draft on an existing formulation takes the last three. Whichever step fails, formulations,
 * formulation_revisions and audit_events must hold exactly the rows they held before, and the
 * code stays free.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb } from '../../../src/lib/server/db/index';
import { createFormulationWithDraft, createRevision } from '../../../src/lib/server/formulations/save';
import { cast, uniqueCode, warmWhite, type Cast } from './support';
import { INJECTED, dropLeftoverFaults, failureOf, snapshot, withFailingWrite, type Fault } from '../../support/faults';

const TABLES = ['formulations', 'formulation_revisions', 'audit_events'] as const;
const NEW_FORMULATION_FAULTS: Fault[] = [
  {
    label: "the formulation's audit event",
    table: 'audit_events',
    event: 'INSERT',
    when: "NEW.entity_type = 'formulation' AND NEW.action = 'create'"
  },
  { label: 'the first draft revision', table: 'formulation_revisions', event: 'INSERT' },
  { label: "the formulation's updated_at", table: 'formulations', event: 'UPDATE' },
  {
    label: "the draft's audit event",
    table: 'audit_events',
    event: 'INSERT',
    when: "NEW.entity_type = 'formulation_revision' AND NEW.action = 'create'"
  }
];

let c: Cast;

describe('formulation drafts: a failure after the first insert leaves no partial formulation', () => {
  beforeAll(async () => {
    await dropLeftoverFaults();
    c = await cast();
  });
  afterAll(async () => {
    await dropLeftoverFaults();
    await closeDb();
  });

  it.each(NEW_FORMULATION_FAULTS)('new formulation, fails while writing $label: tables unchanged, code still free', async (fault) => {
    const code = uniqueCode('RB');
    const content = await warmWhite();
    const before = await snapshot(TABLES);
    const err = await withFailingWrite(fault, () =>
      failureOf(createFormulationWithDraft(c.rhea, { code, name: `Rollback ${code}`, content }))
    );
    expect(err.message).toContain(INJECTED);
    expect(await snapshot(TABLES)).toEqual(before);
    // The code was not taken by a half-written formulation: the same request now goes through.
    const ok = await createFormulationWithDraft(c.rhea, { code, name: `Rollback ${code}`, content });
    expect(ok).toMatchObject({ code, revisionNo: 1 });
  });

  it('new draft on an existing formulation, fails at its audit event: no revision 2, formulation untouched', async () => {
    const code = uniqueCode('RB');
    const first = await createFormulationWithDraft(c.rhea, { code, name: `Rollback ${code}`, content: await warmWhite() });
    const content = await warmWhite({ notes: 'second draft' });
    const before = await snapshot(TABLES);
    const fault: Fault = {
      label: 'draft audit',
      table: 'audit_events',
      event: 'INSERT',
      when: "NEW.entity_type = 'formulation_revision' AND NEW.action = 'create'"
    };
    const err = await withFailingWrite(fault, () => failureOf(createRevision(c.rhea, first.formulationId, content, first.revisionId)));
    expect(err.message).toContain(INJECTED);
    expect(await snapshot(TABLES)).toEqual(before);
    // The next draft gets number 2: the failed one left no gap and no row.
    expect(await createRevision(c.rhea, first.formulationId, content, first.revisionId)).toMatchObject({ revisionNo: 2 });
  });
});
