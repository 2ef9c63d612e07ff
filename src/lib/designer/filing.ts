/**
 * Filing a designed blend as a formulation revision (pure part): the zod schemas of the form the
 * designer posts, and the revision content (src/lib/recipe) built from it.
 * The server adds the material codes and the silicone system from its own tables.
 */
import { z } from 'zod';
import { floorsSchema, targetSchema, toleranceSchema } from '../aim/index';
import { operatingConditionSchema } from '../aim/condition';
import { coldCheckSchema } from '../recipe/schemaV3';
import { CONTENT_VERSION, packageModelRefSchema, type MaterialRef, type RevisionContent, type SiliconeSpec } from '../recipe';
import { roundedShares } from './shares';
import { plainText } from '../errors/hidden-characters';

const materialId = z.number().int().positive();

/** The blend part of the form (sent as JSON in one hidden field). */
export const designedBlendSchema = z
  .object({
    pumpId: materialId,
    phosphorIds: z.array(materialId).min(1, 'pick at least one phosphor').max(5, 'at most 5 phosphors'),
    /** Optical fractions, pump leak first. */
    fractions: z.array(z.number().min(0).max(1)),
    /** wt % per phosphor from the loading model, or null when not modelled. */
    wtPct: z.array(z.number().min(0).max(100)).nullable(),
    pathLengthMm: z.number().gt(0).max(100).nullable(),
    /** The package model the loading settings came from, or null (library values). */
    packageModelRef: packageModelRefSchema.nullable().default(null),
    target: targetSchema,
    tolerance: toleranceSchema,
    floors: floorsSchema,
    /** The condition the target holds at (null: bench) and, for a hot one, the bench point to check. */
    condition: operatingConditionSchema.nullable().default(null),
    coldCheck: coldCheckSchema.nullable().default(null)
  })
  .refine((b) => b.coldCheck === null || b.condition !== null, 'a cold check belongs to a target at an operating condition')
  .refine((b) => b.fractions.length === b.phosphorIds.length + 1, 'one fraction per component (pump leak first)')
  .refine((b) => b.wtPct === null || b.wtPct.length === b.phosphorIds.length, 'one wt % per phosphor')
  .refine((b) => new Set(b.phosphorIds).size === b.phosphorIds.length, 'each phosphor may appear only once');

/** As the designer builds it (`packageModelRef` may be left out: no package model). */
export type DesignedBlend = z.input<typeof designedBlendSchema>;

const blendField = z
  .string('the blend is missing')
  .transform((text, ctx) => {
    try {
      return JSON.parse(text) as unknown;
    } catch {
      ctx.addIssue({ code: 'custom', message: 'the blend could not be read; reload the designer' });
      return z.NEVER;
    }
  })
  .pipe(designedBlendSchema);

const common = {
  notes: z.string().trim().max(5000, 'notes: at most 5000 characters').default(''),
  siliconeSystemId: z.coerce.number('pick a silicone system').int().positive('pick a silicone system'),
  blend: blendField
};

/** The whole filing form: a new formulation, or a new revision of an existing one. */
export const filingFormSchema = z.discriminatedUnion(
  'mode',
  [
    z.object({
      mode: z.literal('new'),
      name: z.string().trim().min(1, 'give the formulation a name').max(200, 'name: at most 200 characters').superRefine(plainText('name')),
      code: z
        .string()
        .trim()
        .max(40)
        .optional()
        .transform((v) => (v ? v : undefined)),
      ...common
    }),
    z.object({
      mode: z.literal('revision'),
      formulationId: z.coerce.number('pick the formulation').int().positive('pick the formulation'),
      basedOnRevisionId: z.coerce
        .number()
        .int()
        .positive()
        .optional()
        .or(z.literal('').transform(() => undefined)),
      ...common
    })
  ],
  'choose a new formulation or a new revision'
);

export type FilingForm = z.infer<typeof filingFormSchema>;

/** Revision content from a designed blend, with references and silicone looked up by the caller. */
export function revisionContentFrom(
  blend: DesignedBlend,
  refs: { pump: MaterialRef; phosphors: MaterialRef[] },
  silicone: SiliconeSpec,
  notes: string
): RevisionContent {
  const shares = roundedShares(blend.fractions, 4);
  return {
    contentVersion: CONTENT_VERSION,
    pump: refs.pump,
    phosphors: refs.phosphors.map((p, i) => ({
      ...p,
      opticalFraction: shares[i + 1],
      wtPct: blend.wtPct ? Number(blend.wtPct[i].toFixed(3)) : null
    })),
    pumpLeakFraction: shares[0],
    loading: blend.pathLengthMm !== null && blend.wtPct ? { pathLengthMm: blend.pathLengthMm, basis: 'wtPctOfSlurry' } : null,
    silicone,
    target: blend.target,
    tolerance: blend.tolerance,
    floors: blend.floors,
    packageModelRef: blend.packageModelRef ?? null,
    condition: blend.condition ? operatingConditionSchema.parse(blend.condition) : null,
    coldCheck: blend.coldCheck ? coldCheckSchema.parse(blend.coldCheck) : null,
    notes
  };
}
