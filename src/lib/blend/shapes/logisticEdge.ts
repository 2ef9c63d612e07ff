/**
 * Long-wavelength absorption edge of a broad-band (Eu²⁺, Ce³⁺) phosphor, as a logistic
 * step: ex(λ) = 1 / (1 + exp((λ − λ_edge)/w)). An empirical stand-in for an excitation
 * spectrum that is flat in the UV–blue and falls off past λ_edge [common practice for
 * illustrative data; not a physical model]. Units nm; λ_edge 300–700, w 2–60.
 */
import { GRID_LENGTH, GRID_NM } from '../grid';

export function logisticEdge(edgeNm: number, widthNm: number): Float64Array {
  const out = new Float64Array(GRID_LENGTH);
  for (let i = 0; i < GRID_LENGTH; i++) out[i] = 1 / (1 + Math.exp((GRID_NM[i] - edgeNm) / widthNm));
  return out;
}
