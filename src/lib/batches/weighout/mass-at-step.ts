/**
 * A mass as the balance shows it: with as many decimals as the balance step has (step 0.001 g →
 * "2.857", "64.900"), so a list never mixes "64.9 g" with "2.857 g". Exact decimals (./rational.ts).
 */
import { Rat } from './rational';

export function massAtStep(grams: number | string, stepG: number | string): string {
  const mass = typeof grams === 'string' ? Rat.parse(grams) : Rat.fromNumber(grams);
  const step = typeof stepG === 'string' ? Rat.parse(stepG) : Rat.fromNumber(stepG);
  if (!mass) return String(grams);
  const places = step?.decimalPlaces() ?? 6;
  return mass.toFixed(places);
}
