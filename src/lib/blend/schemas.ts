/**
 * zod schemas of the blend API bodies: `POST /api/v1/mix` (mixRequestSchema),
 * `POST /api/v1/solve` (solveProblemSchema), correction (correctionRequestSchema).
 * Spectra are checked for shape here; the core's resampler checks their content
 * (increasing wavelengths, 300–900 nm, power) and throws SpectrumInputError (→ 422).
 */
import { z } from 'zod';
import { floorsSchema, targetSchema, toleranceSchema } from '../aim/schema';
import { plainText } from '../errors/hidden-characters';
import { operatingConditionSchema } from '../aim/condition';
import { materialThermalSchema } from './thermal/schema';
import { TRADE_OFF_METRICS } from './solver/tradeOffMetric';

export const spdSchema = z
  .object({
    wavelengths: z
      .array(z.number().finite(), 'wavelengths must be an array of numbers (nm)')
      .min(5, 'a spectrum needs at least 5 points')
      .max(5000, 'at most 5000 points'),
    values: z.array(z.number().finite(), 'values must be an array of numbers').max(5000, 'at most 5000 points')
  })
  .refine((s) => s.wavelengths.length === s.values.length, 'wavelengths and values must have the same length');

const id = z.string().min(1, 'id is required').max(100);
const name = z.string().min(1, 'name is required').max(200).superRefine(plainText('name'));

export const pumpSchema = z
  .object({
    id,
    name,
    spectrum: spdSchema.optional(),
    parametric: z
      .object({
        peakNm: z.number().min(250, 'pump peak must be 250–1000 nm').max(1000, 'pump peak must be 250–1000 nm'),
        fwhmNm: z.number().min(0.5, 'pump FWHM must be 0.5–300 nm').max(300, 'pump FWHM must be 0.5–300 nm'),
        asymmetry: z.number().min(-0.9, 'asymmetry must be −0.9…0.9').max(0.9, 'asymmetry must be −0.9…0.9').optional()
      })
      .optional()
  })
  .refine((p) => p.spectrum !== undefined || p.parametric !== undefined, 'pump needs a measured spectrum or parametric { peakNm, fwhmNm }');

export const phosphorSchema = z.object({
  id,
  name,
  family: z.string().max(200).optional(),
  emission: spdSchema,
  excitation: spdSchema.optional(),
  iqe: z.number().gt(0, 'IQE must be > 0').max(1, 'IQE is a fraction, at most 1'),
  absorptionPerWtPctMm: z.number().gt(0, 'absorption coefficient must be > 0 (1/(wt %·mm))').optional(),
  absorptionReferenceNm: z.number().min(300).max(900).optional(),
  densityGPerCm3: z.number().gt(0, 'density must be > 0 g/cm³').max(20).optional(),
  costPerKg: z.number().min(0, 'cost per kg must be ≥ 0').optional()
});

export const loadingParamsSchema = z.object({
  pathLengthMm: z.number().gt(0, 'path length must be > 0 mm').max(100, 'path length must be ≤ 100 mm'),
  cascade: z.boolean().optional(),
  cascadePathFactor: z.number().gt(0).max(10).optional(),
  siliconeDensityGPerCm3: z.number().gt(0).max(5).optional(),
  geometry: z.enum(['fixedMass', 'fixedVolume'], { message: 'dispense geometry must be fixedMass or fixedVolume' }).optional(),
  pumpIrradianceWPerMm2: z.number().gt(0).max(100).optional()
});

const componentsFor = (min: number) =>
  z.object({
    pump: pumpSchema,
    phosphors: z
      .array(phosphorSchema)
      .min(min, `at least ${min} phosphor${min > 1 ? 's' : ''}`)
      .max(5, 'at most 5 phosphors')
  });

export const recipeSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('optical'), fractions: z.array(z.number().min(0, 'fractions must be ≥ 0')).min(2) }),
  z.object({
    kind: z.literal('loading'),
    concentrationsWtPct: z.array(z.number().min(0, 'wt % must be ≥ 0').max(100, 'wt % must be ≤ 100')).min(1),
    loading: loadingParamsSchema
  })
]);

export const mixRequestSchema = z.object({ components: componentsFor(1), ratios: recipeSchema });

export const solveProblemSchema = z.object({
  components: componentsFor(2),
  target: targetSchema,
  tolerance: toleranceSchema.optional(),
  floors: floorsSchema.optional(),
  objective: z.enum(
    ['maxLer', 'maxRa', 'maxRf', 'minCost', 'maxMelDer', 'minMelDer'],
    'objective must be maxLer, maxRa, maxRf, minCost, maxMelDer or minMelDer'
  ),
  maxCandidates: z.number().int().min(1).max(10).optional(),
  loading: loadingParamsSchema.optional(),
  /** The condition the target holds at (null or absent = bench); a hot one solves on the components at it. */
  condition: operatingConditionSchema.nullable().optional(),
  /** Thermal data by component id; absent = the library's (the server looks them up), null = not characterised. */
  thermal: z.record(z.string(), materialThermalSchema.nullable()).optional()
});

export const correctionRequestSchema = z.object({
  components: componentsFor(2),
  recipe: recipeSchema,
  measured: z.discriminatedUnion('kind', [
    z.object({
      kind: z.literal('xy'),
      points: z.array(z.object({ x: z.number().gt(0).lt(1), y: z.number().gt(0).lt(1) })).min(1, 'at least one measured point')
    }),
    z.object({ kind: z.literal('spd'), spectra: z.array(spdSchema).min(1, 'at least one measured spectrum') })
  ]),
  target: targetSchema,
  stepFraction: z.number().gt(0).max(1).optional()
});

export type MixRequest = z.infer<typeof mixRequestSchema>;
export type SolveProblemInput = z.infer<typeof solveProblemSchema>;
export type CorrectionRequest = z.infer<typeof correctionRequestSchema>;

/** `POST /api/v1/solve/trade-off`: the LER front against one rendition metric at a target, floors held. */
export const tradeOffRequestSchema = z.object({
  components: componentsFor(2),
  target: targetSchema,
  floors: floorsSchema.optional(),
  metric: z.enum(TRADE_OFF_METRICS, `metric must be one of ${TRADE_OFF_METRICS.join(', ')}`),
  points: z.number().int().min(2, 'at least 2 points').max(50, 'at most 50 points').optional(),
  loading: loadingParamsSchema.optional()
});
export type TradeOffRequest = z.infer<typeof tradeOffRequestSchema>;
