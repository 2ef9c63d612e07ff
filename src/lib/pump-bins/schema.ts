/**
 * Pump wavelength bins: the ranges a chip supplier sorts blue (or violet) chips into, typically
 * 2.5 nm wide (common practice), stated on the peak or the dominant wavelength (CIE 15:2004 §9.1),
 * with an optional share of supply per bin.
 */
import { z } from 'zod';

export const wavelengthBasisSchema = z.enum(['peak', 'dominant']);
export type WavelengthBasis = z.infer<typeof wavelengthBasisSchema>;

/** A bin code as printed on chip reels and tickets: letters, digits, '.', '_' and '-'. */
export const pumpBinCodeSchema = z
  .string()
  .trim()
  .min(1, 'a bin needs a code')
  .max(20, 'a bin code has at most 20 characters')
  .regex(/^[A-Za-z0-9._-]+$/, 'a bin code may hold letters, digits, ".", "_" and "-" only');

/** Widest bin accepted, nm: wider than any supplier's sort, so a typo (45 for 450) is caught. */
export const MAX_BIN_WIDTH_NM = 20;

export const pumpBinSchema = z
  .object({
    code: pumpBinCodeSchema,
    /** Lower edge, nm (included). */
    fromNm: z.number().min(360).max(830),
    /** Upper edge, nm (excluded, except for the last bin of a set). */
    toNm: z.number().min(360).max(830),
    /** Share of supply in this bin, %; null when not known. */
    sharePct: z.number().min(0).max(100).nullable().default(null)
  })
  .superRefine((bin, ctx) => {
    if (!(bin.toNm > bin.fromNm)) ctx.addIssue({ code: 'custom', path: ['toNm'], message: 'the upper edge must be above the lower edge' });
    else if (bin.toNm - bin.fromNm > MAX_BIN_WIDTH_NM)
      ctx.addIssue({ code: 'custom', path: ['toNm'], message: `a bin is at most ${MAX_BIN_WIDTH_NM} nm wide` });
  });

export type PumpBin = z.output<typeof pumpBinSchema>;

/** Tolerance on the sum of the shares, percentage points (rounding on a supplier's sheet). */
export const SHARE_SUM_TOLERANCE = 0.5;

export const pumpBinSetSchema = z
  .object({
    basis: wavelengthBasisSchema,
    bins: z.array(pumpBinSchema).min(1, 'give at least one bin').max(20, 'at most 20 bins')
  })
  .superRefine((set, ctx) => {
    const seen = new Set<string>();
    set.bins.forEach((bin, i) => {
      const key = bin.code.toUpperCase();
      if (seen.has(key)) ctx.addIssue({ code: 'custom', path: ['bins', i, 'code'], message: `bin code ${bin.code} is used twice` });
      seen.add(key);
      const prev = set.bins[i - 1];
      if (prev && bin.fromNm < prev.toNm)
        ctx.addIssue({
          code: 'custom',
          path: ['bins', i, 'fromNm'],
          message:
            `bin ${bin.code} starts at ${bin.fromNm} nm, inside bin ${prev.code} (${prev.fromNm}–${prev.toNm} nm); ` +
            'list bins in order without overlap'
        });
    });
    const shares = set.bins.map((b) => b.sharePct);
    const given = shares.filter((s): s is number => s !== null);
    if (given.length > 0 && given.length < shares.length)
      ctx.addIssue({ code: 'custom', path: ['bins'], message: 'give a share for every bin or for none' });
    else if (given.length > 0) {
      const sum = given.reduce((a, b) => a + b, 0);
      if (Math.abs(sum - 100) > SHARE_SUM_TOLERANCE)
        ctx.addIssue({ code: 'custom', path: ['bins'], message: `the shares add up to ${sum.toFixed(1)} %, not 100 %` });
    }
  });

export type PumpBinSet = z.output<typeof pumpBinSetSchema>;
