/**
 * Row types of every table in `migrations/`, declared once for Knex (`db()('users')` is typed).
 * Columns as the mysql2 driver returns them with the app's connection options: DECIMAL and BIGINT as
 * numbers (decimalNumbers, supportBigNumbers), TIMESTAMP and DATE as Date, TINYINT(1) as 0 | 1,
 * JSON kept in TEXT columns as strings. A migration that adds or changes a column updates its table here.
 */
import type { Knex } from 'knex';

/**
 * What a write may give for each column besides the value read back: DECIMAL columns also take exact
 * decimal text, TINYINT(1) flags booleans, DATE columns 'YYYY-MM-DD', and any column a raw expression.
 */
type Write<Row, Decimal extends keyof Row, Flag extends keyof Row, Day extends keyof Row> = {
  [K in keyof Row]?:
    Row[K] | Knex.Raw | (K extends Decimal ? string : never) | (K extends Flag ? boolean : never) | (K extends Day ? string : never);
};

type Table<Row, Decimal extends keyof Row = never, Flag extends keyof Row = never, Day extends keyof Row = never> = Knex.CompositeTableType<
  Row,
  Write<Row, Decimal, Flag, Day>,
  Write<Row, Decimal, Flag, Day>
>;

export interface ApiTokenRow {
  id: number;
  user_id: number;
  name: string;
  token_hash: string;
  prefix: string;
  expires_at: Date;
  revoked_at: Date | null;
  last_used_at: Date | null;
  created_at: Date;
}

export interface AuditEventRow {
  id: number;
  at: Date;
  actor_id: number | null;
  actor_email: string | null;
  entity_type: string;
  entity_id: string | null;
  action: string;
  before_json: string | null;
  after_json: string | null;
  ip: string | null;
}

export interface BatchAcceptanceRow {
  batch_id: number;
  mode: 'revision' | 'steps';
  steps: number | null; // decimal(4,1), read as a number (decimalNumbers)
  require_target_bin: number; // 0 | 1
  version: number;
  updated_by: number;
  updated_at: Date;
}

export interface BatchNumberCounterRow {
  prefix: string;
  last_no: number;
}

export interface BatchCorrectionRow {
  id: number;
  batch_id: number;
  revision_id: number;
  step_fraction: number; // decimal(4,3), read as a number (decimalNumbers)
  measured_x: number;
  measured_y: number;
  parts_count: number;
  predicted_x: number;
  predicted_y: number;
  predicted_cct_k: number;
  predicted_duv: number;
  detail_json: string;
  created_by: number;
  created_at: Date;
}

export interface BatchDispositionRow {
  id: number;
  batch_id: number;
  decision: 'released' | 'rejected';
  signer_id: number;
  signer_name: string;
  signer_email: string;
  meaning: string;
  comment: string;
  signed_at: Date;
  content_sha256: string;
  signed_json: string;
  record_file_id: number | null;
}

export interface BatchLineRow {
  id: number;
  batch_id: number;
  seq: number;
  role: 'siliconeA' | 'phosphor' | 'additive' | 'siliconeB';
  material_id: number | null;
  code: string;
  name: string;
  basis_pct: number | null; // decimal(10,4), read as a number (decimalNumbers)
  ideal_g: number; // decimal(20,10), read as a number (decimalNumbers)
  target_g: number; // decimal(14,6), read as a number (decimalNumbers)
  low_g: number; // decimal(14,6), read as a number (decimalNumbers)
  high_g: number; // decimal(14,6), read as a number (decimalNumbers)
  tolerance_kind: 'pct' | 'g';
  tolerance_value: number; // decimal(12,6), read as a number (decimalNumbers)
  actual_g: number | null; // decimal(14,7), read as a number (decimalNumbers)
  actual_status: 'in' | 'below' | 'above' | null;
  lot_id: number | null;
  lot_number: string | null;
  weighed_by: number | null;
  weighed_at: Date | null;
  override_by: number | null;
  override_at: Date | null;
  override_reason: string | null;
  version: number;
}

