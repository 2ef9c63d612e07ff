/**
 * Wording of the lot statistics, shared by the measurements page and the batch record PDF: indices,
 * shares, the quantities' precision, the mean's confidence ellipse and the drift over the run.
 */
import type { Capability, ConfidenceEllipse, TrendQuantity, TrendSeries } from './types';

/** Decimal places per trend quantity (x, y to 5; Δu′v′ to 5; CCT to whole kelvin). */
export const TREND_DIGITS: Record<TrendQuantity, number> = { deltaUvPrime: 5, cct: 0, x: 5, y: 5 };

export const formatIndex = (v: number | null): string => (v === null || !Number.isFinite(v) ? '—' : v.toFixed(2));
export const formatShare = (share: number): string => `${(share * 100).toFixed(1)} %`;

/** Decimal places for a capability quantity: CCT whole kelvin, steps 2, Δu′v′/Δuv 5. */
export function capabilityDigits(c: Capability): number {
  if (c.quantity === 'cct') return 0;
  return c.unit === 'steps' ? 2 : 5;
}

/** "1.33 ≥ 1.33: capable" style reading of Cpk (1.33 is the usual floor for an ongoing process: common practice). */
export const CPK_FLOOR = 1.33;
export function cpkReading(c: Capability): string {
  if (c.cpk === null) return c.usl === null && c.lsl === null ? 'no limits' : 'no spread';
  return c.cpk >= CPK_FLOOR ? `capable (Cpk ≥ ${CPK_FLOOR})` : `below ${CPK_FLOOR}`;
}

/** One line describing the mean's confidence ellipse. */
export function describeMeanEllipse(e: ConfidenceEllipse): string {
  const inside =
    e.containsTarget === null
      ? ''
      : e.containsTarget
        ? '; the target lies inside: no evidence the lot mean is off target'
        : '; the target lies outside: the lot mean is off target at this level';
  return (
    `Mean x ${e.mean.x.toFixed(5)}, y ${e.mean.y.toFixed(5)}; ${Math.round(e.level * 100)} % ellipse semi-axes ` +
    `${e.semiMajor.toExponential(2)} × ${e.semiMinor.toExponential(2)} at ${e.angleDeg.toFixed(1)}° ` +
    `(Hotelling T², F(2, ${e.n - 2}) = ${e.fQuantile.toFixed(3)})${inside}.`
  );
}

/**
 * The drift of a series per 1,000 parts with its standard error, and whether it differs from zero at about
 * 95 % (|slope| > 1.96 se; normal approximation of the t statistic for a long run — Montgomery & Runger (2014) §11-4.1).
 */
export function describeDrift(s: TrendSeries): string {
  if (s.slopePer1000 === null || s.slopeSePer1000 === null) return 'too few parts for a drift';
  const d = TREND_DIGITS[s.quantity] + 1;
  const unit = s.unit ? ` ${s.unit}` : '';
  const sig = Math.abs(s.slopePer1000) > 1.96 * s.slopeSePer1000;
  return (
    `${s.slopePer1000 >= 0 ? '+' : '−'}${Math.abs(s.slopePer1000).toFixed(d)}${unit} per 1,000 parts ` +
    `(± ${s.slopeSePer1000.toFixed(d)}): ${sig ? 'a drift during the run' : 'no drift shown'}`
  );
}
