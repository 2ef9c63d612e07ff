import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db, closeDb } from '../../../src/lib/server/db/index';
import * as editing from '../../../src/lib/server/library/editing';
import { revisionsUsing } from '../../../src/lib/server/library/usage';
import { demoUser, phosphorFields, removeTestMaterials } from './support';
import type { User } from '../../../src/lib/server/accounts/users';

// Formulation revisions name materials as "materialId": <id> in content_json (src/lib/recipe/schema.ts).
// Before the formulations feature lands, this test creates minimal stand-in tables and drops them afterwards;
// after it lands, it writes rows into the real tables through their contract columns.
let created = false;
let rhea: User;
const formulationIds: number[] = [];

async function addRevision(
  state: 'draft' | 'submitted' | 'approved' | 'returned' | 'superseded' | 'withdrawn',
  contentJson: string
): Promise<void> {
  const [fid] = await db()('formulations').insert({
    code: `TST-F${Date.now() % 1e7}${formulationIds.length}`,
    name: 'usage probe',
    description: '',
    created_by: rhea.id
  });
  formulationIds.push(fid);
  await db()('formulation_revisions').insert({
    formulation_id: fid,
    revision_no: 1,
    state,
    content_json: contentJson,
    predicted_json: '{}',
    core_version: 'test',
    content_sha256: '0'.repeat(64),
    version: 1,
    created_by: rhea.id
  });
}

describe('deleting a material that formulations use', () => {
  beforeAll(async () => {
    await removeTestMaterials();
    rhea = await demoUser('formulator');
    if (!(await db().schema.hasTable('formulation_revisions'))) {
      created = true;
      await db().schema.createTable('formulations', (t) => {
        t.increments('id');
        t.string('code', 40).unique();
        t.string('name', 200);
        t.text('description');
        t.integer('created_by');
      });
      await db().schema.createTable('formulation_revisions', (t) => {
        t.increments('id');
        t.integer('formulation_id').unsigned();
        t.integer('revision_no');
        t.string('state', 20);
        t.text('content_json', 'mediumtext');
        t.text('predicted_json');
        t.string('core_version', 40);
        t.string('content_sha256', 64);
        t.integer('version');
        t.integer('created_by');
      });
    }
  });
  afterAll(async () => {
    // Revisions that left draft are permanent (the database refuses their deletion), so the test's
    // formulations stay behind under their own TST- codes.
    if (created) {
      await db().schema.dropTable('formulation_revisions');
      await db().schema.dropTable('formulations');
    }
    await removeTestMaterials();
    await closeDb();
  });

  it('refuses with the reason while an approved formulation uses it, and nothing is deleted', async () => {
    const id = await editing.create(rhea, 'phosphor', phosphorFields('TST-D1'));
    const content = JSON.stringify({
      pump: { materialId: 1, code: 'B-450', name: 'B-450' },
      phosphors: [{ materialId: id, code: 'TST-D1', name: 'x', opticalFraction: 0.7, wtPct: null }]
    });
    await addRevision('approved', content);
    await expect(editing.remove(rhea, id)).rejects.toMatchObject({
      status: 409,
      message: expect.stringMatching(
        /TST-D1 cannot be deleted: it is used by approved formulation TST-F\d+ rev\. 1 \(approved\).*Archive it instead/
      )
    });
    expect(await db()('materials').where({ id }).first()).toBeDefined();
  });

  it('matches the id exactly, with or without a space after the colon', async () => {
    const id = await editing.create(rhea, 'phosphor', phosphorFields('TST-D2'));
    await addRevision('draft', `{"pump": {"materialId": 1}, "phosphors": [{"materialId": ${id}0}, {"materialId":${id}1}]}`);
    expect(await revisionsUsing(id)).toEqual([]);
    await addRevision('draft', `{"pump": {"materialId": 1}, "phosphors": [{"materialId": ${id}}]}`);
    expect((await revisionsUsing(id)).map((u) => u.state)).toEqual(['draft']);
    await expect(editing.remove(rhea, id)).rejects.toMatchObject({
      status: 409,
      message: expect.stringMatching(/formulation revision .*\(draft\)/)
    });
  });

  it('deletes an unused material with its spectra, lots and audit record', async () => {
    const id = await editing.create(rhea, 'phosphor', phosphorFields('TST-D3'));
    await db()('material_lots').insert({ material_id: id, lot_number: 'TST-LOT-1' });
    await editing.remove(rhea, id);
    expect(await db()('materials').where({ id }).first()).toBeUndefined();
    expect(await db()('material_lots').where({ material_id: id }).first()).toBeUndefined();
    expect(
      await db()('audit_events')
        .where({ entity_type: 'material', entity_id: String(id), action: 'delete' })
        .first()
    ).toBeDefined();
  });
});