export interface BatchRow {
  id: number;
  batch_number: string;
  revision_id: number;
  formulation_code: string;
  formulation_name: string;
  revision_no: number;
  state: 'planned' | 'weighing' | 'complete' | 'released' | 'rejected';
  sizing_kind: 'mass' | 'parts';
  batch_mass_g: number; // decimal(14,6), read as a number (decimalNumbers)
  part_count: number | null;
  dispense_mass_g: number | null; // decimal(12,6), read as a number (decimalNumbers)
  yield_loss_pct: number | null; // decimal(6,3), read as a number (decimalNumbers)
  loading_basis: 'wtPctOfSlurry' | 'phr';
  total_loading_pct: number | null; // decimal(10,4), read as a number (decimalNumbers)
  phosphor_wt_pct: number; // decimal(10,4), read as a number (decimalNumbers)
  phosphor_phr: number; // decimal(10,4), read as a number (decimalNumbers)
  silicone_system_id: number | null;
  silicone_name: string;
  ratio_a: number; // decimal(6,2), read as a number (decimalNumbers)
  ratio_b: number; // decimal(6,2), read as a number (decimalNumbers)
  pot_life_min: number;
  plant_limit_min: number | null;
  resolution_g: number; // decimal(10,6), read as a number (decimalNumbers)
  min_weight_g: number; // decimal(12,6), read as a number (decimalNumbers)
  balance_ref: string | null;
  chip_lot: string | null;
  chip_bin_code: string | null;
  chip_wavelength_nm: number | null; // decimal(6,2), read as a number (decimalNumbers)
  input_json: string;
  target_json: string;
  notes: string | null;
  mixed_at: Date | null;
  slurry_expires_at: Date | null;
  mixed_by: number | null;
  completed_at: Date | null;
  completed_by: number | null;
  record_file_id: number | null;
  version: number;
  created_by: number;
  created_at: Date;
  updated_at: Date;
}

export interface FormulationRevisionRow {
  id: number;
  formulation_id: number;
  revision_no: number;
  state: 'draft' | 'submitted' | 'approved' | 'returned' | 'superseded' | 'withdrawn';
  content_json: string;
  predicted_json: string;
  core_version: string;
  content_sha256: string;
  version: number;
  created_by: number;
  created_at: Date;
  updated_at: Date;
  submitted_at: Date | null;
  submitted_by: number | null;
  decided_at: Date | null;
  decided_by: number | null;
  superseded_at: Date | null;
  supersedes_revision_id: number | null;
  based_on_revision_id: number | null;
  source_batch_id: number | null;
  return_reason: string | null;
  withdraw_reason: string | null;
  off_aim_reason: string | null;
}

export interface FormulationRow {
  id: number;
  code: string;
  name: string;
  description: string | null;
  version: number;
  created_by: number | null;
  created_at: Date;
  updated_at: Date;
}

export interface InviteRow {
  id: number;
  email: string;
  roles: string;
  token_hash: string;
  invited_by: number | null;
  expires_at: Date;
  used_at: Date | null;
  created_at: Date;
}

export interface MaterialLotRow {
  id: number;
  material_id: number;
  lot_number: string;
  supplier: string | null;
  received_on: Date | null;
  expires_on: Date | null;
  certificate_file_id: number | null;
  notes: string | null;
  created_by: number | null;
  created_at: Date;
}

export interface MaterialThermalRow {
  material_id: number;
  data_json: string;
  source: string | null;
  version: number;
  updated_by: number | null;
  updated_at: Date;
}

export interface MaterialSpectrumRow {
  id: number;
  material_id: number;
  kind: 'emission' | 'excitation';
  wavelengths_json: string;
  values_json: string;
  points: number;
  min_nm: number; // decimal(7,2), read as a number (decimalNumbers)
  max_nm: number; // decimal(7,2), read as a number (decimalNumbers)
  source_file_id: number | null;
  origin: string;
  /** IES TM-27 header and distribution fields of the source file (JSON); null for other sources. */
  tm27_json: string | null;
  created_by: number | null;
  created_at: Date;
}

