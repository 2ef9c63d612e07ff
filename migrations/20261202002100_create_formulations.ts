import type { Knex } from 'knex';

/** A formulation: the named product recipe the line builds from; its content lives in revisions. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('formulations', (t) => {
    t.increments('id').unsigned().primary();
    t.string('code', 40).notNullable().unique().comment('e.g. KH-W30-90');
    t.string('name', 200).notNullable();
    t.text('description').nullable();
    t.integer('version').unsigned().notNullable().defaultTo(1).comment('optimistic-lock counter');
    t.integer('created_by').unsigned().nullable().references('id').inTable('users').onDelete('RESTRICT');
    t.timestamp('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.timestamp('updated_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.index(['name']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('formulations');
}
