import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import { createFormulationWithDraft, updateDraft } from '../../../src/lib/server/formulations/save';
import { sign, submit } from '../../../src/lib/server/formulations/workflow';
import { ConflictError } from '../../../src/lib/server/formulations/errors';
import { DEMO_PASSWORD, cast, uniqueCode, warmWhite, type Cast } from './support';

// Once a revision leaves draft its record is fixed: the database refuses changes by trigger,
// whatever path the change comes from (model: 21 CFR 11.10(e)).
let c: Cast;
let submittedId = 0;
let approvedId = 0;

async function fresh(author: Cast['rhea']) {
  const code = uniqueCode('IMM');
  return createFormulationWithDraft(author, { code, name: code, content: await warmWhite() });
}

describe('immutability of submitted and approved revisions', () => {
  beforeAll(async () => {
    c = await cast();
    submittedId = (await fresh(c.rhea)).revisionId;
    await submit(c.rhea, submittedId);
    approvedId = (await fresh(c.rhea)).revisionId;
    await submit(c.rhea, approvedId);
    await sign(c.ines, approvedId, 'approved', { password: DEMO_PASSWORD, comment: '' });
  });
  afterAll(closeDb);

  it('the service refuses to edit a submitted or approved revision (409) and the row is unchanged', async () => {
    for (const id of [submittedId, approvedId]) {
      const before = (await db()('formulation_revisions').where({ id }).first())!;
      await expect(updateDraft(c.rhea, id, before.version, await warmWhite({ notes: 'sneaky change' }))).rejects.toBeInstanceOf(
        ConflictError
      );
      expect(await db()('formulation_revisions').where({ id }).first()).toEqual(before);
    }
  });

  it('the database refuses a direct UPDATE of content, prediction or hash once the state is not draft', async () => {
    for (const id of [submittedId, approvedId]) {
      const before = await db()('formulation_revisions').where({ id }).first();
      await expect(db()('formulation_revisions').where({ id }).update({ content_json: '{}' })).rejects.toThrow(
        /locked once it leaves draft/
      );
      await expect(db()('formulation_revisions').where({ id }).update({ predicted_json: '{}' })).rejects.toThrow(/locked/);
      await expect(
        db()('formulation_revisions')
          .where({ id })
          .update({ content_sha256: '0'.repeat(64) })
      ).rejects.toThrow(/locked/);
      await expect(db()('formulation_revisions').where({ id }).delete()).rejects.toThrow(/cannot be deleted/);
      expect(await db()('formulation_revisions').where({ id }).first()).toEqual(before);
    }
  });

  it('the database refuses state changes outside the state machine (e.g. approved → draft, submitted → superseded)', async () => {
    await expect(db()('formulation_revisions').where({ id: approvedId }).update({ state: 'draft' })).rejects.toThrow(
      /transition not allowed/
    );
    await expect(db()('formulation_revisions').where({ id: submittedId }).update({ state: 'superseded' })).rejects.toThrow(
      /transition not allowed/
    );
  });

  it('e-signatures and audit rows are append-only', async () => {
    await expect(db()('revision_signatures').where({ revision_id: approvedId }).update({ meaning: 'reviewed' })).rejects.toThrow(
      /append-only/
    );
    await expect(db()('revision_signatures').where({ revision_id: approvedId }).delete()).rejects.toThrow(/append-only/);
    await expect(
      db()('audit_events')
        .where({ entity_type: 'formulation_revision', entity_id: String(approvedId) })
        .update({ action: 'x' })
    ).rejects.toThrow(/append-only/);
    await expect(
      db()('audit_events')
        .where({ entity_type: 'formulation_revision', entity_id: String(approvedId) })
        .delete()
    ).rejects.toThrow(/append-only/);
  });
});
