/**
 * What the batch papers (weigh-out ticket and batch record) show, independent of the database.
 * Built by src/lib/server/batches/documents.ts from a stored batch.
 */
import { formatStamp } from './document';
import type { Sheet } from './sheet';

export interface BatchDocLine {
  seq: number;
  role: 'siliconeA' | 'phosphor' | 'additive' | 'siliconeB';
  code: string;
  name: string;
  /** e.g. "12.0000 wt %" or "10.0000 phr"; null for silicone parts. */
  loadingLabel: string | null;
  targetG: string;
  lowG: string;
  highG: string;
  /** e.g. "±0.5 %" or "±0.010 g". */
  toleranceLabel: string;
  actual: {
    actualG: string | null;
    lotNumber: string | null;
    status: 'in' | 'below' | 'above' | null;
    weighedBy: string | null;
    weighedAt: Date | null;
    override: { by: string; at: Date; reason: string } | null;
  } | null;
}

export interface BatchDoc {
  batchNumber: string;
  state: string;
  createdAt: Date;
  createdBy: string;
  /** packageModel: the package model the revision cites, as "<name> v<version>", or absent. */
  formulation: { code: string; name: string; revisionNo: number; packageModel?: string | null };
  /**
   * condition: the operating condition a hot target holds at ("Tj 85 °C, 350 mA"); coldCheck: the bench
   * point a build of the recipe should measure ("x …, y …, 2990 K, Duv …"). Both absent for a bench target.
   */
  target: {
    description: string;
    xy: string | null;
    bin: string | null;
    tolerance: string | null;
    condition?: string | null;
    coldCheck?: string | null;
  };
  /** The LED chip lot built with and, with a recipe per chip bin, the bin weighed and its predicted point. */
  chip?: { lot: string | null; bin: string | null; predicted: string | null } | null;
  size: { batchMassG: string; sizingNote: string | null; basisLabel: string; loadingSummary: string };
  balance: { resolutionG: string; minWeightG: string; balanceRef: string | null };
  silicone: {
    name: string;
    ratio: string;
    potLifeMin: number;
    plantLimitMin: number | null;
    cure: string;
    degasNotes: string | null;
    safetyNote: string | null;
  };
  lines: BatchDocLine[];
  process: { mixedAt: Date | null; expiresAt: Date | null; completedAt: Date | null; completedBy: string | null };
  notes: string | null;
  timeZone?: string;
  /** Handling cautions for this batch's materials (./cautions.ts); the general ones when absent. */
  cautions?: string[];
}

/** Optional section the quality feature adds to the batch record (measured colour of finished parts). */
export interface MeasurementSummary {
  title: string;
  rows: { label: string; value: string }[];
  note?: string;
}

export const stamp = (doc: BatchDoc, d: Date | null) => formatStamp(d, doc.timeZone ?? 'UTC');

/** Product, revision, target and sizing fields shared by the ticket and the record. */
export function headerFields(s: Sheet, d: BatchDoc): void {
  s.fields([
    ['Product', `${d.formulation.code} — ${d.formulation.name}`],
    ['Formulation revision', `Revision ${d.formulation.revisionNo} (approved)`],
    ...(d.formulation.packageModel ? [['Package model', d.formulation.packageModel] as [string, string]] : []),
    ['Batch number', d.batchNumber],
    ['Target colour point', [d.target.description, d.target.xy].filter(Boolean).join('  ·  ')],
    ['ANSI C78.377 bin', d.target.bin ?? 'outside the nominal quadrangles'],
    ['Colour tolerance', d.target.tolerance ?? '—'],
    ...chipFields(d),
    ...(d.target.condition ? [['Target holds at', d.target.condition] as [string, string]] : []),
    ...(d.target.coldCheck ? [['Cold check target (bench)', d.target.coldCheck] as [string, string]] : []),
    ['Batch size (finished slurry)', `${d.size.batchMassG} g`],
    ['Loading basis', d.size.basisLabel],
    ['Phosphor loading', d.size.loadingSummary],
    ['Silicone system (A:B by weight)', `${d.silicone.name} — ${d.silicone.ratio}`],
    [
      'Balance',
      `d = ${d.balance.resolutionG} g, minimum weight ${d.balance.minWeightG} g${d.balance.balanceRef ? `, ${d.balance.balanceRef}` : ''}`
    ],
    ['Planned', `${stamp(d, d.createdAt)} by ${d.createdBy}`]
  ]);
  if (d.size.sizingNote) s.paragraph(`Sizing: ${d.size.sizingNote}`, { size: 8, color: '#58657d' });
}

function chipFields(d: BatchDoc): [string, string][] {
  if (!d.chip) return [];
  const rows: [string, string][] = [['Chip lot', d.chip.lot ?? '—']];
  if (d.chip.bin) rows.push(['Chip bin (recipe weighed)', d.chip.bin]);
  if (d.chip.predicted) rows.push(["Bin's predicted point", d.chip.predicted]);
  return rows;
}

export function processNotes(d: BatchDoc): string[] {
  const limit =
    d.silicone.plantLimitMin !== null && d.silicone.plantLimitMin < d.silicone.potLifeMin
      ? `plant slurry-age limit ${d.silicone.plantLimitMin} min (pot life ${d.silicone.potLifeMin} min)`
      : `pot life ${d.silicone.potLifeMin} min`;
  return [
    `Weighing order: part A, then the phosphors and additives into part A, part B ` +
      `last. Tare the container before every line; record the balance reading as shown.`,
    `Mixing: the slurry's clock starts when part B is mixed in; note the time. Use within ${limit} of that time.`,
    `Degassing: ${d.silicone.degasNotes?.trim() || 'as your plant procedure specifies.'}`,
    `Cure: ${d.silicone.cure.trim() || 'as your plant procedure specifies.'}`,
    ...(d.silicone.safetyNote?.trim() ? [`Silicone system note: ${d.silicone.safetyNote.trim()}`] : [])
  ];
}
