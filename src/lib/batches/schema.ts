/**
 * Form and API schemas of batches (shared by pages and endpoints). A batch is planned from an
 * approved formulation revision; the revision supplies the phosphors, their split and the silicone
 * system, the request supplies size, loading, tolerances, additives and the balance.
 */
import { z } from 'zod';
import { additiveSchema, balanceStepG, grams, LOADING_BASES, minWeightG, sizingSchema, toleranceSpecSchema } from './weighout/schema';
import { plainText } from '../errors/hidden-characters';
import { MAX_BATCH_MASS_G, MAX_BATCH_MASS_MESSAGE } from './weighout/limits';
import { PAPER_SIZES } from './weighout/paper';
import { chipLotSchema } from './chip-lot';

export const BATCH_STATES = ['planned', 'weighing', 'complete', 'released', 'rejected'] as const;
export type BatchState = (typeof BATCH_STATES)[number];
export const BATCH_STATE_LABELS: Record<BatchState, string> = {
  planned: 'Planned',
  weighing: 'Weighing',
  complete: 'Complete',
  released: 'Released',
  rejected: 'Rejected'
};

const id = z.number('must be a number').int().positive();
const version = z.number('version is required (the version you read)').int().positive();

export const createBatchSchema = z.object({
  revisionId: id,
  sizing: sizingSchema,
  loading: z.discriminatedUnion(
    'mode',
    [
      /** Per-phosphor loadings; omitted = the revision's loading-model wt % (converted to phr on that basis). */
      z.object({
        mode: z.literal('perPhosphor'),
        basis: z.enum(LOADING_BASES),
        pcts: z.array(z.number().finite().gt(0, 'each phosphor loading must be > 0')).min(1).max(5).optional()
      }),
      /** A total, split in the revision's proportions. */
      z.object({
        mode: z.literal('total'),
        basis: z.enum(LOADING_BASES),
        totalPct: z.number().finite().gt(0, 'total loading must be > 0').max(1000)
      })
    ],
    'loading must be { mode: "perPhosphor" | "total", basis, ... }'
  ),
  phosphorTolerances: z.array(toleranceSpecSchema).max(5).optional(),
  siliconeTolerances: z.object({ a: toleranceSpecSchema, b: toleranceSpecSchema }).optional(),
  additives: z.array(additiveSchema).max(5).default([]),
  balance: z.object({
    resolutionG: balanceStepG,
    minWeightG,
    ref: z.string().trim().max(80).superRefine(plainText('balance reference')).optional()
  }),
  /** Plant slurry-age limit (min), when shorter than the silicone's pot life. */
  plantLimitMin: z
    .number()
    .int()
    .positive()
    .max(24 * 60)
    .nullable()
    .optional(),
  /** Must be the revision's silicone system when given (a different silicone needs a new revision). */
  siliconeSystemId: id.nullable().optional(),
  /** The chip lot built with: required (with its bin code or wavelength) when the revision has a recipe per chip bin. */
  chipLot: chipLotSchema.nullable().optional(),
  notes: z.string().trim().max(2000).optional()
});
export type CreateBatchRequest = z.infer<typeof createBatchSchema>;

/** A balance reading as typed or sent: "12.345" (a number is accepted too). */
const reading = z.union([z.string(), z.number().finite().nonnegative()]).transform((v) => String(v).trim());

export const recordLineSchema = z.object({
  actualG: reading.refine((v) => v !== '', 'enter the balance reading in g'),
  lotNumber: z.string().trim().min(1, 'scan or type the lot number').max(80).superRefine(plainText('lot number')),
  version: version
});

export const overrideLineSchema = z.object({
  reason: z.string().trim().min(10, 'give a reason of at least 10 characters').max(2000),
  password: z.string().min(1, 'enter your password to sign the decision').max(200),
  version: version
});

export const mixSchema = z.object({ version, mixedAt: z.coerce.date().optional() });
export const completeSchema = z.object({ version });
export const scaleSchema = z.union(
  [
    z.object({ version, batchMassG: grams('batch size').max(MAX_BATCH_MASS_G, MAX_BATCH_MASS_MESSAGE) }),
    z.object({ version, factor: z.number().finite().gt(0).max(100) })
  ],
  'give batchMassG or factor'
);

export const listQuerySchema = z.object({
  state: z.enum(BATCH_STATES).optional(),
  q: z.string().trim().max(80).optional(),
  lot: z.string().trim().max(80).optional(),
  revisionId: z.coerce.number().int().positive().optional(),
  limit: z.coerce.number().int().min(1).max(200).default(50),
  offset: z.coerce.number().int().min(0).default(0)
});

export const paperSchema = z.enum(PAPER_SIZES).default('A4');
