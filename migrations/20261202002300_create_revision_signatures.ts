import type { Knex } from 'knex';

/**
 * Electronic signatures on formulation revisions (append-only by trigger). Each row shows the
 * printed name, UTC time and meaning of the signing and the SHA-256 of the content it binds to
 * (model: 21 CFR 11.50 / 11.70, DOMAIN.md §6).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('revision_signatures', (t) => {
    t.increments('id').unsigned().primary();
    t.integer('revision_id').unsigned().notNullable().references('id').inTable('formulation_revisions').onDelete('RESTRICT');
    t.integer('signer_id').unsigned().notNullable().references('id').inTable('users').onDelete('RESTRICT');
    t.string('signer_name', 200).notNullable();
    t.string('signer_email', 254).notNullable();
    t.string('meaning', 40).notNullable().comment('reviewed or approved');
    t.text('comment').nullable();
    t.timestamp('signed_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3)).comment('UTC');
    t.specificType('content_sha256', 'CHAR(64)').notNullable();
    t.index(['revision_id']);
  });
  await knex.raw(`CREATE TRIGGER revision_signatures_no_update BEFORE UPDATE ON revision_signatures FOR EACH ROW
    SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'revision_signatures is append-only'`);
  await knex.raw(`CREATE TRIGGER revision_signatures_no_delete BEFORE DELETE ON revision_signatures FOR EACH ROW
    SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'revision_signatures is append-only'`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('DROP TRIGGER IF EXISTS revision_signatures_no_delete');
  await knex.raw('DROP TRIGGER IF EXISTS revision_signatures_no_update');
  await knex.schema.dropTable('revision_signatures');
}
