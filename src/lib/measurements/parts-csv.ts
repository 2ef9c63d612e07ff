/**
 * The per-part results of a batch as CSV (RFC 4180 quoting by papaparse): one row per part with its
 * metrics, bin, steps and verdict; a metric a tester table does not carry is written "not measured".
 * Cells that start with = + - @ are escaped so spreadsheets do not run them as formulae. Pure.
 */
import Papa from 'papaparse';
import type { PartView } from './view';

const FIELDS = [
  'part',
  'condition',
  'source',
  'x',
  'y',
  'u_prime',
  'v_prime',
  'cct_k',
  'duv',
  'ra',
  'r9',
  'rf',
  'rg',
  'ler_lm_per_w',
  'melanopic_der',
  'flux_lm',
  'forward_voltage_v',
  'tester_bin',
  'ansi_bin_k',
  'steps_from_target',
  'steps_from_prediction',
  'verdict',
  'failures',
  'not_measured'
];

export function partsCsv(parts: readonly PartView[]): string {
  const cell = (p: PartView, v: number | null | undefined, digits: number): string | number =>
    v === null || v === undefined ? (p.metrics.source === 'table' ? 'not measured' : '') : Number(v.toFixed(digits));
  const data = parts.map((p) => {
    const m = p.metrics;
    return [
      p.label,
      p.conditionLabel ?? '',
      m.source ?? 'spectrum',
      Number(m.x.toFixed(6)),
      Number(m.y.toFixed(6)),
      Number(m.uPrime.toFixed(6)),
      Number(m.vPrime.toFixed(6)),
      Math.round(m.cct),
      Number(m.duv.toFixed(5)),
      cell(p, m.ra, 2),
      cell(p, m.r9, 2),
      cell(p, m.rf, 2),
      cell(p, m.rg, 2),
      cell(p, m.ler, 1),
      cell(p, m.alphaOpic?.der.melanopic, 4),
      m.fluxLm ?? '',
      m.forwardVoltageV ?? '',
      m.testerBin ?? '',
      p.verdict.ansiBin ?? '',
      Number(p.verdict.offset.steps.toFixed(3)),
      p.stepsFromPrediction === null ? '' : Number(p.stepsFromPrediction.toFixed(3)),
      p.verdict.pass ? 'pass' : 'fail',
      p.verdict.failures.map((f) => f.message).join('; '),
      (p.verdict.notMeasured ?? []).join('; ')
    ];
  });
  return Papa.unparse({ fields: FIELDS, data }, { escapeFormulae: true });
}
