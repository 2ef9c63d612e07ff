/**
 * Quantile of the F distribution with 2 numerator degrees of freedom (the two chromaticity
 * coordinates of a Hotelling T² region). Abramowitz & Stegun (1964), Handbook of Mathematical
 * Functions, 26.6.2: Q(F | ν₁, ν₂) = I_x(ν₂/2, ν₁/2) with x = ν₂/(ν₂ + ν₁F); for ν₁ = 2 the regularised
 * incomplete beta is I_x(a, 1) = xᵃ (26.5.1 with b = 1), so Q = (1 + 2F/ν₂)^(−ν₂/2) and the
 * inverse is closed: F = (ν₂/2)·((1 − p)^(−2/ν₂) − 1). Exact for any ν₂ > 0 and 0 < p < 1.
 */

// A&S 26.6.2 with I_x(a, 1) = xᵃ: F_{2,ν₂,p} = (ν₂/2)((1 − p)^(−2/ν₂) − 1).
export function fQuantileTwoNumeratorDf(denominatorDf: number, probability: number): number {
  if (!(denominatorDf > 0)) throw new RangeError('denominator degrees of freedom must be positive');
  if (!(probability > 0 && probability < 1)) throw new RangeError('probability must lie between 0 and 1');
  return (denominatorDf / 2) * ((1 - probability) ** (-2 / denominatorDf) - 1);
}
