/** Why a revision was submitted although its prediction misses its aim (tolerance or floors); null otherwise. */
import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('formulation_revisions', (t) => {
    t.string('off_aim_reason', 2000).nullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('formulation_revisions', (t) => {
    t.dropColumn('off_aim_reason');
  });
}
