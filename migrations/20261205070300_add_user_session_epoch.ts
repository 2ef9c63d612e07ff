/**
 * A per-user session epoch: every signed-in session carries the epoch it began in, and a session
 * from an older epoch is refused. Sign-out, deactivation and a role change move the epoch on, so
 * they end every session of the user at once; reactivation never moves it back.
 */
import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('users', (t) => {
    t.integer('session_epoch').unsigned().notNullable().defaultTo(0);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('users', (t) => {
    t.dropColumn('session_epoch');
  });
}
