import type { Knex } from 'knex';

/**
 * The last batch number given out per day prefix (BT-YYMMDD-), bumped by one atomic upsert so two
 * batches planned at once never lock a range of `batches`. Starts from the batches already numbered.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('batch_number_counters', (t) => {
    t.string('prefix', 16).primary().comment('BT-YYMMDD- (UTC day)');
    t.integer('last_no').unsigned().notNullable().comment('last sequence number given out under the prefix');
  });
  await knex.raw(
    `INSERT INTO batch_number_counters (prefix, last_no)
     SELECT LEFT(batch_number, 10), MAX(CAST(SUBSTRING(batch_number, 11) AS UNSIGNED))
     FROM batches WHERE batch_number LIKE 'BT-______-%' GROUP BY LEFT(batch_number, 10)`
  );
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('batch_number_counters');
}
