/** How a hot-aimed revision's cold check target reads on the revision page, the ticket and the batch record. */
import { describeCondition, isBenchCondition } from '../aim/condition';
import type { ColdCheck } from '../recipe/schemaV3';

/** "x 0.4372, y 0.4021 (2990 K, Duv 0.0006) at bench (25 °C)". */
export function coldCheckLabel(c: ColdCheck): string {
  const cct = c.cct === null ? '' : ` (${Math.round(c.cct)} K${c.duv === null ? '' : `, Duv ${c.duv.toFixed(4)}`})`;
  const at = isBenchCondition(c.condition) ? describeCondition(null) : describeCondition(c.condition);
  return `x ${c.x.toFixed(4)}, y ${c.y.toFixed(4)}${cct} at ${at}`;
}
