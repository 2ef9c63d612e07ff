/** Planned lines → batch_lines rows. */
import type { PlannedLine } from '../../batches/weighout/compute';

export function lineRowsFor(batchId: number, lines: PlannedLine[]) {
  return lines.map((l) => ({
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

/** Batch columns that follow from a plan (set on create and on scaling). */
export function planColumns(plan: { batchMassG: string; phosphorWtPctOfSlurry: number; phosphorPhr: number }) {
  return { batch_mass_g: plan.batchMassG, phosphor_wt_pct: plan.phosphorWtPctOfSlurry, phosphor_phr: plan.phosphorPhr };
}
