/**
 * Thermal data of a material, as the supplier or the lab characterises it (zod schemas).
 * Phosphor: relative emission vs temperature (1 at 25 °C), optionally the peak shift (nm) and the
 * width factor of the emission band. Pump: peak drift per kelvin and per mA (about a reference
 * current) and relative radiant output vs temperature. Temperatures are those of the condition's
 * reference point (junction or solder point); the data are taken as stated against the same one.
 */
import { z } from 'zod';
import { BENCH_TEMPERATURE_C } from '../../aim/condition';

const temperatureC = z
  .number({ error: 'temperature must be a number (°C)' })
  .min(-40, 'temperature must be −40 to 250 °C')
  .max(250, 'temperature must be −40 to 250 °C');

export const thermalPointSchema = z.object({ temperatureC, value: z.number({ error: 'value must be a number' }).finite() });
export type ThermalPoint = z.output<typeof thermalPointSchema>;

/** Points in strictly rising temperature, including the bench temperature with the given value. */
function pointsAnchoredAt(anchor: number, min: number, max: number, what: string) {
  return z
    .array(
      thermalPointSchema.extend({
        value: z.number().min(min, `${what} must be ${min} to ${max}`).max(max, `${what} must be ${min} to ${max}`)
      })
    )
    .min(2, `${what}: give at least two temperatures`)
    .max(20, `${what}: at most 20 temperatures`)
    .superRefine((pts, ctx) => {
      for (let i = 1; i < pts.length; i++) {
        if (!(pts[i].temperatureC > pts[i - 1].temperatureC)) {
          ctx.addIssue({
            code: 'custom',
            path: [i, 'temperatureC'],
            message: `${what}: temperatures must rise strictly (${pts[i].temperatureC} °C)`
          });
          return;
        }
      }
      const bench = pts.find((p) => p.temperatureC === BENCH_TEMPERATURE_C);
      if (!bench || Math.abs(bench.value - anchor) > 1e-9) {
        ctx.addIssue({ code: 'custom', message: `${what}: must include ${BENCH_TEMPERATURE_C} °C with the value ${anchor}` });
      }
    });
}

/** Relative emission or output: 1 at 25 °C; 0 (fully quenched) to 1.2 (a slight rise is seen in some phosphors). */
export const relativeCurveSchema = pointsAnchoredAt(1, 0, 1.2, 'relative curve');

/** A quantity that changes with temperature: linear per kelvin from 25 °C, or measured points. */
function dependence(anchor: number, perKMax: number, min: number, max: number, what: string) {
  return z.union([
    z
      .object({ perK: z.number().finite().min(-perKMax, `${what} per K is out of range`).max(perKMax, `${what} per K is out of range`) })
      .strict(),
    z.object({ points: pointsAnchoredAt(anchor, min, max, what) }).strict()
  ]);
}

/** Emission peak shift, nm (0 at 25 °C; per K or points). */
export const peakShiftSchema = dependence(0, 1, -50, 50, 'peak shift');
/** Emission band width factor (1 at 25 °C; `perK` is the fractional change per kelvin). */
export const widthFactorSchema = dependence(1, 0.01, 0.5, 2, 'width factor');

export const phosphorThermalSchema = z
  .object({
    kind: z.literal('phosphor'),
    relativeEmission: relativeCurveSchema,
    peakShiftNm: peakShiftSchema.nullable().default(null),
    widthFactor: widthFactorSchema.nullable().default(null)
  })
  .strict();

export const pumpThermalSchema = z
  .object({
    kind: z.literal('pump'),
    /** Peak drift toward the red per kelvin, nm/K (blue InGaN ~0.03–0.05 nm/K [from memory]). */
    peakDriftNmPerK: z.number().finite().min(-1, 'peak drift must be −1 to 1 nm/K').max(1, 'peak drift must be −1 to 1 nm/K'),
    /** Peak drift per mA of drive current above the reference current, nm/mA; null = not characterised. */
    peakDriftNmPerMa: z
      .number()
      .finite()
      .min(-0.5, 'drift per mA must be −0.5 to 0.5 nm/mA')
      .max(0.5, 'drift per mA must be −0.5 to 0.5 nm/mA')
      .nullable()
      .default(null),
    referenceCurrentMa: z.number().positive('reference current must be positive').max(20000).nullable().default(null),
    relativeOutput: relativeCurveSchema
  })
  .strict()
  .refine((p) => p.peakDriftNmPerMa === null || p.referenceCurrentMa !== null, {
    message: 'a drift per mA needs the reference current it is measured from',
    path: ['referenceCurrentMa']
  });

export const materialThermalSchema = z.union([phosphorThermalSchema, pumpThermalSchema]);

export type PhosphorThermal = z.output<typeof phosphorThermalSchema>;
export type PumpThermal = z.output<typeof pumpThermalSchema>;
export type MaterialThermal = z.output<typeof materialThermalSchema>;
export type TemperatureDependence = z.output<typeof peakShiftSchema>;
