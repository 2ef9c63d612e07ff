/** zod body of `POST /api/v1/yield-predictions`: a blend on the loading model, a target, a variation model, N and a seed. */
import { z } from 'zod';
import { targetSchema, toleranceSchema } from '../../aim/schema';
import { loadingParamsSchema, phosphorSchema, pumpSchema } from '../schemas';
import { DEFAULT_VARIATION_MODEL, variationModelSchema } from './model';
import { DEFAULT_PARTS, MAX_PARTS } from './simulate';

export const yieldPredictionRequestSchema = z.object({
  components: z.object({
    pump: pumpSchema,
    phosphors: z.array(phosphorSchema).min(1, 'at least 1 phosphor').max(5, 'at most 5 phosphors')
  }),
  concentrationsWtPct: z.array(z.number().min(0, 'wt % must be ≥ 0').max(100, 'wt % must be ≤ 100')).min(1),
  loading: loadingParamsSchema.pick({ pathLengthMm: true }),
  target: targetSchema,
  tolerance: toleranceSchema.optional(),
  model: variationModelSchema.default(DEFAULT_VARIATION_MODEL),
  parts: z
    .number()
    .int('parts must be a whole number')
    .min(100, 'at least 100 parts')
    .max(MAX_PARTS, `at most ${MAX_PARTS} parts`)
    .default(DEFAULT_PARTS),
  seed: z
    .number()
    .int('seed must be a whole number')
    .min(0)
    .max(2 ** 32 - 1)
    .default(1),
  breakdown: z.boolean().default(true),
  /** Send the cloud of x,y back (rounded to 5 decimals). */
  cloud: z.boolean().default(true)
});

export type YieldPredictionRequest = z.output<typeof yieldPredictionRequestSchema>;