export interface MaterialRow {
  id: number;
  kind: 'pump' | 'phosphor';
  code: string;
  name: string;
  family: string | null;
  supplier: string | null;
  peak_nm: number | null; // decimal(7,2), read as a number (decimalNumbers)
  fwhm_nm: number | null; // decimal(7,2), read as a number (decimalNumbers)
  density_g_cm3: number | null; // decimal(7,3), read as a number (decimalNumbers)
  iqe: number | null; // decimal(6,4), read as a number (decimalNumbers)
  absorption_per_wt_pct_mm: number | null;
  absorption_reference_nm: number | null; // decimal(7,2), read as a number (decimalNumbers)
  cost_per_kg: number | null; // decimal(12,2), read as a number (decimalNumbers)
  d50_um: number | null; // decimal(8,2), read as a number (decimalNumbers)
  notes: string | null;
  safety_note: string | null;
  /** Comma-separated hazard codes (src/lib/library/hazards.ts); '' for none. */
  hazards: string;
  emission_spectrum_id: number | null;
  excitation_spectrum_id: number | null;
  archived_at: Date | null;
  version: number;
  created_by: number | null;
  updated_by: number | null;
  created_at: Date;
  updated_at: Date;
}

export interface MeasurementUploadRow {
  id: number;
  batch_id: number;
  stored_file_id: number;
  original_name: string;
  parts_count: number;
  wavelengths_json: string;
  warnings_json: string | null;
  core_version: string;
  uploaded_by: number;
  created_at: Date;
  withdrawn_at: Date | null;
  withdrawn_by: number | null;
  withdraw_reason: string | null;
  /** IES TM-27 header and distribution fields of the source file (JSON); null for other sources. */
  tm27_json: string | null;
  test_reference: 'junction' | 'solderPoint' | null;
  test_temperature_c: number | null; // decimal(5,1), read as a number (decimalNumbers)
  test_current_ma: number | null; // decimal(8,1), read as a number (decimalNumbers)
  source_kind: 'spectra' | 'table';
  tester_profile_id: number | null;
  tester_profile_version: number | null;
}

export interface PumpBinSetRow {
  material_id: number;
  set_json: string;
  version: number;
  updated_by: number | null;
  updated_at: Date;
}

export interface PartMeasurementRow {
  id: number;
  upload_id: number;
  batch_id: number;
  part_label: string;
  column_no: number;
  values_json: string;
  metrics_json: string;
  x: number;
  y: number;
  cct_k: number;
  duv: number;
  ra: number | null;
  r9: number | null;
  ler_lm_per_w: number | null;
  ansi_bin: number | null;
  created_at: Date;
}

export interface RevisionAttachmentRow {
  id: number;
  revision_id: number;
  stored_file_id: number;
  label: string;
  created_by: number | null;
  created_at: Date;
}

export interface RevisionSignatureRow {
  id: number;
  revision_id: number;
  signer_id: number;
  signer_name: string;
  signer_email: string;
  meaning: string;
  comment: string | null;
  signed_at: Date;
  content_sha256: string;
}

export interface SignInAttemptRow {
  id: number;
  email: string;
  succeeded: number; // 0 | 1
  ip: string | null;
  created_at: Date;
}

export interface SiliconeSystemRow {
  id: number;
  name: string;
  supplier: string | null;
  ratio_a: number; // decimal(6,2), read as a number (decimalNumbers)
  ratio_b: number; // decimal(6,2), read as a number (decimalNumbers)
  pot_life_min: number;
  cure: string;
  degas_notes: string | null;
  density_g_cm3: number | null; // decimal(6,3), read as a number (decimalNumbers)
  refractive_index: number | null; // decimal(5,3), read as a number (decimalNumbers)
  safety_note: string;
  created_at: Date;
}

