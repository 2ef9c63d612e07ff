/**
 * Checks a balance reading against a line's allowed range, exactly (the reading is taken as the
 * decimal typed or sent by the balance). Out-of-range lines are flagged; a quality override with
 * a reason is then needed before the batch can be completed (common practice: documented
 * deviation, never a silent overwrite).
 */
import { Rat } from './rational';

export type ActualStatus = 'in' | 'below' | 'above';

export interface ActualCheck {
  status: ActualStatus;
  /** Reading − target, g (exact decimal). */
  deviationG: string;
  /** (Reading − target) / target, %, for display. */
  deviationPct: number;
}

/** Parses a reading in grams typed on a form ("12.345", "12,345" with a decimal comma); null when not a mass. */
export function parseReadingG(text: string): Rat | null {
  const t = text.trim().replace(/\s*g$/i, '').replace(',', '.');
  if (!/^\d{1,7}(\.\d{1,7})?$/.test(t)) return null;
  return Rat.parse(t);
}

export function checkActual(reading: Rat, line: { targetG: string; lowG: string; highG: string }): ActualCheck {
  const target = Rat.parse(line.targetG)!;
  const low = Rat.parse(line.lowG)!;
  const high = Rat.parse(line.highG)!;
  const dev = reading.sub(target);
  const status: ActualStatus = reading.lt(low) ? 'below' : reading.gt(high) ? 'above' : 'in';
  return {
    status,
    deviationG: dev.toDecimal(7),
    deviationPct: target.isZero() ? 0 : Number(dev.mul(Rat.HUNDRED).div(target).toFixed(3))
  };
}
