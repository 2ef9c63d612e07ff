/** Append-only audit trail (the table refuses UPDATE and DELETE by trigger). */
import type { Knex } from 'knex';
import { db } from './index';

export interface AuditInput {
  actorId?: number | null;
  actorEmail?: string | null;
  entityType: string;
  entityId?: string | number | null;
  action: string;
  before?: unknown;
  after?: unknown;
  ip?: string | null;
}

export async function record(input: AuditInput, trx?: Knex.Transaction): Promise<void> {
  await (trx ?? db())('audit_events').insert({
    actor_id: input.actorId ?? null,
    actor_email: input.actorEmail ?? null,
    entity_type: input.entityType,
    entity_id: input.entityId == null ? null : String(input.entityId),
    action: input.action,
    before_json: input.before === undefined ? null : JSON.stringify(input.before),
    after_json: input.after === undefined ? null : JSON.stringify(input.after),
    ip: input.ip ?? null
  });
}