export interface StoredFileRow {
  id: number;
  storage_key: string;
  original_name: string;
  content_type: string;
  bytes: number;
  sha256: string;
  purpose: string;
  entity_type: string | null;
  entity_id: string | null;
  uploaded_by: number | null;
  created_at: Date;
}

export interface UserRoleRow {
  user_id: number;
  role: 'formulator' | 'technician' | 'quality' | 'admin';
}

export interface UserRow {
  id: number;
  email: string;
  name: string;
  password_hash: string;
  active: number; // 0 | 1
  deactivated_at: Date | null;
  created_at: Date;
  updated_at: Date;
}

export interface YieldPredictionRow {
  id: number;
  revision_id: number;
  model_json: string;
  seed: number;
  parts: number;
  figures_json: string;
  source: string;
  computed_by: number;
  computed_at: Date;
}

export interface RevisionVariationModelRow {
  revision_id: number;
  model_json: string;
  source: string;
  fitted_batch_id: number | null;
  version: number;
  updated_by: number;
  updated_at: Date;
}

export interface TesterProfileRow {
  id: number;
  name: string;
  profile_json: string;
  version: number;
  created_by: number;
  updated_by: number;
  created_at: Date;
  updated_at: Date;
}

declare module 'knex/types/tables' {
  interface Tables {
    api_tokens: Table<ApiTokenRow>;
    audit_events: Table<AuditEventRow>;
    batch_acceptance: Table<BatchAcceptanceRow, 'steps', 'require_target_bin'>;
    batch_corrections: Table<BatchCorrectionRow, 'step_fraction'>;
    batch_dispositions: Table<BatchDispositionRow>;
    batch_number_counters: Table<BatchNumberCounterRow>;
    batch_lines: Table<BatchLineRow, 'basis_pct' | 'ideal_g' | 'target_g' | 'low_g' | 'high_g' | 'tolerance_value' | 'actual_g'>;
    batches: Table<
      BatchRow,
      | 'batch_mass_g'
      | 'dispense_mass_g'
      | 'yield_loss_pct'
      | 'total_loading_pct'
      | 'phosphor_wt_pct'
      | 'phosphor_phr'
      | 'ratio_a'
      | 'ratio_b'
      | 'resolution_g'
      | 'min_weight_g'
      | 'chip_wavelength_nm'
    >;
    formulation_revisions: Table<FormulationRevisionRow>;
    formulations: Table<FormulationRow>;
    invites: Table<InviteRow>;
    material_lots: Table<MaterialLotRow, never, never, 'received_on' | 'expires_on'>;
    material_spectra: Table<MaterialSpectrumRow, 'min_nm' | 'max_nm'>;
    material_thermal: Table<MaterialThermalRow>;
    materials: Table<MaterialRow, 'peak_nm' | 'fwhm_nm' | 'density_g_cm3' | 'iqe' | 'absorption_reference_nm' | 'cost_per_kg' | 'd50_um'>;
    measurement_uploads: Table<MeasurementUploadRow, 'test_temperature_c' | 'test_current_ma'>;
    part_measurements: Table<PartMeasurementRow>;
    pump_bin_sets: Table<PumpBinSetRow>;
    revision_attachments: Table<RevisionAttachmentRow>;
    revision_signatures: Table<RevisionSignatureRow>;
    sign_in_attempts: Table<SignInAttemptRow, never, 'succeeded'>;
    silicone_systems: Table<SiliconeSystemRow, 'ratio_a' | 'ratio_b' | 'density_g_cm3' | 'refractive_index'>;
    stored_files: Table<StoredFileRow>;
    revision_variation_models: Table<RevisionVariationModelRow>;
    tester_profiles: Table<TesterProfileRow>;
    user_roles: Table<UserRoleRow>;
    users: Table<UserRow, never, 'active'>;
    yield_predictions: Table<YieldPredictionRow>;
  }
}
