/**
 * The predicted metrics stored with a revision: the blend's SPD by optical superposition (`mix`,
 * Ohno, Opt. Eng. 44 (2005) 111302) evaluated by the spectral core (CIE 15 colour point, Ohno 2014
 * CCT/Duv, CIE 13.3-1995 Ra/R1–R14, CIE 224:2017 Rf/Rg, LER), the ANSI C78.377 bin and the
 * distance to the revision's target in the units of its tolerance. Pure: no I/O.
 */
// Narrow imports: the blend index also loads the solver, whose module set-up is slow on a cold start.
import { mix } from '../blend/mix';
import { cctMeaningful } from '../spectral/meaningful';
import { colourDistance, resolveTarget, violatedFloors, withinTolerance } from '../aim/index';
import type { BlendComponents } from '../blend/types';
import type { AlphaOpicResult } from '../spectral/types';
import { ansiBinOf } from '../spectral/ansi/c78377';
import { designIntents, type DesignIntentReport } from '../spectral/tm30/design-intents';
import { fractionsWithLeak, type RevisionContent } from '../recipe';

/** Names the computation that produced a prediction; stored beside it so later readers know. */
export const PREDICTION_CORE_VERSION = 'phosforge-core 0.1.0 (optical superposition)';

export interface RevisionPrediction {
  x: number;
  y: number;
  uPrime: number;
  vPrime: number;
  cct: number;
  duv: number;
  ra: number | null;
  r9: number | null;
  ri: number[];
  rf: number | null;
  rg: number | null;
  lerLmPerW: number;
  /** α-opic efficacies, DERs and melanopic EDI per 1,000 lx (CIE S 026/E:2018); absent on older revisions. */
  alphaOpic?: AlphaOpicResult;
  peakNm: number;
  ansiBin: number | null;
  target: { x: number; y: number; cct: number; duv: number; label: string };
  deltaUvPrime: number;
  /** MacAdam-type steps from the target; kept under this name in the stored prediction JSON of every revision. */
  sdcm: number;
  withinTolerance: boolean;
  floorsMissed: string[];
  /** Strictest TM-30-20 Annex E level met per intent (null below level 3); null where TM-30 is not meaningful or on older revisions. */
  intents?: DesignIntentReport['best'] | null;
  /** Output SPD on the core's grid, scaled to peak 1 (for charts and comparisons). */
  spd: { startNm: number; stepNm: number; values: number[] };
}

const finite = (v: number): number | null => (Number.isFinite(v) ? v : null);
const round = (v: number, digits: number) => Number(v.toFixed(digits));

/** Floors the prediction misses; rendering floors count as missed when CIE 13.3 is not meaningful (DC ≥ 5.4e-3). */
function missedFloors(
  content: RevisionContent,
  m: {
    ra: number | null;
    r9: number | null;
    rf: number | null;
    rg: number | null;
    rfh1: number | null;
    rcsh1: number | null;
    ler: number;
    melDer: number;
  }
): string[] {
  const f = content.floors;
  const renderingFloor = [f.raMin, f.r9Min, f.rfMin, f.rgMin, f.rgMax, f.intent].some((v) => v !== undefined);
  const undefinedCri =
    renderingFloor && m.ra === null
      ? ['Colour rendering (Ra, R9, Rf, Rg) not defined (colour point too far from the Planckian locus, CIE 13.3 §5.3)']
      : [];
  return [...undefinedCri, ...violatedFloors(f, { ...m, ra: m.ra ?? 100, r9: m.r9 ?? 100, costPer1000Lm: null })];
}

export function predictRevision(content: RevisionContent, components: BlendComponents): RevisionPrediction {
  const result = mix(components, { kind: 'optical', fractions: fractionsWithLeak(content) });
  const e = result.evaluation;
  const target = resolveTarget(content.target);
  const err = colourDistance(e.x, e.y, target);
  // Colour rendering only where CIE 13.3 holds and CCT means something, TM-30 with it (../spectral/meaningful.ts).
  const rendering = e.cri.valid && cctMeaningful(e.cct, e.duv);
  const ra = rendering ? e.cri.ra : null;
  const r9 = rendering ? e.cri.ri[8] : null;
  const rf = rendering ? finite(e.tm30.rf) : null;
  const rg = rendering ? finite(e.tm30.rg) : null;
  const peak = Math.max(...result.spd.values);
  return {
    x: e.x,
    y: e.y,
    uPrime: e.uPrime,
    vPrime: e.vPrime,
    cct: e.cct,
    duv: e.duv,
    ra,
    r9,
    ri: rendering ? e.cri.ri : [],
    rf,
    rg,
    lerLmPerW: e.ler,
    alphaOpic: e.alphaOpic,
    peakNm: e.peakNm,
    ansiBin: ansiBinOf(e.x, e.y),
    target: { x: target.x, y: target.y, cct: target.cct, duv: target.duv, label: target.label },
    deltaUvPrime: err.deltaUvPrime,
    sdcm: err.steps,
    withinTolerance: withinTolerance(err, content.tolerance),
    floorsMissed: missedFloors(content, {
      ra,
      r9,
      rf,
      rg,
      rfh1: rendering ? finite(e.tm30.bins[0]?.rf ?? NaN) : null,
      rcsh1: rendering ? finite(e.tm30.bins[0]?.rcs ?? NaN) : null,
      ler: e.ler,
      melDer: e.alphaOpic.der.melanopic
    }),
    intents: rendering ? (designIntents(e.tm30)?.best ?? null) : null,
    spd: {
      startNm: result.spd.wavelengths[0],
      stepNm: result.spd.wavelengths[1] - result.spd.wavelengths[0],
      values: result.spd.values.map((v) => round(peak > 0 ? v / peak : 0, 5))
    }
  };
}
