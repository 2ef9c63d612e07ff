import type { Knex } from 'knex';

/**
 * Release or rejection of a batch by quality, with the electronic signature: printed name, UTC time,
 * meaning, comment, and the SHA-256 of the canonical JSON that was signed (kept beside it so the
 * hash can be checked later). One per batch; append-only by trigger (model: 21 CFR 11.50/11.70).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('batch_dispositions', (t) => {
    t.increments('id').unsigned().primary();
    t.integer('batch_id').unsigned().notNullable().unique().references('id').inTable('batches').onDelete('RESTRICT');
    t.enu('decision', ['released', 'rejected']).notNullable();
    t.integer('signer_id').unsigned().notNullable().references('id').inTable('users').onDelete('RESTRICT');
    t.string('signer_name', 200).notNullable();
    t.string('signer_email', 254).notNullable();
    t.string('meaning', 120).notNullable();
    t.text('comment').notNullable();
    t.timestamp('signed_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3)).comment('UTC');
    t.specificType('content_sha256', 'CHAR(64)').notNullable();
    t.text('signed_json', 'mediumtext').notNullable().comment('canonical JSON the hash was taken of');
    t.integer('record_file_id').unsigned().nullable().references('id').inTable('stored_files').onDelete('RESTRICT');
  });
  await knex.raw(`CREATE TRIGGER batch_dispositions_no_delete BEFORE DELETE ON batch_dispositions FOR EACH ROW
    SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'batch_dispositions is append-only'`);
  await knex.raw(`CREATE TRIGGER batch_dispositions_signed_fields BEFORE UPDATE ON batch_dispositions FOR EACH ROW
    BEGIN
      IF NOT (NEW.batch_id <=> OLD.batch_id AND NEW.decision <=> OLD.decision AND NEW.signer_id <=> OLD.signer_id
        AND NEW.meaning <=> OLD.meaning AND NEW.comment <=> OLD.comment AND NEW.signed_at <=> OLD.signed_at
        AND NEW.content_sha256 <=> OLD.content_sha256 AND NEW.signed_json <=> OLD.signed_json
        AND NEW.signer_name <=> OLD.signer_name AND NEW.signer_email <=> OLD.signer_email)
      THEN SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'a signed disposition cannot be changed';
      END IF;
    END`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('DROP TRIGGER IF EXISTS batch_dispositions_signed_fields');
  await knex.raw('DROP TRIGGER IF EXISTS batch_dispositions_no_delete');
  await knex.schema.dropTable('batch_dispositions');
}
