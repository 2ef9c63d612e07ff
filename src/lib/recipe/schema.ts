/**
 * Version 1 of the content of a formulation revision, as stored in formulation_revisions.content_json
 * and bound by its e-signatures (SHA-256 of the canonical JSON). Its own definitions: the blend API's
 * request bodies may change without touching a signed record. Target, tolerance and floors are the
 * aim's schemas. Materials are referenced by id and copied by code/name, so a record stays readable
 * after a material is renamed or archived.
 *
 * Rows written before the content carried a version tag have no `contentVersion`; they are version 1
 * (the default below fills it in on read, never in the stored text).
 */
import { z } from 'zod';
import { floorsSchema, targetSchema, toleranceSchema } from '../aim/schema';

export const materialRefSchema = z.object({
  materialId: z.number().int().positive(),
  code: z.string().min(1).max(40),
  name: z.string().min(1).max(200)
});

/** One phosphor line of a recipe. */
export const revisionPhosphorSchema = materialRefSchema.extend({
  /** Radiant-power fraction of this phosphor in the output (optical superposition model). */
  opticalFraction: z.number().min(0).max(1),
  /**
   * wt % of this phosphor in the finished slurry (phosphors + silicone A + B + additives), from the
   * loading model; null when not modelled.
   */
  wtPct: z.number().min(0).max(100).nullable()
});

/** A two-part silicone system as written on the ticket (mix ratio A:B by weight). */
export const siliconeSchema = z.object({
  siliconeSystemId: z.number().int().positive().nullable(),
  name: z.string().min(1).max(200),
  ratioA: z.number().positive().max(100),
  ratioB: z.number().positive().max(100),
  potLifeMin: z
    .number()
    .int()
    .positive()
    .max(24 * 60),
  cure: z.string().max(300),
  densityGPerCm3: z.number().positive().max(5).nullable()
});

/** The loading model the wt % came from (Beer–Lambert photon budget); the basis is wt % of total slurry. */
export const recipeLoadingSchema = z.object({
  basis: z.literal('wtPctOfSlurry'),
  pathLengthMm: z.number().gt(0).max(100),
  cascade: z.boolean().optional(),
  cascadePathFactor: z.number().gt(0).max(10).optional(),
  siliconeDensityGPerCm3: z.number().gt(0).max(5).optional(),
  pumpIrradianceWPerMm2: z.number().gt(0).max(100).optional()
});

export const revisionContentV1Schema = z.object({
  contentVersion: z.literal(1).default(1),
  pump: materialRefSchema,
  phosphors: z.array(revisionPhosphorSchema).min(1, 'at least one phosphor').max(5, 'at most 5 phosphors'),
  /** Radiant-power fraction of pump light that leaks through (optical model); pump + phosphors sum to 1. */
  pumpLeakFraction: z.number().min(0).max(1),
  /** Total phosphor loading is the sum of the phosphors' wt % (basis: wt % of total slurry). */
  loading: recipeLoadingSchema.nullable(),
  silicone: siliconeSchema,
  target: targetSchema,
  tolerance: toleranceSchema,
  floors: floorsSchema,
  notes: z.string().max(5000).default('')
});

export type MaterialRef = z.infer<typeof materialRefSchema>;
export type RevisionPhosphor = z.infer<typeof revisionPhosphorSchema>;
export type SiliconeSpec = z.infer<typeof siliconeSchema>;
export type RecipeLoading = z.infer<typeof recipeLoadingSchema>;
export type RevisionContentV1 = z.output<typeof revisionContentV1Schema>;
