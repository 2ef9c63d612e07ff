/**
 * Demo batches of Kestrel Hollow Lighting (invented): one completed weigh-out with lots, a red line
 * just above its range accepted by quality, and one planned batch — both from the approved
 * revision of KH-W30-90. Skips itself when the formulations or materials demo data are absent.
 * The batch record PDF of the completed batch is generated on download (no object is stored here).
 */
import type { Knex } from 'knex';
import { computeWeighout, type WeighoutPlan } from '../src/lib/batches/weighout/compute';
import { weighoutInputFromRevision } from '../src/lib/batches/weighout/from-revision';
import { describeTarget } from '../src/lib/batches/weighout/target';
import { checkActual } from '../src/lib/batches/weighout/actual';
import { Rat } from '../src/lib/batches/weighout/rational';
import { parseRecipe } from '../src/lib/recipe';
import type { CreateBatchRequest } from '../src/lib/batches/schema';

const email = (handle: string) => `${handle}@kestrelhollow.example`;

interface DemoBatch {
  number: string;
  by: string;
  createdAt: string;
  request: Omit<CreateBatchRequest, 'revisionId'>;
  /** Reading offsets from target in balance steps, per line (null = planned, not weighed). */
  offsets: number[] | null;
}

const DEMO: DemoBatch[] = [
  {
    number: 'BT-261201-001',
    by: 'tomas.brand',
    createdAt: '2026-12-01T08:10:00Z',
    offsets: [3, -2, 1, 20, -4],
    request: {
      sizing: { kind: 'mass', batchMassG: 40 },
      loading: { mode: 'perPhosphor', basis: 'wtPctOfSlurry' },
      additives: [],
      balance: { resolutionG: 0.001, minWeightG: 0.05, ref: 'BAL-03' },
      plantLimitMin: 120
    }
  },
  {
    number: 'BT-261202-001',
    by: 'mira.castellan',
    createdAt: '2026-12-02T07:45:00Z',
    offsets: null,
    request: {
      sizing: { kind: 'parts', partCount: 800, dispenseMassG: 0.02, yieldLossPct: 15 },
      loading: { mode: 'perPhosphor', basis: 'wtPctOfSlurry' },
      additives: [{ code: 'FS-200', name: 'fumed silica (anti-settling)', pct: 1, tolerance: { kind: 'g', value: 0.005 } }],
      balance: { resolutionG: 0.001, minWeightG: 0.05, ref: 'BAL-03' },
      plantLimitMin: 120
    }
  }
];

function lineRows(batchId: number, plan: WeighoutPlan) {
  return plan.lines.map((l) => ({
    batch_id: batchId,
    seq: l.seq,
    role: l.role,
    material_id: l.materialId,
    code: l.code,
    name: l.name,
    basis_pct: l.basisPct,
    ideal_g: l.idealG,
    target_g: l.targetG,
    low_g: l.lowG,
    high_g: l.highG,
    tolerance_kind: l.tolerance.kind,
    tolerance_value: l.tolerance.value
  }));
}

