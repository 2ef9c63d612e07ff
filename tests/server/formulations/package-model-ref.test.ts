import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import { createFormulationWithDraft, createRevision, updateDraft } from '../../../src/lib/server/formulations/save';
import { getRevision } from '../../../src/lib/server/formulations/read';
import { DomainError } from '../../../src/lib/errors/domain-error';
import { statusOf } from '../../../src/lib/server/http/status';
import { cast, uniqueCode, warmWhite, type Cast } from './support';

// A revision cites the package model its wt % were designed for, by id and version (versions are
// immutable). The citation is stored in the content (version 2) and read back; a citation of a model
// or version that does not exist is refused with 422 and nothing is saved.
let c: Cast;
let model: { id: number; version: number };
const count = async (table: string) => Number(((await db()(table).count({ n: '*' }).first()) as { n: number }).n);

describe('revisions citing a package model', () => {
  beforeAll(async () => {
    c = await cast();
    const row = await db()('package_models').orderBy('id').first('id', 'version');
    expect(row, 'the seeded demo package model').toBeTruthy();
    model = { id: Number(row.id), version: Number(row.version) };
  });
  afterAll(closeDb);

  it('stores the reference in the content (written as the current version, 3) and returns it', async () => {
    const content = { ...(await warmWhite()), contentVersion: 2, packageModelRef: model };
    const made = await createFormulationWithDraft(c.rhea, { code: uniqueCode('PM'), name: 'Cites a package model', content });
    const row = await db()('formulation_revisions').where({ id: made.revisionId }).first('content_json');
    expect(JSON.parse(row!.content_json)).toMatchObject({ contentVersion: 3, packageModelRef: model });
    expect((await getRevision(made.revisionId))!.content.packageModelRef).toEqual(model);
  });

  it('writes version 1 content sent by a client as the current version (3), citing no package model', async () => {
    const made = await createFormulationWithDraft(c.rhea, { code: uniqueCode('PM'), name: 'Version 1 body', content: await warmWhite() });
    const row = await db()('formulation_revisions').where({ id: made.revisionId }).first('content_json');
    expect(JSON.parse(row!.content_json)).toMatchObject({ contentVersion: 3, packageModelRef: null, binRecipes: [] });
  });

  const missing = (): [string, { id: number; version: number }][] => [
    ['a model that does not exist', { id: 2_000_000_000, version: 1 }],
    ['a version the model does not have', { id: model.id, version: model.version + 1000 }]
  ];
  it('refuses a citation of a model or version that does not exist (422) and saves nothing', async () => {
    for (const [what, ref] of missing()) {
      const before = { f: await count('formulations'), r: await count('formulation_revisions') };
      const content = { ...(await warmWhite()), contentVersion: 2, packageModelRef: ref };
      const err = await createFormulationWithDraft(c.rhea, { code: uniqueCode('PM'), name: what, content }).catch((e: unknown) => e);
      expect(err, what).toBeInstanceOf(DomainError);
      expect(statusOf(err as DomainError)).toBe(422);
      const named = new RegExp(`packageModelRef: package model ${ref.id} version ${ref.version} does not exist`);
      expect((err as DomainError).message).toMatch(named);
      expect({ f: await count('formulations'), r: await count('formulation_revisions') }).toEqual(before);
    }
  });

  it('refuses the same on a new revision and on a draft edit', async () => {
    const made = await createFormulationWithDraft(c.rhea, { code: uniqueCode('PM'), name: 'Edited draft', content: await warmWhite() });
    const bad = { ...(await warmWhite()), contentVersion: 2, packageModelRef: { id: 2_000_000_000, version: 1 } };
    await expect(createRevision(c.rhea, made.formulationId, bad)).rejects.toMatchObject({ kind: 'unprocessable' });
    await expect(updateDraft(c.rhea, made.revisionId, 1, bad)).rejects.toMatchObject({ kind: 'unprocessable' });
    expect((await getRevision(made.revisionId))!.content.packageModelRef).toBeNull();
  });
});
