/**
 * Reading the append-only audit trail: filtered (entity type, entity id, actor, action, UTC date
 * range), newest first, paged on the server, and as CSV. Nothing here writes to audit_events.
 */
import Papa from 'papaparse';
import { z } from 'zod';
import type { Knex } from 'knex';
import { db } from '../db/index';
import type { AuditRow } from '../../audit/types';
import { actionLabel, entityLabel } from '../../audit/labels';

export type { AuditRow } from '../../audit/types';

const day = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'dates as YYYY-MM-DD');

export const auditQuerySchema = z
  .object({
    entityType: z.string().trim().max(40).default(''),
    entityId: z.string().trim().max(40).default(''),
    actor: z.coerce.number().int().positive().optional(),
    action: z.string().trim().max(60).default(''),
    from: day.optional(),
    to: day.optional(),
    page: z.coerce.number().int().min(1).default(1),
    pageSize: z.coerce.number().int().min(1).max(200).default(50)
  })
  .refine((q) => !q.from || !q.to || q.from <= q.to, 'the "from" date must not be after the "to" date');

export type AuditQuery = z.infer<typeof auditQuerySchema>;

/** CSV rows above this are refused: narrow the filter instead. */
export const MAX_EXPORT_ROWS = 50_000;

function filtered(q: AuditQuery): Knex.QueryBuilder {
  const k = db()('audit_events as a').leftJoin('users as u', 'u.id', 'a.actor_id');
  if (q.entityType) k.where('a.entity_type', q.entityType);
  if (q.entityId) k.where('a.entity_id', q.entityId);
  if (q.actor) k.where('a.actor_id', q.actor);
  if (q.action) k.where('a.action', q.action);
  // Dates are UTC calendar days; "to" includes the whole day.
  if (q.from) k.where('a.at', '>=', new Date(`${q.from}T00:00:00Z`));
  if (q.to) k.where('a.at', '<', new Date(new Date(`${q.to}T00:00:00Z`).getTime() + 86_400_000));
  return k;
}

const COLUMNS = [
  'a.id',
  'a.at',
  'a.actor_id',
  'a.actor_email',
  'u.name as actor_name',
  'a.entity_type',
  'a.entity_id',
  'a.action',
  'a.before_json',
  'a.after_json',
  'a.ip'
];

function toRow(r: Record<string, unknown>): AuditRow {
  return {
    id: Number(r.id),
    at: r.at as Date,
    actorId: (r.actor_id as number | null) ?? null,
    actorEmail: (r.actor_email as string | null) ?? null,
    actorName: (r.actor_name as string | null) ?? null,
    entityType: String(r.entity_type),
    entityId: (r.entity_id as string | null) ?? null,
    action: String(r.action),
    before: (r.before_json as string | null) ?? null,
    after: (r.after_json as string | null) ?? null,
    ip: (r.ip as string | null) ?? null
  };
}

export async function searchAudit(
  q: AuditQuery
): Promise<{ rows: AuditRow[]; total: number; page: number; pageSize: number; pages: number }> {
  const [{ n }] = await filtered(q).count({ n: '*' });
  const total = Number(n);
  const rows: Record<string, unknown>[] = await filtered(q)
    .select(COLUMNS)
    .orderBy('a.id', 'desc')
    .limit(q.pageSize)
    .offset((q.page - 1) * q.pageSize);
  return { rows: rows.map(toRow), total, page: q.page, pageSize: q.pageSize, pages: Math.max(1, Math.ceil(total / q.pageSize)) };
}

/** Every event of one record, oldest first (history panels). */
export async function eventsFor(entityType: string, entityId: number | string): Promise<AuditRow[]> {
  const rows = await filtered(auditQuerySchema.parse({ entityType, entityId: String(entityId) }))
    .select(COLUMNS)
    .orderBy('a.id', 'asc');
  return rows.map(toRow);
}

export async function auditFilterChoices() {
  const [types, actions, actors] = await Promise.all([
    db()('audit_events').distinct('entity_type').orderBy('entity_type').pluck('entity_type'),
    db()('audit_events').distinct('action').orderBy('action').pluck('action'),
    db()('users').orderBy('name').select('id', 'name', 'email')
  ]);
  return { entityTypes: types as string[], actions: actions as string[], actors: actors as { id: number; name: string; email: string }[] };
}

/** The filtered trail as CSV (RFC 4180 quoting by papaparse), oldest first; null when too large. */
export async function auditCsv(q: AuditQuery): Promise<string | null> {
  const [{ n }] = await filtered(q).count({ n: '*' });
  if (Number(n) > MAX_EXPORT_ROWS) return null;
  const rows: AuditRow[] = (await filtered(q).select(COLUMNS).orderBy('a.id', 'asc')).map(toRow);
  return Papa.unparse(
    {
      fields: [
        'id',
        'at_utc',
        'actor_id',
        'actor_email',
        'actor_name',
        'entity_type',
        'record',
        'entity_id',
        'action',
        'event',
        'before',
        'after',
        'ip'
      ],
      data: rows.map((r: AuditRow) => [
        r.id,
        r.at.toISOString(),
        r.actorId ?? '',
        r.actorEmail ?? '',
        r.actorName ?? '',
        r.entityType,
        entityLabel(r.entityType),
        r.entityId ?? '',
        r.action,
        actionLabel(r.action),
        r.before ?? '',
        r.after ?? '',
        r.ip ?? ''
      ])
    },
    { escapeFormulae: true }
  ); // cells starting with = + - @ are escaped so spreadsheets do not run them as formulae
}
