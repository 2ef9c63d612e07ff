/**
 * What a weigh-out is computed from (zod; shared by the batch form, the API and the pure
 * computation). Masses in grams, percentages in %, the mix ratio by weight.
 */
import { z } from 'zod';

export const LOADING_BASES = ['wtPctOfSlurry', 'phr'] as const;
export type LoadingBasis = (typeof LOADING_BASES)[number];
export const LOADING_BASIS_LABELS: Record<LoadingBasis, string> = {
  wtPctOfSlurry: 'wt % of total slurry',
  phr: 'parts per hundred of silicone (phr)'
};

const pos = (what: string) => z.number(`${what} must be a number`).finite().gt(0, `${what} must be greater than 0`);

export const toleranceSpecSchema = z.discriminatedUnion(
  'kind',
  [
    z.object({ kind: z.literal('pct'), value: pos('tolerance').max(50, 'a tolerance above ±50 % is not a tolerance') }),
    z.object({ kind: z.literal('g'), value: pos('tolerance').max(10_000, 'tolerance must be at most 10 kg') })
  ],
  'tolerance must be { kind: "pct" | "g", value }'
);
export type ToleranceSpec = z.infer<typeof toleranceSpecSchema>;

export const sizingSchema = z.discriminatedUnion(
  'kind',
  [
    z.object({ kind: z.literal('mass'), batchMassG: pos('batch size').max(100_000, 'batch size must be at most 100 kg') }),
    z.object({
      kind: z.literal('parts'),
      partCount: z.number().int('part count must be a whole number').min(1, 'part count must be at least 1').max(10_000_000),
      dispenseMassG: pos('dispense mass per part').max(1000),
      yieldLossPct: z.number().min(0, 'yield-loss allowance must be ≥ 0 %').lt(90, 'yield-loss allowance must be below 90 %')
    })
  ],
  'sizing must be { kind: "mass", batchMassG } or { kind: "parts", partCount, dispenseMassG, yieldLossPct }'
);
export type Sizing = z.infer<typeof sizingSchema>;

export const weighoutPhosphorSchema = z.object({
  materialId: z.number().int().positive().nullable(),
  code: z.string().min(1).max(40),
  name: z.string().min(1).max(200),
  /** On the batch basis; with a total loading these are relative shares (the revision's split). */
  pct: pos('phosphor loading').max(1000),
  /**
   * The same loading as an exact fraction "n/d" when `pct` is only its rounded print (a revision's
   * wt % converted to phr); the masses are computed from this, `pct` is shown.
   */
  pctExact: z
    .string()
    .regex(/^\d{1,80}(\/\d{1,80})?$/, 'exact loading must be a fraction n/d')
    .optional(),
  tolerance: toleranceSpecSchema
});

export const additiveSchema = z.object({
  code: z.string().trim().min(1, 'additive code is required').max(40),
  name: z.string().trim().min(1, 'additive name is required').max(200),
  /** On the batch basis (wt % of slurry or phr), like the phosphors. */
  pct: pos('additive loading').max(1000),
  tolerance: toleranceSpecSchema
});

export const weighoutInputSchema = z.object({
  sizing: sizingSchema,
  loading: z.object({
    basis: z.enum(LOADING_BASES, 'loading basis must be wtPctOfSlurry or phr'),
    /** When set, the phosphors' pct are scaled so they add up to this total. */
    totalPct: pos('total phosphor loading').max(1000).nullable()
  }),
  phosphors: z.array(weighoutPhosphorSchema).min(1, 'at least one phosphor').max(5, 'at most 5 phosphors'),
  additives: z.array(additiveSchema).max(5, 'at most 5 additives'),
  silicone: z.object({
    name: z.string().min(1).max(200),
    ratioA: pos('mix ratio part A').max(100),
    ratioB: pos('mix ratio part B').max(100),
    toleranceA: toleranceSpecSchema,
    toleranceB: toleranceSpecSchema
  }),
  balance: z.object({
    resolutionG: pos('balance resolution').max(10, 'balance resolution must be at most 10 g'),
    minWeightG: z.number().finite().min(0, 'minimum weight must be ≥ 0 g').max(10_000)
  })
});
export type WeighoutInput = z.infer<typeof weighoutInputSchema>;
