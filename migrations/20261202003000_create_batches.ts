import type { Knex } from 'knex';

/**
 * Production batches weighed out from an approved formulation revision. The weigh-out parameters
 * are copied here (and the full request in input_json) so the record stays readable and can be
 * recomputed exactly. States: planned → weighing → complete; released/rejected are set by quality.
 * `version` is the optimistic-lock counter of batch-level commands.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('batches', (t) => {
    t.increments('id').unsigned().primary();
    t.string('batch_number', 40).notNullable().unique().comment('printed as Code 128 and QR, e.g. BT-261202-003');
    t.integer('revision_id').unsigned().notNullable().references('id').inTable('formulation_revisions').onDelete('RESTRICT');
    t.string('formulation_code', 40).notNullable();
    t.string('formulation_name', 200).notNullable();
    t.integer('revision_no').unsigned().notNullable();
    t.enu('state', ['planned', 'weighing', 'complete', 'released', 'rejected']).notNullable().defaultTo('planned');
    t.enu('sizing_kind', ['mass', 'parts']).notNullable();
    t.decimal('batch_mass_g', 14, 6).notNullable().comment('finished slurry, g (sum of the line targets)');
    t.integer('part_count').unsigned().nullable();
    t.decimal('dispense_mass_g', 12, 6).nullable().comment('slurry per part, g');
    t.decimal('yield_loss_pct', 6, 3).nullable();
    t.enu('loading_basis', ['wtPctOfSlurry', 'phr']).notNullable();
    t.decimal('total_loading_pct', 10, 4).nullable().comment('total phosphor loading on the basis when set as a total');
    t.decimal('phosphor_wt_pct', 10, 4).notNullable().comment('phosphor share of the slurry, wt %');
    t.decimal('phosphor_phr', 10, 4).notNullable().comment('phosphor per hundred parts of silicone');
    t.integer('silicone_system_id').unsigned().nullable().references('id').inTable('silicone_systems').onDelete('RESTRICT');
    t.string('silicone_name', 200).notNullable();
    t.decimal('ratio_a', 6, 2).notNullable().comment('parts by weight of part A');
    t.decimal('ratio_b', 6, 2).notNullable().comment('parts by weight of part B');
    t.integer('pot_life_min').unsigned().notNullable();
    t.integer('plant_limit_min').unsigned().nullable().comment('plant slurry-age limit, min');
    t.decimal('resolution_g', 10, 6).notNullable().comment('balance readability d, g');
    t.decimal('min_weight_g', 12, 6).notNullable();
    t.string('balance_ref', 80).nullable();
    t.text('input_json', 'mediumtext').notNullable().comment('the weigh-out input the plan was computed from');
    t.text('target_json').notNullable().comment('target colour point, bin and tolerance as printed');
    t.text('notes').nullable();
    t.timestamp('mixed_at', { precision: 3 }).nullable().comment('part B mixed in (UTC)');
    t.timestamp('slurry_expires_at', { precision: 3 }).nullable();
    t.integer('mixed_by').unsigned().nullable().references('id').inTable('users').onDelete('RESTRICT');
    t.timestamp('completed_at', { precision: 3 }).nullable();
    t.integer('completed_by').unsigned().nullable().references('id').inTable('users').onDelete('RESTRICT');
    t.integer('record_file_id').unsigned().nullable().references('id').inTable('stored_files').onDelete('RESTRICT');
    t.integer('version').unsigned().notNullable().defaultTo(1);
    t.integer('created_by').unsigned().notNullable().references('id').inTable('users').onDelete('RESTRICT');
    t.timestamp('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.timestamp('updated_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    t.index(['state', 'created_at']);
    t.index(['revision_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('batches');
}
