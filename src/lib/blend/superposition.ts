/**
 * Optical superposition model of a blend (Ohno, "Spectral design considerations for
 * white LED color rendering", Opt. Eng. 44 (2005) 111302; Schubert, *Light-Emitting
 * Diodes*, 2nd ed. (2006), white-light chapters) [equations from memory]:
 *
 *   S(λ) = Σₖ wₖ Êₖ(λ),   ∫Êₖ dλ = 1,   wₖ ≥ 0,   Σ wₖ = 1
 *
 * w are the radiant-power fractions of the pump leak (k = 0) and each phosphor in the
 * output; XYZ(S) = Σ wₖ XYZ(Êₖ) (linear), so x = X/(X+Y+Z) is a ratio of linear forms.
 * Re-absorption and shape changes are ignored here (see the loading model for those).
 */
import { BlendInputError } from './errors';
import type { Basis } from './basis';
import { GRID_LENGTH } from './grid';

export function normaliseRatios(ratios: number[]): number[] {
  const clean = ratios.map((r) => (Number.isFinite(r) && r > 0 ? r : 0));
  const s = clean.reduce((a, b) => a + b, 0);
  if (!(s > 0)) throw new BlendInputError('ratios: at least one component must be > 0');
  return clean.map((r) => r / s);
}

export function superposeSpd(basis: Basis, fractions: number[]): Float64Array {
  const out = new Float64Array(GRID_LENGTH);
  basis.components.forEach((c, k) => {
    const w = fractions[k];
    if (!w) return;
    for (let i = 0; i < GRID_LENGTH; i++) out[i] += w * c.spd[i];
  });
  return out;
}

export function superposeXyz(basis: Basis, fractions: number[]): [number, number, number] {
  let X = 0;
  let Y = 0;
  let Z = 0;
  basis.components.forEach((c, k) => {
    X += fractions[k] * c.xyz[0];
    Y += fractions[k] * c.xyz[1];
    Z += fractions[k] * c.xyz[2];
  });
  return [X, Y, Z];
}

export function xyOf(xyz: [number, number, number]): [number, number] {
  const s = xyz[0] + xyz[1] + xyz[2];
  return [xyz[0] / s, xyz[1] / s];
}
