/**
 * The operating condition a target holds at: junction (or solder-point) temperature and drive
 * current. White LEDs are commonly binned and specified hot, at 85 °C (common practice), while the
 * phosphor lab measures at room temperature; null on a target means the bench condition.
 */
import { z } from 'zod';

/** Room temperature of a bench measurement, °C (common practice: 25 °C). */
export const BENCH_TEMPERATURE_C = 25;

export const operatingConditionSchema = z.object({
  /** Which temperature is stated: the LED junction, or the solder point a fixture maker can measure. */
  reference: z.enum(['junction', 'solderPoint']).default('junction'),
  temperatureC: z.number().min(-40, 'temperature must be −40 to 200 °C').max(200, 'temperature must be −40 to 200 °C'),
  /** Drive current, mA; null when not stated. */
  driveCurrentMa: z.number().positive('drive current must be positive').max(20000).nullable().default(null)
});

export type OperatingCondition = z.output<typeof operatingConditionSchema>;

export const BENCH_CONDITION: OperatingCondition = { reference: 'junction', temperatureC: BENCH_TEMPERATURE_C, driveCurrentMa: null };

/** The condition a target holds at (null = bench). */
export function conditionOf(condition: OperatingCondition | null | undefined): OperatingCondition {
  return condition ?? BENCH_CONDITION;
}

/** True when the condition is the bench one (no thermal shift to model). */
export function isBenchCondition(condition: OperatingCondition | null | undefined): boolean {
  const c = conditionOf(condition);
  return c.temperatureC === BENCH_TEMPERATURE_C && c.driveCurrentMa === null;
}

/** "Tj 85 °C, 350 mA", "Ts 85 °C" or "bench (25 °C)". */
export function describeCondition(condition: OperatingCondition | null | undefined): string {
  if (!condition) return `bench (${BENCH_TEMPERATURE_C} °C)`;
  const t = `${condition.reference === 'junction' ? 'Tj' : 'Ts'} ${condition.temperatureC} °C`;
  return condition.driveCurrentMa === null ? t : `${t}, ${condition.driveCurrentMa} mA`;
}
