/**
 * A blend's phosphor cost as people read it: the currency of the library's prices and the basis,
 * "per 1,000 lm of this package's light". The thin-layer proxy only ranks proposals, so it is shown
 * as a relative figure without a currency.
 */
import type { CostBasis } from '../blend/solver/phosphorCost';

/** Four significant figures: 0.003127 → "0.003127", 12.3456 → "12.35". */
function significant(value: number): string {
  return Number(value.toPrecision(4)).toString();
}

export function costLabel(value: number | null, basis: CostBasis, currency: string): string {
  if (value === null || !Number.isFinite(value)) return 'no price';
  if (basis === 'thinLayerProxy') return `${significant(value)} (relative; compare proposals only)`;
  return `${currency} ${significant(value)} per 1,000 lm of this package's light`;
}
