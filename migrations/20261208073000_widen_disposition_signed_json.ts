import type { Knex } from 'knex';

/**
 * A disposition's signed content binds every measured part's result; a lot of 100,000 parts with long part
 * labels runs past MEDIUMTEXT's 16 MB, so the canonical JSON moves to LONGTEXT. The append-only triggers
 * stay (MODIFY keeps them). Down refuses, rather than cut, a stored document longer than 16 MB (strict mode).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw(
    "ALTER TABLE batch_dispositions MODIFY signed_json LONGTEXT NOT NULL COMMENT 'canonical JSON the hash was taken of'"
  );
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw(
    "ALTER TABLE batch_dispositions MODIFY signed_json MEDIUMTEXT NOT NULL COMMENT 'canonical JSON the hash was taken of'"
  );
}
