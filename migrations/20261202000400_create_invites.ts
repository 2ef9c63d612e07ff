import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('invites', (t) => {
    t.increments('id').unsigned().primary();
    t.string('email', 254).notNullable();
    t.string('roles', 200).notNullable().comment('comma-separated role names');
    t.string('token_hash', 64).notNullable().unique().comment('sha256 hex of the one-time token');
    t.integer('invited_by').unsigned().nullable().references('id').inTable('users').onDelete('SET NULL');
    t.timestamp('expires_at').notNullable();
    t.timestamp('used_at').nullable();
    t.timestamp('created_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('invites');
}
