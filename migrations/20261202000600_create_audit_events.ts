import type { Knex } from 'knex';

/** Append-only audit trail: triggers refuse UPDATE and DELETE at the database itself. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('audit_events', (t) => {
    t.bigIncrements('id').unsigned().primary();
    t.timestamp('at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3)).comment('UTC');
    t.integer('actor_id').unsigned().nullable().references('id').inTable('users').onDelete('RESTRICT');
    t.string('actor_email', 254).nullable();
    t.string('entity_type', 40).notNullable();
    t.string('entity_id', 40).nullable();
    t.string('action', 60).notNullable();
    t.text('before_json', 'mediumtext').nullable();
    t.text('after_json', 'mediumtext').nullable();
    t.string('ip', 64).nullable();
    t.index(['entity_type', 'entity_id']);
    t.index(['at']);
  });
  await knex.raw(`CREATE TRIGGER audit_events_no_update BEFORE UPDATE ON audit_events FOR EACH ROW
    SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'audit_events is append-only'`);
  await knex.raw(`CREATE TRIGGER audit_events_no_delete BEFORE DELETE ON audit_events FOR EACH ROW
    SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'audit_events is append-only'`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('DROP TRIGGER IF EXISTS audit_events_no_delete');
  await knex.raw('DROP TRIGGER IF EXISTS audit_events_no_update');
  await knex.schema.dropTable('audit_events');
}
