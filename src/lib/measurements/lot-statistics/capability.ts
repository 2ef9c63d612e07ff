/**
 * Process capability indices of a quantity against its specification limits:
 *   Cp = (USL − LSL)/(6σ), Cpu = (USL − μ)/(3σ), Cpl = (μ − LSL)/(3σ), Cpk = min(Cpu, Cpl);
 * with one limit only the one-sided index is Cpk (Cp undefined).
 * NIST/SEMATECH e-Handbook of Statistical Methods (2012), §6.1.6 "What is process capability?";
 * Montgomery, Introduction to Statistical Quality Control, 7th ed. (2013), §8.3.
 * σ is the overall sample standard deviation (n − 1) of the lot, as the Handbook estimates it; with
 * rational subgroups a within-subgroup σ would give the short-term Cpk (Montgomery calls the overall one Ppk).
 * A zero or missing spread gives null: the index is not defined.
 */
import type { CapabilityIndices } from './types';

// NIST/SEMATECH e-Handbook §6.1.6: Cp, Cpu, Cpl, Cpk = min(Cpu, Cpl).
export function capabilityIndices(mean: number, sd: number, lsl: number | null, usl: number | null): CapabilityIndices {
  const ok = Number.isFinite(sd) && sd > 0;
  const cpu = ok && usl !== null ? (usl - mean) / (3 * sd) : null;
  const cpl = ok && lsl !== null ? (mean - lsl) / (3 * sd) : null;
  const cp = ok && usl !== null && lsl !== null ? (usl - lsl) / (6 * sd) : null;
  const sides = [cpu, cpl].filter((v): v is number => v !== null);
  return { cp, cpk: sides.length ? Math.min(...sides) : null, cpu, cpl };
}
