import type { Knex } from 'knex';

/** Package model versions are immutable: the database refuses UPDATE and DELETE on them. */
export async function up(knex: Knex): Promise<void> {
  await knex.raw(`CREATE TRIGGER package_models_no_update BEFORE UPDATE ON package_models FOR EACH ROW
    SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'package model versions are immutable; fit a new version'`);
  await knex.raw(`CREATE TRIGGER package_models_no_delete BEFORE DELETE ON package_models FOR EACH ROW
    SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'package model versions are immutable; fit a new version'`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('DROP TRIGGER IF EXISTS package_models_no_delete');
  await knex.raw('DROP TRIGGER IF EXISTS package_models_no_update');
}
