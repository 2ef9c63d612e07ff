/**
 * Where a material is used. Formulation revisions name their pump and phosphors as
 * `"materialId": <id>` inside content_json (src/lib/recipe/schema.ts). The formulations
 * tables may not exist yet in every installation, so each table is looked up first.
 */
import type { Knex } from 'knex';
import { db } from '../db/index';

export interface RevisionUse {
  revisionId: number;
  formulationCode: string | null;
  revisionNo: number | null;
  state: string;
}

/** Revisions whose content names this material, newest first (empty when the formulations feature is absent). */
export async function revisionsUsing(materialId: number, trx?: Knex.Transaction): Promise<RevisionUse[]> {
  const q = trx ?? db();
  if (!(await q.schema.hasTable('formulation_revisions'))) return [];
  const pattern = `"materialId"[[:space:]]*:[[:space:]]*${Math.trunc(materialId)}([^0-9.]|$)`;
  const withFormulations = await q.schema.hasTable('formulations');
  const query = q('formulation_revisions as r').whereRaw('r.content_json REGEXP ?', [pattern]).orderBy('r.id', 'desc').limit(50);
  if (withFormulations)
    query.leftJoin('formulations as f', 'f.id', 'r.formulation_id').select('r.id', 'r.revision_no', 'r.state', 'f.code');
  else query.select('r.id', 'r.revision_no', 'r.state');
  const rows: { id: number; revision_no?: number; state: string; code?: string }[] = await query;
  return rows.map((r) => ({
    revisionId: r.id,
    formulationCode: r.code ?? null,
    revisionNo: r.revision_no ?? null,
    state: String(r.state)
  }));
}

export function describeUse(u: RevisionUse): string {
  const name = u.formulationCode ? `${u.formulationCode} rev. ${u.revisionNo ?? '?'}` : `revision ${u.revisionId}`;
  return `${name} (${u.state})`;
}

/** Why this material may not be deleted, or null when nothing refers to it. */
export function deletionRefusal(code: string, uses: RevisionUse[]): string | null {
  if (uses.length === 0) return null;
  const approved = uses.filter((u) => u.state === 'approved');
  const listed = (approved.length ? approved : uses).slice(0, 5).map(describeUse).join(', ');
  const what = approved.length
    ? `approved formulation${approved.length > 1 ? 's' : ''}`
    : `formulation revision${uses.length > 1 ? 's' : ''}`;
  return (
    `${code} cannot be deleted: it is used by ${what} ` +
    `${listed}${uses.length > 5 ? ' and others' : ''}. Archive it instead — archived ` +
    `materials leave the pick lists but keep existing records intact.`
  );
}
