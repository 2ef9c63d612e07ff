/**
 * Side-by-side comparison of two revisions: phosphor ratios, predicted metrics and settings, each
 * row flagged when the two differ by more than the metric's display resolution. Pure.
 */
import type { RevisionContent } from '../recipe';
import type { RevisionPrediction } from './prediction';

export interface Side {
  content: RevisionContent;
  predicted: RevisionPrediction;
}

export interface RatioRow {
  code: string;
  name: string;
  a: { opticalFraction: number; wtPct: number | null } | null;
  b: { opticalFraction: number; wtPct: number | null } | null;
  deltaOptical: number;
  changed: boolean;
}

export interface MetricRow {
  label: string;
  unit: string;
  digits: number;
  a: number | null;
  b: number | null;
  delta: number | null;
  changed: boolean;
}

export interface SettingRow {
  label: string;
  a: string;
  b: string;
  changed: boolean;
}

/** Half a unit of the last shown digit: smaller differences are display noise. */
const differs = (a: number | null, b: number | null, digits: number) =>
  (a === null) !== (b === null) || (a !== null && b !== null && Math.abs(a - b) >= 0.5 * 10 ** -digits);

export function compareRatios(a: RevisionContent, b: RevisionContent): RatioRow[] {
  const leak = (c: RevisionContent) => ({ opticalFraction: c.pumpLeakFraction, wtPct: null });
  const rows: RatioRow[] = [
    {
      code: `${a.pump.code} leak`,
      name: `Pump leak (${a.pump.code === b.pump.code ? a.pump.code : `${a.pump.code} / ${b.pump.code}`})`,
      a: leak(a),
      b: leak(b),
      deltaOptical: 0,
      changed: false
    }
  ];
  const codes = [...new Set([...a.phosphors.map((p) => p.code), ...b.phosphors.map((p) => p.code)])];
  for (const code of codes) {
    const pa = a.phosphors.find((p) => p.code === code);
    const pb = b.phosphors.find((p) => p.code === code);
    rows.push({
      code,
      name: (pa ?? pb)!.name,
      a: pa ? { opticalFraction: pa.opticalFraction, wtPct: pa.wtPct } : null,
      b: pb ? { opticalFraction: pb.opticalFraction, wtPct: pb.wtPct } : null,
      deltaOptical: 0,
      changed: false
    });
  }
  return rows.map((r) => {
    const deltaOptical = (r.b?.opticalFraction ?? 0) - (r.a?.opticalFraction ?? 0);
    const changed = !r.a || !r.b || differs(r.a.opticalFraction, r.b.opticalFraction, 4) || differs(r.a.wtPct, r.b.wtPct, 2);
    return { ...r, deltaOptical, changed };
  });
}

const METRICS: { label: string; unit: string; digits: number; get: (p: RevisionPrediction) => number | null }[] = [
  { label: 'CCT', unit: 'K', digits: 0, get: (p) => p.cct },
  { label: 'Duv', unit: '', digits: 4, get: (p) => p.duv },
  { label: 'x', unit: '', digits: 4, get: (p) => p.x },
  { label: 'y', unit: '', digits: 4, get: (p) => p.y },
  { label: 'Distance to target', unit: 'SDCM', digits: 2, get: (p) => p.sdcm },
  { label: 'Ra', unit: '', digits: 1, get: (p) => p.ra },
  { label: 'R9', unit: '', digits: 1, get: (p) => p.r9 },
  { label: 'Rf', unit: '', digits: 1, get: (p) => p.rf },
  { label: 'Rg', unit: '', digits: 1, get: (p) => p.rg },
  { label: 'LER', unit: 'lm/W', digits: 0, get: (p) => p.lerLmPerW },
  { label: 'ANSI C78.377 bin', unit: 'K', digits: 0, get: (p) => p.ansiBin }
];

export function compareMetrics(a: RevisionPrediction, b: RevisionPrediction): MetricRow[] {
  return METRICS.map((m) => {
    const va = m.get(a);
    const vb = m.get(b);
    return {
      label: m.label,
      unit: m.unit,
      digits: m.digits,
      a: va,
      b: vb,
      delta: va !== null && vb !== null ? vb - va : null,
      changed: differs(va, vb, m.digits)
    };
  });
}

export function floorsText(c: RevisionContent): string {
  const f = c.floors;
  const parts = [
    f.raMin !== undefined && `Ra ≥ ${f.raMin}`,
    f.r9Min !== undefined && `R9 ≥ ${f.r9Min}`,
    f.rfMin !== undefined && `Rf ≥ ${f.rfMin}`,
    f.rgMin !== undefined && `Rg ≥ ${f.rgMin}`,
    f.rgMax !== undefined && `Rg ≤ ${f.rgMax}`,
    f.lerMin !== undefined && `LER ≥ ${f.lerMin}`,
    f.melDerMin !== undefined && `melanopic DER ≥ ${f.melDerMin}`,
    f.melDerMax !== undefined && `melanopic DER ≤ ${f.melDerMax}`,
    f.intent !== undefined && `TM-30 design intent ${f.intent}`
  ].filter(Boolean);
  return parts.join(', ') || 'none';
}

export function targetText(c: RevisionContent): string {
  const t = c.target;
  if (t.kind === 'cctDuv') return `${t.cct} K, Duv ${t.duv}`;
  if (t.kind === 'xy') return `x ${t.x}, y ${t.y}`;
  return `ANSI C78.377 ${t.nominalCct} K bin`;
}

export function toleranceText(c: RevisionContent): string {
  const t = c.tolerance;
  return t.kind === 'sdcm' ? `${t.steps}-step SDCM` : t.kind === 'deltaUv' ? `Δuv ≤ ${t.value}` : `Δu′v′ ≤ ${t.value}`;
}

export function compareSettings(a: RevisionContent, b: RevisionContent): SettingRow[] {
  const silicone = (c: RevisionContent) =>
    `${c.silicone.name} (A:B ${c.silicone.ratioA}:${c.silicone.ratioB}, pot life ${c.silicone.potLifeMin} min)`;
  const rows: [string, (c: RevisionContent) => string][] = [
    ['Pump', (c) => (c.pump.name.startsWith(c.pump.code) ? c.pump.name : `${c.pump.code} ${c.pump.name}`)],
    ['Silicone', silicone],
    ['Target', targetText],
    ['Tolerance', toleranceText],
    ['Floors', floorsText],
    [
      'Loading basis',
      (c) =>
        c.loading
          ? `wt % of slurry, path ${c.loading.pathLengthMm} mm`
          : c.phosphors.some((p) => p.wtPct !== null)
            ? 'wt % of slurry, entered directly'
            : 'not modelled'
    ],
    ['Package model', (c) => (c.packageModelRef ? `model ${c.packageModelRef.id} v${c.packageModelRef.version}` : 'none')],
    ['Notes', (c) => c.notes || '—']
  ];
  return rows.map(([label, f]) => ({ label, a: f(a), b: f(b), changed: f(a) !== f(b) }));
}
