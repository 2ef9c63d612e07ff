/** Row → record mapping of batches and batch lines (snake_case columns to camelCase, decimals as exact strings). */
import { Rat } from '../../batches/weighout/rational';
import type { BatchTarget } from '../../batches/weighout/target';
import type { WeighoutInput, LoadingBasis } from '../../batches/weighout/schema';
import type { BatchState } from '../../batches/schema';
import type { BatchLine } from '../../batches/types';
import type { BatchLineRow, BatchRow } from '../db/tables';

export type { BatchLine } from '../../batches/types';

export interface BatchSummary {
  id: number;
  batchNumber: string;
  state: BatchState;
  revisionId: number;
  formulationCode: string;
  formulationName: string;
  revisionNo: number;
  batchMassG: string;
  createdAt: Date;
  createdByName: string;
  completedAt: Date | null;
  /** Lot number of the LED chips built with (null when not recorded). */
  chipLot: string | null;
}

export interface Batch extends BatchSummary {
  sizingKind: 'mass' | 'parts';
  partCount: number | null;
  dispenseMassG: number | null;
  yieldLossPct: number | null;
  loadingBasis: LoadingBasis;
  totalLoadingPct: number | null;
  phosphorWtPct: number;
  phosphorPhr: number;
  siliconeSystemId: number | null;
  siliconeName: string;
  ratioA: number;
  ratioB: number;
  potLifeMin: number;
  plantLimitMin: number | null;
  resolutionG: string;
  places: number;
  minWeightG: string;
  balanceRef: string | null;
  /** Pump bin whose recipe was weighed (a revision with a recipe matrix), and the chip lot's measured wavelength, nm. */
  chipBinCode: string | null;
  chipWavelengthNm: number | null;
  input: WeighoutInput;
  target: BatchTarget;
  notes: string | null;
  mixedAt: Date | null;
  slurryExpiresAt: Date | null;
  mixedByName: string | null;
  completedBy: number | null;
  completedByName: string | null;
  recordFileId: number | null;
  version: number;
  createdBy: number;
  updatedAt: Date;
}

/** A DECIMAL read as a JS number (mysql2 decimalNumbers) back to its exact decimal text, to `places` or more. */
export function decimalText(v: number | string, places: number): string {
  const r = typeof v === 'string' ? Rat.parse(v)! : Rat.fromNumber(v);
  return r.toFixed(Math.max(places, r.decimalPlaces() ?? places));
}

const num = (v: unknown): number | null => (v === null || v === undefined ? null : Number(v));

/** A batch row as read, with the names of its people when the query joins them. */
type Row = BatchRow & { created_by_name?: string | null; mixed_by_name?: string | null; completed_by_name?: string | null };
type LineRow = BatchLineRow & { weighed_by_name?: string | null; override_by_name?: string | null };

export function placesOf(resolutionG: number | string): number {
  return (typeof resolutionG === 'string' ? Rat.parse(resolutionG)! : Rat.fromNumber(resolutionG)).decimalPlaces() ?? 6;
}

export function toSummary(r: Row): BatchSummary {
  const places = placesOf(r.resolution_g);
  return {
    id: r.id,
    batchNumber: r.batch_number,
    state: r.state,
    revisionId: r.revision_id,
    formulationCode: r.formulation_code,
    formulationName: r.formulation_name,
    revisionNo: r.revision_no,
    batchMassG: decimalText(r.batch_mass_g, places),
    createdAt: r.created_at,
    createdByName: r.created_by_name ?? '',
    completedAt: r.completed_at ?? null,
    chipLot: r.chip_lot ?? null
  };
}

export function toBatch(r: Row): Batch {
  const places = placesOf(r.resolution_g);
  return {
    ...toSummary(r),
    sizingKind: r.sizing_kind,
    partCount: num(r.part_count),
    dispenseMassG: num(r.dispense_mass_g),
    yieldLossPct: num(r.yield_loss_pct),
    loadingBasis: r.loading_basis,
    totalLoadingPct: num(r.total_loading_pct),
    phosphorWtPct: Number(r.phosphor_wt_pct),
    phosphorPhr: Number(r.phosphor_phr),
    siliconeSystemId: r.silicone_system_id,
    siliconeName: r.silicone_name,
    ratioA: Number(r.ratio_a),
    ratioB: Number(r.ratio_b),
    potLifeMin: r.pot_life_min,
    plantLimitMin: r.plant_limit_min,
    resolutionG: decimalText(r.resolution_g, 0),
    places,
    minWeightG: decimalText(r.min_weight_g, 0),
    balanceRef: r.balance_ref,
    chipBinCode: r.chip_bin_code ?? null,
    chipWavelengthNm: num(r.chip_wavelength_nm),
    input: JSON.parse(r.input_json),
    target: JSON.parse(r.target_json),
    notes: r.notes,
    mixedAt: r.mixed_at,
    slurryExpiresAt: r.slurry_expires_at,
    mixedByName: r.mixed_by_name ?? null,
    completedBy: r.completed_by,
    completedByName: r.completed_by_name ?? null,
    recordFileId: r.record_file_id,
    version: r.version,
    createdBy: r.created_by,
    updatedAt: r.updated_at
  };
}

export function toLine(r: LineRow, places: number): BatchLine {
  return {
    id: r.id,
    seq: r.seq,
    role: r.role,
    materialId: r.material_id,
    code: r.code,
    name: r.name,
    basisPct: num(r.basis_pct),
    idealG: decimalText(r.ideal_g, places),
    targetG: decimalText(r.target_g, places),
    lowG: decimalText(r.low_g, places),
    highG: decimalText(r.high_g, places),
    tolerance: { kind: r.tolerance_kind, value: Number(r.tolerance_value) },
    actualG: r.actual_g === null ? null : decimalText(r.actual_g, places),
    actualStatus: r.actual_status,
    lotId: r.lot_id,
    lotNumber: r.lot_number,
    weighedBy: r.weighed_by,
    weighedByName: r.weighed_by_name ?? null,
    weighedAt: r.weighed_at,
    overrideBy: r.override_by,
    overrideByName: r.override_by_name ?? null,
    overrideAt: r.override_at,
    overrideReason: r.override_reason,
    version: r.version
  };
}
