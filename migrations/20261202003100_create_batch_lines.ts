import type { Knex } from 'knex';

/**
 * Lines of a batch in weighing order: the planned target and allowed range (balance steps of the
 * batch), then the actual reading, the lot used, who weighed it and when, and a quality decision
 * when the reading was outside its range. `version` is the optimistic-lock counter of the line.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('batch_lines', (t) => {
    t.increments('id').unsigned().primary();
    t.integer('batch_id').unsigned().notNullable().references('id').inTable('batches').onDelete('CASCADE');
    t.integer('seq').unsigned().notNullable().comment('weighing order, 1-based');
    t.enu('role', ['siliconeA', 'phosphor', 'additive', 'siliconeB']).notNullable();
    t.integer('material_id').unsigned().nullable().references('id').inTable('materials').onDelete('RESTRICT');
    t.string('code', 40).notNullable();
    t.string('name', 200).notNullable();
    t.decimal('basis_pct', 10, 4).nullable().comment('loading on the batch basis (wt % of slurry or phr)');
    t.decimal('ideal_g', 20, 10).notNullable().comment('exact mass before rounding, g');
    t.decimal('target_g', 14, 6).notNullable();
    t.decimal('low_g', 14, 6).notNullable();
    t.decimal('high_g', 14, 6).notNullable();
    t.enu('tolerance_kind', ['pct', 'g']).notNullable();
    t.decimal('tolerance_value', 12, 6).notNullable();
    t.decimal('actual_g', 14, 7).nullable().comment('balance reading, g');
    t.enu('actual_status', ['in', 'below', 'above']).nullable();
    t.integer('lot_id').unsigned().nullable().references('id').inTable('material_lots').onDelete('RESTRICT');
    t.string('lot_number', 80).nullable().comment('as scanned; for lines without a library material the only lot record');
    t.integer('weighed_by').unsigned().nullable().references('id').inTable('users').onDelete('RESTRICT');
    t.timestamp('weighed_at', { precision: 3 }).nullable();
    t.integer('override_by').unsigned().nullable().references('id').inTable('users').onDelete('RESTRICT');
    t.timestamp('override_at', { precision: 3 }).nullable();
    t.text('override_reason').nullable();
    t.integer('version').unsigned().notNullable().defaultTo(1);
    t.unique(['batch_id', 'seq']);
    t.index(['lot_id']);
    t.index(['lot_number']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('batch_lines');
}