export async function seed(knex: Knex): Promise<void> {
  if (!(await knex.schema.hasTable('formulation_revisions')) || !(await knex.schema.hasTable('batches'))) return;
  const rev = await knex('formulation_revisions as r')
    .join('formulations as f', 'f.id', 'r.formulation_id')
    .where({ 'f.code': 'KH-W30-90', 'r.state': 'approved' })
    .first('r.*', 'f.code', 'f.name');
  if (!rev) {
    console.log('seed 04_batches: no approved KH-W30-90 revision; demo batches skipped.');
    return;
  }
  const content = parseRecipe(rev.content_json);
  const people = new Map(
    (await knex('users').whereIn('email', ['tomas.brand', 'mira.castellan', 'ines.halloran'].map(email)).select('id', 'email', 'name')).map(
      (u) => [u.email.split('@')[0] as string, u as { id: number; email: string; name: string }]
    )
  );
  if (people.size < 3) return;
  for (const b of DEMO) {
    if (await knex('batches').where({ batch_number: b.number }).first('id')) continue;
    const built = weighoutInputFromRevision(content, b.request);
    const result = built.ok ? computeWeighout(built.input) : null;
    if (!built.ok || !result?.ok) {
      console.log(`seed 04_batches: ${b.number} cannot be planned from the demo revision; skipped.`);
      continue;
    }
    const plan = result.plan;
    const author = people.get(b.by)!;
    const created = new Date(b.createdAt);
    await knex.transaction(async (trx) => {
      const [id] = await trx('batches').insert({
        batch_number: b.number,
        revision_id: rev.id,
        formulation_code: rev.code,
        formulation_name: rev.name,
        revision_no: rev.revision_no,
        state: 'planned',
        sizing_kind: b.request.sizing.kind,
        part_count: b.request.sizing.kind === 'parts' ? b.request.sizing.partCount : null,
        dispense_mass_g: b.request.sizing.kind === 'parts' ? b.request.sizing.dispenseMassG : null,
        yield_loss_pct: b.request.sizing.kind === 'parts' ? b.request.sizing.yieldLossPct : null,
        loading_basis: b.request.loading.basis,
        total_loading_pct: null,
        batch_mass_g: plan.batchMassG,
        phosphor_wt_pct: plan.phosphorWtPctOfSlurry,
        phosphor_phr: plan.phosphorPhr,
        silicone_system_id: content.silicone.siliconeSystemId,
        silicone_name: content.silicone.name,
        ratio_a: content.silicone.ratioA,
        ratio_b: content.silicone.ratioB,
        pot_life_min: content.silicone.potLifeMin,
        plant_limit_min: b.request.plantLimitMin ?? null,
        resolution_g: plan.resolutionG,
        min_weight_g: plan.minWeightG,
        balance_ref: b.request.balance.ref ?? null,
        input_json: JSON.stringify(built.input),
        target_json: JSON.stringify(describeTarget(content.target, content.tolerance)),
        created_by: author.id,
        created_at: created,
        updated_at: created
      });
      await trx('batch_lines').insert(lineRows(id, plan));
      await trx('audit_events').insert({
        actor_id: author.id,
        actor_email: author.email,
        entity_type: 'batch',
        entity_id: String(id),
        action: 'create',
        after_json: JSON.stringify({ batchNumber: b.number, seed: true }),
        at: created
      });
      if (!b.offsets) return;
      // Weighed 20 minutes after planning, one line a minute; lots: the newest lot of each material.
      const res = Rat.parse(plan.resolutionG)!;
      const quality = people.get('ines.halloran')!;
      for (const [i, l] of plan.lines.entries()) {
        const lot = l.materialId
          ? await trx('material_lots')
              .where({ material_id: l.materialId })
              .orderBy('created_at', 'desc')
              .orderBy('id', 'desc')
              .first('id', 'lot_number')
          : null;
        if (l.materialId && !lot) return; // a material without lots: leave the batch planned
        const reading = new Rat(BigInt(l.targetSteps + b.offsets[i])).mul(res);
        const check = checkActual(reading, l);
        const at = new Date(created.getTime() + (20 + i) * 60_000);
        await trx('batch_lines')
          .where({ batch_id: id, seq: l.seq })
          .update({
            actual_g: reading.toDecimal(),
            actual_status: check.status,
            lot_id: lot?.id ?? null,
            lot_number: lot?.lot_number ?? (l.role === 'siliconeA' ? 'BKF-LX11A-2611' : 'BKF-LX11B-2611'),
            weighed_by: author.id,
            weighed_at: at,
            version: 2,
            ...(check.status === 'in'
              ? {}
              : {
                  override_by: quality.id,
                  override_at: new Date(at.getTime() + 6 * 60_000),
                  override_reason: 'Red line 0.6 % high: inside the colour window of the revision; batch may proceed.',
                  version: 3
                })
          });
      }
      const mixed = new Date(created.getTime() + 30 * 60_000);
      const done = new Date(created.getTime() + 38 * 60_000);
      await trx('batches')
        .where({ id })
        .update({
          state: 'complete',
          mixed_at: mixed,
          slurry_expires_at: new Date(
            mixed.getTime() + Math.min(content.silicone.potLifeMin, b.request.plantLimitMin ?? Infinity) * 60_000
          ),
          mixed_by: author.id,
          completed_at: done,
          completed_by: author.id,
          version: 4,
          updated_at: done
        });
      await trx('audit_events').insert({
        actor_id: author.id,
        actor_email: author.email,
        entity_type: 'batch',
        entity_id: String(id),
        action: 'complete',
        after_json: JSON.stringify({ state: 'complete', seed: true }),
        at: done
      });
    });
  }
}
