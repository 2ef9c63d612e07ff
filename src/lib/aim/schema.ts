/**
 * zod schemas of the aim: target (CCT + Duv, x,y or ANSI C78.377 bin), colour tolerance (Δu′v′, Δuv or
 * MacAdam-type steps) and metric floors (Ra, R9, Rf, Rg, LER; melanopic DER floor and ceiling). Shared by the
 * solve and correction API bodies, the revision content, the designer and quality.
 */
import { z } from 'zod';
import { INTENT_LEVELS } from '../spectral/tm30/design-intents';

export const targetSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('cctDuv'),
    cct: z.number().min(1000, 'CCT must be 1000–20000 K').max(20000, 'CCT must be 1000–20000 K'),
    duv: z.number().min(-0.05, 'Duv must be within ±0.05').max(0.05, 'Duv must be within ±0.05')
  }),
  z.object({ kind: z.literal('xy'), x: z.number().gt(0).lt(1), y: z.number().gt(0).lt(1) }),
  z.object({
    kind: z.literal('ansiBin'),
    nominalCct: z.number().int().min(2200, 'ANSI nominal CCT 2200–6500 K').max(6500, 'ANSI nominal CCT 2200–6500 K')
  })
]);

export const toleranceSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('deltaUvPrime'), value: z.number().gt(0).max(0.05) }),
  z.object({ kind: z.literal('deltaUv'), value: z.number().gt(0).max(0.05) }),
  z.object({ kind: z.literal('sdcm'), steps: z.number().gt(0).max(20) })
]);

export const floorsSchema = z
  .object({
    raMin: z.number().max(100).optional(),
    r9Min: z.number().max(100).optional(),
    rfMin: z.number().max(100).optional(),
    rgMin: z.number().min(50).max(150).optional(),
    rgMax: z.number().min(50).max(150).optional(),
    lerMin: z.number().min(0).max(683).optional(),
    melDerMin: z.number().min(0, 'melanopic DER must be 0–3').max(3, 'melanopic DER must be 0–3').optional(),
    melDerMax: z.number().gt(0, 'melanopic DER ceiling must be above 0').max(3, 'melanopic DER must be 0–3').optional(),
    intent: z.enum(INTENT_LEVELS, 'intent must be a TM-30 Annex E level, P1–P3, V1–V3 or F1–F3').optional()
  })
  .refine((f) => f.rgMin === undefined || f.rgMax === undefined || f.rgMin <= f.rgMax, 'rgMin must not exceed rgMax')
  .refine(
    (f) => f.melDerMin === undefined || f.melDerMax === undefined || f.melDerMin <= f.melDerMax,
    'melanopic DER floor must not exceed its ceiling'
  );
