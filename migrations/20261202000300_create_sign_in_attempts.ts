import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('sign_in_attempts', (t) => {
    t.bigIncrements('id').unsigned().primary();
    t.string('email', 254).notNullable().comment('as typed, lower-cased');
    t.boolean('succeeded').notNullable();
    t.string('ip', 64).nullable();
    t.timestamp('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.index(['email', 'created_at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('sign_in_attempts');
}
