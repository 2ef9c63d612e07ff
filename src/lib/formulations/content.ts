/**
 * What a formulation revision holds (stored as JSON in formulation_revisions.content_json and hashed
 * for e-signatures). Shared by the designer (save), formulations (review, compare), batches (weigh-out)
 * and quality (targets, correction). Materials are referenced by id and copied by code/name so a
 * record stays readable after a material is renamed or archived.
 */
import { z } from 'zod';
import { floorsSchema, targetSchema, toleranceSchema } from '../aim/schema';
import { loadingParamsSchema } from '../blend/schemas';

export const materialRefSchema = z.object({
  materialId: z.number().int().positive(),
  code: z.string().min(1).max(40),
  name: z.string().min(1).max(200)
});

export const revisionPhosphorSchema = materialRefSchema.extend({
  /** Radiant-power fraction of this phosphor in the output (optical superposition model). */
  opticalFraction: z.number().min(0).max(1),
  /** wt % of this phosphor in the finished slurry (phosphors + silicone A + B + additives), from the loading model; null when not modelled. */
  wtPct: z.number().min(0).max(100).nullable()
});

/** A two-part silicone system as written on the ticket (mix ratio A:B by weight). */
export const siliconeSchema = z.object({
  siliconeSystemId: z.number().int().positive().nullable(),
  name: z.string().min(1).max(200),
  ratioA: z.number().positive().max(100),
  ratioB: z.number().positive().max(100),
  potLifeMin: z.number().int().positive().max(24 * 60),
  cure: z.string().max(300),
  densityGPerCm3: z.number().positive().max(5).nullable()
});

export const revisionContentSchema = z.object({
  pump: materialRefSchema,
  phosphors: z.array(revisionPhosphorSchema).min(1, 'at least one phosphor').max(5, 'at most 5 phosphors'),
  /** Radiant-power fraction of pump light that leaks through (optical model); pump + phosphors sum to 1. */
  pumpLeakFraction: z.number().min(0).max(1),
  /** Loading-model basis; total phosphor loading is the sum of the phosphors' wt % (basis: wt % of total slurry). */
  loading: loadingParamsSchema.extend({ basis: z.literal('wtPctOfSlurry') }).nullable(),
  silicone: siliconeSchema,
  target: targetSchema,
  tolerance: toleranceSchema,
  floors: floorsSchema,
  notes: z.string().max(5000).default('')
});

export type MaterialRef = z.infer<typeof materialRefSchema>;
export type RevisionPhosphor = z.infer<typeof revisionPhosphorSchema>;
export type SiliconeSpec = z.infer<typeof siliconeSchema>;
export type RevisionContent = z.infer<typeof revisionContentSchema>;

/** Revision states (plain words of the trade). */
export const REVISION_STATES = ['draft', 'submitted', 'approved', 'returned', 'superseded', 'withdrawn'] as const;
export type RevisionState = (typeof REVISION_STATES)[number];
