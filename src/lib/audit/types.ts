/** An audit event as the audit pages and panels show it (read on the server from audit_events). */

export interface AuditRow {
  id: number;
  at: Date;
  actorId: number | null;
  actorEmail: string | null;
  actorName: string | null;
  entityType: string;
  entityId: string | null;
  action: string;
  before: string | null;
  after: string | null;
  ip: string | null;
}
