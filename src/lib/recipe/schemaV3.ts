/**
 * Version 3 of the content of a formulation revision: version 2 plus
 * - `condition`: the operating condition the target holds at (junction or solder-point temperature,
 *   drive current); null = the bench condition, as in every older row;
 * - `coldCheck`: for a target at a hot condition, the colour point a bench build should measure
 *   (printed on the ticket and the batch record as the cold check target); null otherwise;
 * - `binRecipes`: the recipe matrix, one recipe per pump wavelength bin with the same phosphors as
 *   the nominal recipe, each with its predicted colour point; empty = one recipe for every bin.
 * The e-signature hash covers the whole stored text, so signing approves every recipe of the matrix.
 */
import { z } from 'zod';
import { operatingConditionSchema } from '../aim/condition';
import { pumpBinCodeSchema, wavelengthBasisSchema } from '../pump-bins/schema';
import { revisionPhosphorSchema } from './schema';
import { revisionContentV2Schema } from './schemaV2';

/** A predicted colour point and its metrics (null where not meaningful). */
export const predictedPointSchema = z.object({
  x: z.number().gt(0).lt(1),
  y: z.number().gt(0).lt(1),
  cct: z.number().nullable(),
  duv: z.number().nullable(),
  ra: z.number().nullable().default(null),
  r9: z.number().nullable().default(null),
  /** Colour distance from the revision's target, MacAdam-type steps (aim's `colourDistance`). */
  steps: z.number().min(0).nullable().default(null)
});

/** The bin as it stood when the matrix was solved (a copy, so the signed record reads alone). */
export const binSnapshotSchema = z.object({
  code: pumpBinCodeSchema,
  basis: wavelengthBasisSchema,
  fromNm: z.number().min(360).max(830),
  toNm: z.number().min(360).max(830),
  sharePct: z.number().min(0).max(100).nullable().default(null)
});

export const binRecipeSchema = z.object({
  bin: binSnapshotSchema,
  pumpLeakFraction: z.number().min(0).max(1),
  phosphors: z.array(revisionPhosphorSchema).min(1).max(5),
  /** The bin's centre spectrum through this recipe (at the revision's condition). */
  predicted: predictedPointSchema.nullable().default(null)
});

export const coldCheckSchema = predictedPointSchema.extend({
  /** Condition of the bench build the point is for (normally 25 °C). */
  condition: operatingConditionSchema
});

/** Version 3 without its cross-field checks (a later version extends this, then adds `checkBinRecipes`). */
export const revisionContentV3ObjectSchema = revisionContentV2Schema.extend({
  contentVersion: z.literal(3),
  condition: operatingConditionSchema.nullable().default(null),
  coldCheck: coldCheckSchema.nullable().default(null),
  binRecipes: z.array(binRecipeSchema).max(20, 'at most 20 pump bins').default([])
});

type MatrixContent = Pick<z.output<typeof revisionContentV3ObjectSchema>, 'phosphors' | 'binRecipes'>;

/** One recipe per bin, each with the nominal recipe's phosphors in the same order. */
export function checkBinRecipes(content: MatrixContent, ctx: z.RefinementCtx): void {
  const nominal = content.phosphors.map((p) => p.materialId).join(',');
  const codes = new Set<string>();
  content.binRecipes.forEach((r, i) => {
    const key = r.bin.code.toUpperCase();
    if (codes.has(key))
      ctx.addIssue({ code: 'custom', path: ['binRecipes', i, 'bin', 'code'], message: `bin ${r.bin.code} has two recipes` });
    codes.add(key);
    if (r.phosphors.map((p) => p.materialId).join(',') !== nominal)
      ctx.addIssue({
        code: 'custom',
        path: ['binRecipes', i, 'phosphors'],
        message: `bin ${r.bin.code}: a bin's recipe uses the nominal recipe's phosphors in the same order`
      });
  });
}

export const revisionContentV3Schema = revisionContentV3ObjectSchema.superRefine(checkBinRecipes);

export type PredictedPoint = z.output<typeof predictedPointSchema>;
export type BinSnapshot = z.output<typeof binSnapshotSchema>;
export type BinRecipe = z.output<typeof binRecipeSchema>;
export type ColdCheck = z.output<typeof coldCheckSchema>;
export type RevisionContentV3 = z.output<typeof revisionContentV3Schema>;
