/**
 * Pass/fail of one built part against its formulation revision:
 *  colour  — within the allowed tolerance around the target: MacAdam-type steps, Δu′v′ or Δuv
 *            (the revision's tolerance, or a step ellipse quality chose for the batch);
 *  bin     — optionally inside the target's ANSI C78.377 quadrangle (Table 1 or flexible CCT);
 *  floors  — the revision's floors on Ra, R9 (CIE 13.3), Rf, Rg (CIE 224 / TM-30), LER and melanopic DER
 *            (CIE S 026/E:2018; a part measured before it was computed has none and fails such a floor).
 * A floor on a metric the core could not give (CRI not meaningful far from the locus, TM-30 not
 * finite) fails the part: an unknown value is not evidence of compliance [common practice].
 */
import { intentMisses } from '../spectral/tm30/design-intents';
import {
  colourDistance,
  FLOOR_RULES,
  withinTolerance,
  formatFloorValue,
  type FloorMetric,
  type ColourDistance,
  type ResolvedTarget,
  type Tolerance
} from '../aim/index';
import { ansiBinOf, isInQuadrangle } from '../spectral/ansi/c78377';
import type { Acceptance, PartFailure, PartMetrics, PartVerdict } from './types';

export function describeTolerance(t: Tolerance): string {
  if (t.kind === 'sdcm') return `${t.steps}-step ellipse`;
  if (t.kind === 'deltaUvPrime') return `Δu′v′ ≤ ${t.value}`;
  return `Δuv ≤ ${t.value}`;
}

/** The colour failure message, or null when the offset is within tolerance. */
export function colourFailure(o: ColourDistance, t: Tolerance): string | null {
  if (withinTolerance(o, t)) return null;
  if (t.kind === 'sdcm') return `${o.steps.toFixed(1)} steps from target > ${t.steps}`;
  if (t.kind === 'deltaUvPrime') return `Δu′v′ ${o.deltaUvPrime.toFixed(4)} > ${t.value}`;
  return `Δuv ${o.deltaUv.toFixed(4)} > ${t.value}`;
}

function metricValue(m: PartMetrics, metric: FloorMetric): number | null {
  if ((metric === 'ra' || metric === 'r9') && !m.criValid && m.source !== 'table') return null;
  if (metric === 'melDer') return m.alphaOpic?.der.melanopic ?? null;
  return m[metric];
}

/**
 * Floors a part read from a tester table cannot be judged on: the table does not carry the metric (it
 * needs the spectrum). Shown as "not measured", never a failure and never computed from nothing.
 */
export function floorsNotMeasured(m: PartMetrics, floors: Acceptance['floors']): string[] {
  if (m.source !== 'table') return [];
  const out: string[] = [];
  for (const r of FLOOR_RULES)
    if (floors[r.key] !== undefined && metricValue(m, r.metric) === null)
      out.push(`${r.label} ${r.sense > 0 ? '≥' : '≤'} ${floors[r.key]}: not measured`);
  if (floors.intent) out.push(`TM-30 design intent ${floors.intent}: not measured`);
  return out;
}

/** Floor failures, e.g. "Ra 78.4 < 80", "R9 not meaningful (source too far from the locus)". */
export function floorFailures(m: PartMetrics, floors: Acceptance['floors']): PartFailure[] {
  const out: PartFailure[] = [];
  const fromTable = m.source === 'table';
  for (const r of FLOOR_RULES) {
    const limit = floors[r.key];
    if (limit === undefined) continue;
    const value = metricValue(m, r.metric);
    if (value === null && fromTable) continue; // judged on what the table carries: see floorsNotMeasured
    if (value === null) {
      const message =
        r.metric === 'ra' || r.metric === 'r9'
          ? `${r.label} not meaningful (source too far from the Planckian locus)`
          : `${r.label} not available`;
      out.push({ code: r.key, message });
      continue;
    }
    if (r.sense * (limit - value) > 0)
      out.push({ code: r.key, message: `${r.label} ${formatFloorValue(r, value)} ${r.sense > 0 ? '<' : '>'} ${limit}` });
  }
  const level = floors.intent;
  if (level && !fromTable) {
    const values = { rf: m.rf, rg: m.rg, rfh1: m.rfh1 ?? null, rcsh1: m.rcsh1 ?? null };
    if (Object.values(values).some((v) => v === null || !Number.isFinite(v)))
      out.push({ code: 'intent', message: `TM-30 design intent ${level} not judged (Rf, Rg or hue-bin-1 indices not available)` });
    else {
      const misses = intentMisses(level, values as Record<keyof typeof values, number>);
      if (misses.length) out.push({ code: 'intent', message: `TM-30 design intent ${level} not met: ${misses.join(', ')}` });
    }
  }
  return out;
}

export function judgePart(m: PartMetrics, target: ResolvedTarget, acceptance: Acceptance): PartVerdict {
  const offset = colourDistance(m.x, m.y, target);
  const bin = ansiBinOf(m.x, m.y);
  const quad = target.ansiBin;
  const inTargetBin = quad ? isInQuadrangle(m.x, m.y, quad) : null;
  const failures: PartFailure[] = [];
  const colour = colourFailure(offset, acceptance.tolerance);
  if (colour) failures.push({ code: 'colour', message: colour });
  if (acceptance.requireTargetBin && quad && !inTargetBin) {
    const where = bin === null ? 'in no ANSI bin' : `in the ${bin} K bin`;
    failures.push({ code: 'bin', message: `outside the ${quad.nominalCct} K bin (${where})` });
  }
  failures.push(...floorFailures(m, acceptance.floors));
  const notMeasured = floorsNotMeasured(m, acceptance.floors);
  return { pass: failures.length === 0, failures, ansiBin: bin, inTargetBin, offset, ...(notMeasured.length ? { notMeasured } : {}) };
}
