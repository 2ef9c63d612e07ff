/**
 * A change shown beside a slider ("+12 K", "−0.0004"): signed at a fixed precision, and a change
 * smaller than half its last digit reads "< 1 K" rather than a meaningless "+0 K" or "−0 K".
 */
export function signedChange(value: number, decimals: number, unit = ''): string {
  const suffix = unit ? ` ${unit}` : '';
  if (!Number.isFinite(value)) return '—';
  const step = 10 ** -decimals;
  if (Math.abs(value) < step / 2) return `< ${step.toFixed(decimals)}${suffix}`;
  return `${value >= 0 ? '+' : '−'}${Math.abs(value).toFixed(decimals)}${suffix}`;
}
