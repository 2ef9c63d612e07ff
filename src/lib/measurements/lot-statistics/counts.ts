/**
 * Counts and shares of a lot: parts per ANSI C78.377-2017 Table 1 bin (nominal CCT of the quadrangle each
 * part falls in, plus "outside every bin"), and parts per verdict (pass, fail). Share = count / parts.
 */
import type { JudgedPart } from '../types';
import type { ShareCount } from './types';

export const OUTSIDE_EVERY_BIN = 'outside every bin';

/** Parts per ANSI bin in rising nominal CCT, outside every bin last. */
// ANSI C78.377-2017 Table 1 (nominal CCT categories); share as a relative frequency (ISO 3534-1:2006 §1.63).
export function binShares(parts: readonly JudgedPart[]): ShareCount[] {
  const counts = new Map<number | null, number>();
  for (const p of parts) counts.set(p.verdict.ansiBin, (counts.get(p.verdict.ansiBin) ?? 0) + 1);
  return [...counts.entries()]
    .sort((a, b) => (a[0] ?? Infinity) - (b[0] ?? Infinity))
    .map(([cct, count]) => ({
      key: cct === null ? 'none' : String(cct),
      label: cct === null ? OUTSIDE_EVERY_BIN : `${cct} K`,
      count,
      share: count / parts.length
    }));
}

/** Parts that pass and parts that fail, both always listed. */
// ISO 3534-1:2006 §1.63 (relative frequency).
export function verdictShares(parts: readonly JudgedPart[]): ShareCount[] {
  const pass = parts.filter((p) => p.verdict.pass).length;
  const n = parts.length;
  return [
    { key: 'pass', label: 'pass', count: pass, share: n ? pass / n : 0 },
    { key: 'fail', label: 'fail', count: n - pass, share: n ? (n - pass) / n : 0 }
  ];
}
