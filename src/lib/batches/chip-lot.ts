/**
 * The chip lot a batch is built with, and which pump bin's recipe it weighs. A revision with a recipe
 * matrix (recipe content version 3, `binRecipes`) needs the lot number and either the bin code printed
 * on the reel or the lot's measured wavelength (peak or dominant, as the bins state): the wavelength
 * picks the bin (half-open edges, common practice); a lot outside every bin, or a bin code the matrix
 * lacks, is refused with the reason. Without a matrix the lot is only recorded. Pure.
 */
import { z } from 'zod';
import { binForWavelength, outsideBinsReason } from '../pump-bins/lookup';
import { pumpBinCodeSchema, type PumpBinSet } from '../pump-bins/schema';
import { binCodesOf, binRecipeOf, hasRecipeMatrix, type RecipeSource } from '../recipe/accessors';
import type { BinRecipe } from '../recipe/schemaV3';

export const chipLotSchema = z.object({
  lotNumber: z.string().trim().min(1, 'enter the chip lot number').max(80, 'a chip lot number has at most 80 characters'),
  binCode: pumpBinCodeSchema.optional(),
  /** The lot's measured wavelength, nm, on the basis the bins state (peak or dominant). */
  wavelengthNm: z.number('the chip wavelength must be a number').finite().min(360).max(830).optional()
});
export type ChipLot = z.infer<typeof chipLotSchema>;

/** The chip lot as a batch records it, with the bin whose recipe is weighed (null without a matrix). */
export interface ChosenChipBin {
  lotNumber: string | null;
  wavelengthNm: number | null;
  binCode: string | null;
  binRecipe: BinRecipe | null;
}

export type ChipBinChoice = { ok: true; chosen: ChosenChipBin } | { ok: false; issue: { path: string; message: string } };

/** The matrix's bins as a bin set (ordered by lower edge), so the pump-bin lookup applies. */
export function matrixBinSet(content: Pick<RecipeSource, 'binRecipes'>): PumpBinSet {
  const bins = (content.binRecipes ?? []).map((r) => ({
    code: r.bin.code,
    fromNm: r.bin.fromNm,
    toNm: r.bin.toNm,
    sharePct: r.bin.sharePct
  }));
  bins.sort((a, b) => a.fromNm - b.fromNm);
  return { basis: content.binRecipes?.[0]?.bin.basis ?? 'peak', bins };
}

const refuse = (path: string, message: string): ChipBinChoice => ({ ok: false, issue: { path, message } });

export function chooseChipBin(content: Pick<RecipeSource, 'binRecipes'>, lot: ChipLot | null | undefined): ChipBinChoice {
  const recorded = { lotNumber: lot?.lotNumber ?? null, wavelengthNm: lot?.wavelengthNm ?? null };
  if (!hasRecipeMatrix(content)) return { ok: true, chosen: { ...recorded, binCode: lot?.binCode ?? null, binRecipe: null } };
  const codes = binCodesOf(content).join(', ');
  if (!lot) return refuse('chipLot.lotNumber', `this revision has a recipe per chip bin (${codes}): enter the chip lot number`);
  const set = matrixBinSet(content);
  let byWavelength: string | null = null;
  if (lot.wavelengthNm !== undefined) {
    const reason = outsideBinsReason(set, lot.wavelengthNm);
    if (reason) return refuse('chipLot.wavelengthNm', `Chip lot ${lot.lotNumber}: ${reason}; this revision has no recipe for it`);
    byWavelength = binForWavelength(set, lot.wavelengthNm)!.code;
  }
  if (lot.binCode !== undefined) {
    const entry = binRecipeOf(content, lot.binCode);
    if (!entry) return refuse('chipLot.binCode', `this revision has no recipe for chip bin ${lot.binCode} (its recipes are for ${codes})`);
    if (byWavelength !== null && byWavelength !== entry.bin.code)
      return refuse(
        'chipLot.binCode',
        `chip bin ${entry.bin.code} does not hold ${lot.wavelengthNm} nm (${set.basis} wavelength), which lies in bin ${byWavelength}`
      );
    return { ok: true, chosen: { ...recorded, binCode: entry.bin.code, binRecipe: entry } };
  }
  if (byWavelength === null)
    return refuse('chipLot.binCode', `enter the chip bin code or the lot's ${set.basis} wavelength (bins ${codes})`);
  return { ok: true, chosen: { ...recorded, binCode: byWavelength, binRecipe: binRecipeOf(content, byWavelength) } };
}

/** "B2 · 450–452.5 nm peak" for tickets and pages. */
export function describeBin(bin: Pick<BinRecipe['bin'], 'code' | 'fromNm' | 'toNm' | 'basis'>): string {
  return `${bin.code} · ${bin.fromNm}–${bin.toNm} nm ${bin.basis}`;
}

/**
 * With a recipe matrix the batch weighs its chip bin's recipe as solved: typed loadings that differ
 * from the bin's (`binLoadings`, printed to 4 decimals on the request's basis), or a total loading,
 * are refused (a different loading needs a new revision).
 */
export function binLoadingsReason(
  chosen: ChosenChipBin,
  binLoadings: number[] | null,
  loading: { mode: 'perPhosphor'; pcts?: number[] } | { mode: 'total' }
): { path: string; message: string } | null {
  const entry = chosen.binRecipe;
  if (!entry) return null;
  if (loading.mode === 'total')
    return {
      path: 'loading',
      message: `chip bin ${entry.bin.code} is weighed with its own recipe: use the per-phosphor loadings of the revision`
    };
  if (!loading.pcts || !binLoadings) return null;
  const same = loading.pcts.length === binLoadings.length && loading.pcts.every((v, i) => Number(v.toFixed(4)) === binLoadings[i]);
  return same
    ? null
    : {
        path: 'loading.pcts',
        message: `chip bin ${entry.bin.code} is weighed with its own recipe (${binLoadings.join(' + ')}): leave the loadings empty`
      };
}
