/**
 * The measurement summary printed on the batch record (label/value rows), from a batch summary,
 * the acceptance rule, the predicted-vs-measured check and the disposition signature.
 * Record practice: colour data summary, bin distribution, disposition and QA signature with printed
 * name, date/time and meaning (ISO 9001:2015 §7.5; 21 CFR 11.50 as a model).
 */
import { describeTolerance } from './acceptance';
import type { PredictionCheck } from './prediction';
import type { BatchSummary } from './summarise';
import type { Acceptance, Stat } from './types';
import type { ConditionCheck } from './condition-groups';
import type { LotStatistics } from './lot-statistics/types';
import { capabilityDigits, cpkReading, describeDrift, describeMeanEllipse, formatIndex, formatShare } from './lot-statistics/format';

export interface RecordSignature {
  decision: 'released' | 'rejected';
  signerName: string;
  meaning: string;
  comment: string;
  signedAtText: string;
  contentSha256: string;
}

export interface RecordMeasurementSummary {
  title: string;
  rows: { label: string; value: string }[];
  note?: string;
}

const stat = (s: Stat | null, digits: number, unit = ''): string =>
  s ? `${s.mean.toFixed(digits)}${unit} (s ${s.sd.toFixed(digits)}, ${s.min.toFixed(digits)}–${s.max.toFixed(digits)}, n ${s.n})` : '—';

export function recordMeasurementSummary(
  summary: BatchSummary,
  acceptance: Acceptance,
  targetLabel: string,
  prediction: PredictionCheck | null,
  signature: RecordSignature | null,
  /** Whose prediction the parts were compared with, e.g. "chip bin B3 (452.5–455 nm peak) of revision 2". */
  predictionSource: string | null = null,
  /** Measured against predicted for each test condition (bench and hot), when the batch has files of more than one or a hot one. */
  conditionChecks: ConditionCheck[] = [],
  /** Counts, capability, the mean's confidence ellipse and the drift of the summary's parts. */
  lotStats: LotStatistics | null = null
): RecordMeasurementSummary {
  const s = summary.stats;
  const bins = summary.bins.map((b) => `${b.nominalCct === null ? 'no bin' : `${b.nominalCct} K`}: ${b.count}`).join(', ');
  const rows = [
    { label: 'Parts measured', value: String(summary.parts) },
    {
      label: 'Yield',
      value:
        summary.yieldFraction === null ? '—' : `${(summary.yieldFraction * 100).toFixed(1)} % (${summary.passed} of ${summary.parts} pass)`
    },
    { label: 'Target', value: targetLabel },
    {
      label: 'Acceptance',
      value: `${describeTolerance(acceptance.tolerance)}${acceptance.requireTargetBin ? ', inside the target ANSI bin' : ''}`
    },
    { label: 'x', value: stat(s.x, 4) },
    { label: 'y', value: stat(s.y, 4) },
    { label: 'CCT', value: stat(s.cct, 0, ' K') },
    { label: 'Duv', value: stat(s.duv, 4) },
    { label: 'Ra', value: stat(s.ra, 1) },
    { label: 'R9', value: stat(s.r9, 1) },
    { label: 'LER', value: stat(s.ler, 0, ' lm/W') },
    // Melanopic DER (CIE S 026/E:2018) only where the parts carry it (older uploads do not).
    ...(s.melDer ? [{ label: 'Melanopic DER (CIE S 026)', value: stat(s.melDer, 3) }] : []),
    {
      label: 'Mean point to target',
      value: summary.meanOffset
        ? `${summary.meanOffset.steps.toFixed(1)} steps (Δx ${summary.meanOffset.dx.toFixed(4)}, Δy ${summary.meanOffset.dy.toFixed(4)})`
        : '—'
    },
    { label: 'ANSI C78.377 bins', value: bins || '—' }
  ];
  if (predictionSource) rows.push({ label: 'Prediction compared', value: `predicted point of ${predictionSource}` });
  if (prediction) {
    rows.push({
      label: 'Measured − predicted',
      value: `Δx ${prediction.offset.dx.toFixed(4)}, Δy ${prediction.offset.dy.toFixed(4)}, ${prediction.offset.steps.toFixed(1)} steps`
    });
  }
  const shownConditions = conditionChecks.length > 1 || conditionChecks.some((c) => !c.label.startsWith('bench'));
  if (shownConditions)
    for (const c of conditionChecks) {
      const mean = c.measured ? `${c.measured.x.toFixed(4)}, ${c.measured.y.toFixed(4)}` : '—';
      const pred = c.predicted ? `${c.predicted.x.toFixed(4)}, ${c.predicted.y.toFixed(4)}` : '—';
      rows.push({
        label: `Measured at ${c.label}`,
        value:
          `${c.passed} of ${c.parts} pass; mean ${mean} against predicted ${pred}` +
          `${c.steps === null ? '' : ` (${c.steps.toFixed(1)} steps)`}; judged against ${c.judgedAgainst}`
      });
    }
  if (lotStats) rows.push(...lotStatisticsRows(lotStats));
  if (signature) {
    rows.push(
      { label: 'Disposition', value: signature.decision === 'released' ? 'RELEASED' : 'REJECTED' },
      { label: 'Signed by', value: `${signature.signerName}, ${signature.signedAtText} — ${signature.meaning}` },
      { label: 'Comment', value: signature.comment },
      { label: 'Signed content SHA-256', value: signature.contentSha256 }
    );
  }
  return {
    title: 'Measurement summary and disposition',
    rows,
    note:
      'Statistics: mean (sample standard deviation s, range, count). Steps: MacAdam-type steps of the 1-step ellipse at the target CCT.' +
      (lotStats
        ? ' Capability: Cp = (USL − LSL)/6s, Cpk = min(USL − mean, mean − LSL)/3s (NIST/SEMATECH e-Handbook §6.1.6). ' +
          'Confidence ellipse of the mean from Hotelling T² (Johnson & Wichern 2007 §5.4). Drift: least-squares slope over part index.'
        : '')
  };
}

/** The lot statistics as record rows: verdict shares, capability per quantity, the mean's ellipse, drift. */
// NIST/SEMATECH e-Handbook §6.1.6 (Cp, Cpk); Johnson & Wichern (2007) §5.4 (T² ellipse); Montgomery & Runger (2014) §11-4.1 (slope).
export function lotStatisticsRows(l: LotStatistics): { label: string; value: string }[] {
  const rows = [{ label: 'Parts per verdict', value: l.verdicts.map((v) => `${v.label} ${v.count} (${formatShare(v.share)})`).join(', ') }];
  for (const c of l.capability) {
    const d = capabilityDigits(c);
    const lim = [c.lsl === null ? null : `LSL ${c.lsl.toFixed(d)}`, c.usl === null ? null : `USL ${c.usl.toFixed(d)}`]
      .filter(Boolean)
      .join(', ');
    rows.push({
      label: `Capability, ${c.label}`,
      value:
        `Cp ${formatIndex(c.cp)}, Cpk ${formatIndex(c.cpk)} — ${cpkReading(c)}; mean ${c.mean.toFixed(d)}, s ${c.sd.toFixed(d + 1)}` +
        `${lim ? `, ${lim}` : ''} (${c.limitSource})`
    });
  }
  rows.push({ label: 'Mean point, confidence', value: l.ellipse ? describeMeanEllipse(l.ellipse) : 'fewer than 3 parts: no ellipse' });
  for (const t of l.trend.filter((s) => s.quantity === 'deltaUvPrime' || s.quantity === 'cct'))
    rows.push({ label: `Drift of ${t.label}`, value: describeDrift(t) });
  return rows;
}
