/**
 * What a weigh-out is computed from (zod; shared by the batch form, the API and the pure
 * computation). Masses in grams, percentages in %, the mix ratio by weight.
 */
import { z } from 'zod';
import { Rat } from './rational';
import { plainText } from '../../errors/hidden-characters';
import { MAX_BATCH_MASS_G, MAX_BATCH_MASS_MESSAGE, partsMassG, storable, STORED_G_PLACES, STORED_PCT_PLACES } from './limits';

export const LOADING_BASES = ['wtPctOfSlurry', 'phr'] as const;
export type LoadingBasis = (typeof LOADING_BASES)[number];
export const LOADING_BASIS_LABELS: Record<LoadingBasis, string> = {
  wtPctOfSlurry: 'wt % of total slurry',
  phr: 'parts per hundred of silicone (phr)'
};

const pos = (what: string) => z.number(`${what} must be a number`).finite().gt(0, `${what} must be greater than 0`);
/** Grams as the batch tables keep them (6 decimal places). */
export const grams = (what: string) => pos(what).refine(...storable(what, STORED_G_PLACES, ' g'));

export const toleranceSpecSchema = z.discriminatedUnion(
  'kind',
  [
    z.object({
      kind: z.literal('pct'),
      value: pos('tolerance')
        .max(50, 'a tolerance above ±50 % is not a tolerance')
        .refine(...storable('tolerance', STORED_G_PLACES, ' %'))
    }),
    z.object({ kind: z.literal('g'), value: grams('tolerance').max(10_000, 'tolerance must be at most 10 kg') })
  ],
  'tolerance must be { kind: "pct" | "g", value }'
);
export type ToleranceSpec = z.infer<typeof toleranceSpecSchema>;

/** The balance's readability d (one step), g. */
export const balanceStepG = grams('balance resolution').max(10, 'balance resolution must be at most 10 g');
export const minWeightG = z
  .number('minimum weight must be a number')
  .finite()
  .min(0, 'minimum weight must be ≥ 0 g')
  .max(10_000)
  .refine(...storable('minimum weight', STORED_G_PLACES, ' g'));

export const sizingSchema = z.discriminatedUnion(
  'kind',
  [
    z.object({ kind: z.literal('mass'), batchMassG: grams('batch size').max(MAX_BATCH_MASS_G, MAX_BATCH_MASS_MESSAGE) }),
    z
      .object({
        kind: z.literal('parts'),
        partCount: z.number().int('part count must be a whole number').min(1, 'part count must be at least 1').max(10_000_000),
        dispenseMassG: grams('dispense mass per part').max(1000),
        yieldLossPct: z
          .number()
          .min(0, 'yield-loss allowance must be ≥ 0 %')
          .lt(90, 'yield-loss allowance must be below 90 %')
          .refine(...storable('yield-loss allowance', STORED_PCT_PLACES, ' %'))
      })
      .superRefine((s, ctx) => {
        const massG = partsMassG(s.partCount, s.dispenseMassG, s.yieldLossPct);
        if (massG.gt(Rat.int(MAX_BATCH_MASS_G)))
          ctx.addIssue({
            code: 'custom',
            path: ['partCount'],
            message:
              `${s.partCount} parts × ${s.dispenseMassG} g with ${s.yieldLossPct} % yield loss ` +
              `need ${massG.toFixed(0)} g: ${MAX_BATCH_MASS_MESSAGE}`
          });
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
  code: z.string().trim().min(1, 'additive code is required').max(40).superRefine(plainText('additive code')),
  name: z.string().trim().min(1, 'additive name is required').max(200).superRefine(plainText('additive name')),
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
    resolutionG: balanceStepG,
    minWeightG: minWeightG
  })
});
export type WeighoutInput = z.infer<typeof weighoutInputSchema>;
