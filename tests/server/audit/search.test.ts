import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import { record } from '../../../src/lib/server/db/audit';
import { auditCsv, auditQuerySchema, eventsFor, searchAudit } from '../../../src/lib/server/audit/search';
import { ROUTE_TABLE } from '../../../src/lib/access/route-table';
import { cast, type Cast } from '../formulations/support';

let c: Cast;
const type = `probe_${Date.now().toString(36)}`;

describe('audit trail search and export', () => {
  beforeAll(async () => {
    c = await cast();
    await record({
      actorId: c.rhea.id,
      actorEmail: c.rhea.email,
      entityType: type,
      entityId: 1,
      action: 'create',
      after: { name: '=HYPERLINK("x")' }
    });
    await record({
      actorId: c.ines.id,
      actorEmail: c.ines.email,
      entityType: type,
      entityId: 1,
      action: 'approve',
      before: { state: 'submitted' },
      after: { state: 'approved' }
    });
    await record({ actorId: c.ines.id, actorEmail: c.ines.email, entityType: type, entityId: '=2+3', action: 'create' });
  });
  afterAll(closeDb);

  it('filters by record type, record, actor and action, newest first, paged on the server', async () => {
    const all = await searchAudit(auditQuerySchema.parse({ entityType: type }));
    expect(all.total).toBe(3);
    expect(all.rows.map((r) => r.action)).toEqual(['create', 'approve', 'create']);
    const byActor = await searchAudit(auditQuerySchema.parse({ entityType: type, actor: String(c.ines.id) }));
    expect(byActor.total).toBe(2);
    const byAction = await searchAudit(auditQuerySchema.parse({ entityType: type, action: 'approve' }));
    expect(byAction.rows[0]).toMatchObject({ actorName: c.ines.name, before: '{"state":"submitted"}' });
    const page2 = await searchAudit(auditQuerySchema.parse({ entityType: type, pageSize: '2', page: '2' }));
    expect(page2).toMatchObject({ total: 3, pages: 2 });
    expect(page2.rows).toHaveLength(1);
    expect((await eventsFor(type, 1)).map((r) => r.action)).toEqual(['create', 'approve']);
  });

  it('filters by UTC date range, "to" including the whole day', async () => {
    const today = new Date().toISOString().slice(0, 10);
    expect((await searchAudit(auditQuerySchema.parse({ entityType: type, from: today, to: today }))).total).toBe(3);
    expect((await searchAudit(auditQuerySchema.parse({ entityType: type, to: '2000-01-01' }))).total).toBe(0);
    expect(auditQuerySchema.safeParse({ from: '2026-12-02', to: '2026-12-01' }).success).toBe(false);
  });

  it('exports CSV (RFC 4180) with a header, UTC times, and formula-like cells escaped', async () => {
    const csv = (await auditCsv(auditQuerySchema.parse({ entityType: type })))!;
    const parsed = Papa.parse<Record<string, string>>(csv, { header: true });
    expect(parsed.meta.fields).toEqual([
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
    ]);
    expect(parsed.data.map((r) => r.action)).toEqual(['create', 'approve', 'create']);
    // The stored codes stay for machines; people read the labels of the one table.
    expect(parsed.data.map((r) => r.event)).toEqual(['Created', 'Approved', 'Created']);
    expect(parsed.data[0].at_utc).toMatch(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z$/);
    // OWASP "CSV injection": a cell starting with "=" is prefixed with a quote mark.
    expect(parsed.data[2].entity_id).toBe("'=2+3");
    expect(csv).not.toMatch(/,=2\+3/);
  });

  it('no route can change or delete audit rows: the audit routes are read-only in the route table', () => {
    const auditRoutes = Object.entries(ROUTE_TABLE).filter(([id]) => id.includes('audit'));
    expect(auditRoutes.length).toBeGreaterThan(0);
    for (const [, rule] of auditRoutes) expect(Object.keys(rule.methods)).toEqual(['GET']);
  });

  it('the table itself refuses UPDATE and DELETE', async () => {
    await expect(db()('audit_events').where({ entity_type: type }).update({ action: 'x' })).rejects.toThrow(/append-only/);
    await expect(db()('audit_events').where({ entity_type: type }).delete()).rejects.toThrow(/append-only/);
    expect((await searchAudit(auditQuerySchema.parse({ entityType: type }))).total).toBe(3);
  });
});
