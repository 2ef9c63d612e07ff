/**
 * Output fractions of the same recipe hot and cold in the superposition model (Ohno, Opt. Eng. 44
 * (2005) 111302): quenching scales each phosphor's emitted power by its factor Q, the pump leak is
 * unchanged, so the hot fractions are ∝ (w₀, Q₁w₁, …) and the cold ones ∝ (w₀, w₁/Q₁, …).
 */
import { normaliseRatios } from '../superposition';

/** Hot output fractions of a recipe with these cold fractions (pump leak first). */
export function quenchedFractions(cold: number[], quench: number[]): number[] {
  return normaliseRatios(cold.map((w, k) => (k === 0 ? w : w * quench[k - 1])));
}

/** Cold (bench) output fractions of a recipe with these hot fractions (pump leak first). */
export function dequenchedFractions(hot: number[], quench: number[]): number[] {
  return normaliseRatios(hot.map((w, k) => (k === 0 ? w : w / quench[k - 1])));
}
