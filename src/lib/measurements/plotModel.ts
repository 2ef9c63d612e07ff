/**
 * What the batch chromaticity plot draws, in CIE 1931 x,y (data only; the chart component draws it):
 * every part (pass/fail), the target with its tolerance outline and reference step ellipses
 * (3, 5, 7 steps; ANSI C78.377 quadrangles are about 7-step ellipses — Ohno, CORM 2011),
 * the ANSI C78.377-2017 Table 1 quadrangles plus the target's own, the Planckian locus, and markers
 * (measured mean, predicted point, corrected prediction). The first view fits the target, the
 * tolerance, the parts and the markers; zooming out shows the whole bin and its neighbours.
 */
import { hexbin, type HexBin } from './hexbin';
import { stepEllipseAt } from '../aim/index';
import { ansiNominalQuadrangles } from '../spectral/ansi/c78377';
import type { Pair } from '../spectral/colorimetry/chromaticity';
import { describeTolerance } from './acceptance';
import type { JudgedBatch } from './judgeBatch';
import { ellipseOutline, planckianOutline, quadrangleOutline, toleranceOutline } from './outlines';
import type { ConfidenceEllipse } from './lot-statistics/types';

export interface PlotPart {
  label: string;
  x: number;
  y: number;
  pass: boolean;
  steps: number;
  cct: number;
  duv: number;
}

export interface PlotMarker {
  kind: 'mean' | 'predicted' | 'corrected';
  label: string;
  x: number;
  y: number;
}

export interface ChromaticityPlotModel {
  parts: PlotPart[];
  target: { x: number; y: number; label: string };
  outlines: { kind: 'tolerance' | 'steps'; label: string; points: Pair[] }[];
  quadrangles: { nominalCct: number; isTarget: boolean; points: Pair[] }[];
  locus: Pair[];
  markers: PlotMarker[];
  /** Points the initial view must show (target, tolerance, parts, markers); the bin may run past the edges. */
  focus: Pair[];
  /** The revision's latest yield forecast, drawn under the parts (a sample of its simulated parts). */
  forecast: { label: string; points: Pair[] } | null;
  /** All parts of the batch; `parts` holds at most MAX_PLOT_PARTS of them (every failing part first). */
  totalParts: number;
  /** Past MAX_PLOT_PARTS: every part counted in hexagons of circumradius `radius` (x,y), drawn as a density under the failing parts. */
  density: { radius: number; bins: HexBin[] } | null;
  /** The lot mean's confidence ellipse (Hotelling's T²), drawn around the measured mean. */
  meanConfidence: { label: string; points: Pair[] } | null;
}

/** Outline of the mean's confidence ellipse in x,y. */
// Johnson & Wichern (2007) §5.4: centred on x̄, semi-axes along the eigenvectors of S.
export function meanConfidenceOutline(e: ConfidenceEllipse): { label: string; points: Pair[] } {
  const shape = { name: 'mean', nominalCct: 0, x: e.mean.x, y: e.mean.y, a: e.semiMajor, b: e.semiMinor, thetaDeg: e.angleDeg };
  return {
    label: `${Math.round(e.level * 100)} % confidence ellipse of the mean (Hotelling T², ${e.n.toLocaleString('en')} parts)`,
    points: ellipseOutline(shape, 1, 72).map(([x, y]): Pair => [Math.round(x * 1e9) / 1e9, Math.round(y * 1e9) / 1e9])
  };
}

/** Hexagon size for a lot's density: a thirtieth of the x range its middle 98 % spans (at least 0.0001 in x,y). */
export function densityRadius(xs: readonly number[]): number {
  const sorted = Float64Array.from(xs).sort(); // numeric order (ECMA-262 %TypedArray%.prototype.sort), no comparator calls
  const at = (q: number) => sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))];
  return Math.max(1e-4, (at(0.99) - at(0.01)) / 30);
}

