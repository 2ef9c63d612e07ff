/** Looks up seeded demo revisions for end-to-end tests and the tour. */
import { testDb } from './accounts';

/** The id of a formulation's approved revision, e.g. KH-W30-90 (seeds/03_formulations.ts: B-450 + GL-530 + YL-568 + RD-625). */
export async function approvedRevisionId(code = 'KH-W30-90'): Promise<number> {
  const knex = testDb();
  try {
    const row = await knex('formulation_revisions as r')
      .join('formulations as f', 'f.id', 'r.formulation_id')
      .where({ 'f.code': code, 'r.state': 'approved' })
      .first('r.id');
    if (!row) throw new Error(`no approved revision of ${code} in the test database`);
    return Number(row.id);
  } finally {
    await knex.destroy();
  }
}

/** The stored content of a formulation's approved revision (a starting point for a new formulation) and its pump's id. */
export async function approvedContent(code = 'KH-W30-90'): Promise<{ content: Record<string, unknown>; pumpId: number }> {
  const knex = testDb();
  try {
    const row = await knex('formulation_revisions as r')
      .join('formulations as f', 'f.id', 'r.formulation_id')
      .where({ 'f.code': code, 'r.state': 'approved' })
      .first('r.content_json');
    if (!row) throw new Error(`no approved revision of ${code} in the test database`);
    const content = JSON.parse(row.content_json) as Record<string, unknown>;
    return { content, pumpId: (content.pump as { materialId: number }).materialId };
  } finally {
    await knex.destroy();
  }
}
