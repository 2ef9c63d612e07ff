/**
 * Capability of a lot against the limits the revision sets:
 *  - colour: the distance of each part from the target, judged in the unit of the tolerance in force — Δu′v′
 *    (CIE 15:2004 §8.1), Δuv (CIE 1960) or MacAdam-type steps — with the tolerance as a one-sided upper limit
 *    (no lower limit: a part on the target is ideal), so Cpk = Cpu. No conversion between units is made.
 *    A distance is never negative and is skewed, so the normal-theory reading of Cpu is approximate.
 *  - CCT: two-sided, LSL/USL = the CCT range of the target's ANSI C78.377-2017 quadrangle (Table 1, or the
 *    flexible-CCT rule), so Cp and Cpk; none without an ANSI quadrangle.
 * Indices: capability.ts (NIST/SEMATECH e-Handbook §6.1.6).
 */
import type { ResolvedTarget, Tolerance } from '../../aim/index';
import { describe } from '../statistics';
import type { JudgedPart } from '../types';
import { capabilityIndices } from './capability';
import type { Capability } from './types';

function colourMeasure(t: Tolerance): { label: string; unit: string; usl: number; of: (p: JudgedPart) => number } {
  if (t.kind === 'sdcm') return { label: 'MacAdam steps from target', unit: 'steps', usl: t.steps, of: (p) => p.verdict.offset.steps };
  if (t.kind === 'deltaUv') return { label: 'Δuv from target', unit: '', usl: t.value, of: (p) => p.verdict.offset.deltaUv };
  return { label: 'Δu′v′ from target', unit: '', usl: t.value, of: (p) => p.verdict.offset.deltaUvPrime };
}

/** Colour capability (one-sided, tolerance as USL) and CCT capability (ANSI quadrangle CCT range). */
// NIST/SEMATECH e-Handbook §6.1.6 (one- and two-sided indices); ANSI C78.377-2017 Table 1 (CCT ranges).
export function lotCapability(parts: readonly JudgedPart[], target: ResolvedTarget, tolerance: Tolerance): Capability[] {
  const out: Capability[] = [];
  const colour = colourMeasure(tolerance);
  const c = describe(parts.map(colour.of));
  if (c) {
    const limitSource = `tolerance in force: ${colour.label.replace(' from target', '')} ≤ ${colour.usl} (upper limit only)`;
    out.push({
      quantity: 'colour',
      label: colour.label,
      unit: colour.unit,
      n: c.n,
      mean: c.mean,
      sd: c.sd,
      lsl: null,
      usl: colour.usl,
      limitSource,
      ...capabilityIndices(c.mean, c.sd, null, colour.usl)
    });
  }
  const cct = describe(parts.map((p) => p.metrics.cct));
  if (cct) {
    const bin = target.ansiBin;
    out.push({
      quantity: 'cct',
      label: 'CCT',
      unit: 'K',
      n: cct.n,
      mean: cct.mean,
      sd: cct.sd,
      lsl: bin ? bin.cctMin : null,
      usl: bin ? bin.cctMax : null,
      limitSource: bin
        ? `CCT range of the ANSI ${bin.nominalCct} K quadrangle, ${Math.round(bin.cctMin)}–${Math.round(bin.cctMax)} K`
        : 'no CCT limits: the target has no ANSI quadrangle',
      ...capabilityIndices(cct.mean, cct.sd, bin ? bin.cctMin : null, bin ? bin.cctMax : null)
    });
  }
  return out;
}
