/** Edit history of a material, read from the append-only audit trail. */
import { db } from '../db/index';
import type { HistoryEntry } from '../../library/types';
import { actionLabel } from '../../audit/labels';

export type { HistoryEntry } from '../../library/types';

const show = (v: unknown) =>
  v === null || v === undefined || v === '' ? '—' : typeof v === 'string' ? (v.length > 60 ? `${v.slice(0, 60)}…` : v) : JSON.stringify(v);

function describe(action: string, before: Record<string, unknown> | null, after: Record<string, unknown> | null): string[] {
  if (action === 'update' && after) return Object.keys(after).map((k) => `${k}: ${show(before?.[k])} → ${show(after[k])}`);
  if (action.endsWith('spectrum-upload') && after) {
    const shape =
      after.peakNm !== undefined
        ? `; peak ${show(before?.peakNm)} → ${show(after.peakNm)} nm, FWHM ${show(before?.fwhmNm)} → ${show(after.fwhmNm)} nm`
        : '';
    return [`${show(after.file)}, ${show(after.points)} points${shape}`];
  }
  if (action === 'lot-add' && after)
    return [`lot ${show(after.lotNumber)}${after.certificate ? ` with certificate ${show(after.certificate)}` : ''}`];
  if (action === 'lot-remove' && before) return [`lot ${show(before.lotNumber)}`];
  if (action.startsWith('attachment') && (after ?? before)) return [show((after ?? before)!.name)];
  return [];
}

const parse = (v: unknown): Record<string, unknown> | null => {
  if (v == null) return null;
  if (typeof v === 'object') return v as Record<string, unknown>;
  try {
    return JSON.parse(String(v));
  } catch {
    return null;
  }
};

export async function forMaterial(materialId: number, limit = 100): Promise<HistoryEntry[]> {
  const rows: Record<string, unknown>[] = await db()('audit_events as a')
    .leftJoin('users as u', 'u.id', 'a.actor_id')
    .where({ 'a.entity_type': 'material', 'a.entity_id': String(materialId) })
    .orderBy('a.id', 'desc')
    .limit(limit)
    .select('a.id', 'a.at', 'a.action', 'a.before_json', 'a.after_json', 'a.actor_email', 'u.name as actor_name');
  return rows.map((r) => ({
    id: Number(r.id),
    at: r.at as Date,
    actor: String(r.actor_name ?? r.actor_email ?? 'system'),
    action: actionLabel(String(r.action)),
    changes: describe(String(r.action), parse(r.before_json), parse(r.after_json))
  }));
}
