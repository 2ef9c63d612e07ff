/**
 * Version 2 of the content of a formulation revision: version 1 plus the package model the recipe
 * was designed for (`packageModelRef: { id, version }`, or null when the designer used the library's
 * loading values). A package model version is immutable, so the reference names the exact fit.
 */
import { z } from 'zod';
import { revisionContentV1Schema } from './schema';

export const packageModelRefSchema = z.object({
  id: z.number().int().positive(),
  version: z.number().int().positive()
});

export const revisionContentV2Schema = revisionContentV1Schema.extend({
  contentVersion: z.literal(2),
  packageModelRef: packageModelRefSchema.nullable().default(null)
});

export type RevisionContentV2 = z.output<typeof revisionContentV2Schema>;