/** Parts drawn one by one; a larger lot is drawn with every failing part and an even sample of the passing ones. */
export const MAX_PLOT_PARTS = 5000;

/**
 * A small lot whole; a large one as every failing part (up to the cap, the outliers drawn as points over
 * the density) — `withPassing` also fills the cap with every k-th passing part.
 */
export function plotSample<T extends { pass: boolean }>(parts: readonly T[], max = MAX_PLOT_PARTS, withPassing = true): T[] {
  if (parts.length <= max) return [...parts];
  const failing = parts.filter((p) => !p.pass).slice(0, max);
  if (!withPassing) return failing;
  const passing = parts.filter((p) => p.pass);
  const room = max - failing.length;
  const step = room > 0 ? passing.length / room : Infinity;
  const sampled: T[] = [];
  for (let k = 0; k < room && Math.floor(k * step) < passing.length; k++) sampled.push(passing[Math.floor(k * step)]);
  return [...failing, ...sampled];
}

const REFERENCE_STEPS = [3, 5, 7];
const round = (p: Pair): Pair => [Number(p[0].toFixed(5)), Number(p[1].toFixed(5))];

export function chromaticityPlotModel(
  batch: JudgedBatch,
  markers: PlotMarker[] = [],
  forecast: ChromaticityPlotModel['forecast'] = null,
  meanEllipse: ConfidenceEllipse | null = null
): ChromaticityPlotModel {
  const t = batch.target;
  const tol = batch.acceptance.tolerance;
  const tolerancePts = toleranceOutline(t, tol).map(round);
  const ellipse = stepEllipseAt(t);
  const outlines: ChromaticityPlotModel['outlines'] = [
    { kind: 'tolerance', label: `Allowed: ${describeTolerance(tol)}`, points: tolerancePts },
    ...REFERENCE_STEPS.filter((n) => !(tol.kind === 'sdcm' && tol.steps === n)).map((n) => ({
      kind: 'steps' as const,
      label: `${n}-step ellipse`,
      points: ellipseOutline(ellipse, n, 72).map(round)
    }))
  ];
  const quads = ansiNominalQuadrangles().map((q) => ({
    nominalCct: q.nominalCct,
    isTarget: t.ansiBin?.nominalCct === q.nominalCct && t.ansiBin.cctMin === q.cctMin,
    points: quadrangleOutline(q).map(round)
  }));
  if (t.ansiBin && !quads.some((q) => q.isTarget))
    quads.push({ nominalCct: t.ansiBin.nominalCct, isTarget: true, points: quadrangleOutline(t.ansiBin).map(round) });
  const parts = batch.parts.map((p) => ({
    label: p.label,
    x: p.metrics.x,
    y: p.metrics.y,
    pass: p.verdict.pass,
    steps: p.verdict.offset.steps,
    cct: p.metrics.cct,
    duv: p.metrics.duv
  }));
  const large = parts.length > MAX_PLOT_PARTS;
  const drawn = plotSample(parts, MAX_PLOT_PARTS, !large);
  const radius = large ? densityRadius(parts.map((p) => p.x)) : 0;
  const density = large
    ? {
        radius,
        bins: hexbin(
          parts.map((p) => p.x),
          parts.map((p) => p.y),
          radius
        )
      }
    : null;
  const focus: Pair[] = [
    [t.x, t.y],
    ...tolerancePts,
    ...drawn.map((p): Pair => [p.x, p.y]),
    ...(density?.bins.filter((b) => b.n > 1).map((b): Pair => [b.x, b.y]) ?? []),
    ...markers.map((m): Pair => [m.x, m.y])
  ];
  return {
    parts: drawn,
    totalParts: parts.length,
    density,
    target: { x: t.x, y: t.y, label: t.label },
    outlines,
    quadrangles: quads,
    locus: planckianOutline(1800, 10000).map(round),
    markers,
    focus,
    forecast,
    meanConfidence: meanEllipse ? meanConfidenceOutline(meanEllipse) : null
  };
}
