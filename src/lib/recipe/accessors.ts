/**
 * The recipe lines of a revision as every feature reads them: the pump leak and the phosphors in
 * mix order, their optical fractions and their loadings. Each accessor takes an optional pump-bin
 * key; version 1 content holds one recipe, which serves every bin. When a later version adds recipes
 * per bin, these functions pick the bin's recipe and the features that call them do not change.
 */
import type { RevisionContent } from './upgrade';
import type { MaterialRef, RevisionPhosphor } from './schema';

/** Names a pump wavelength bin (the supplier's bin code as the line writes it). */
export type PumpBinKey = string;

/** What an accessor needs of the content: the recipe lines (and, later, the recipes per bin). */
export type RecipeSource = Pick<RevisionContent, 'pump' | 'pumpLeakFraction' | 'phosphors'>;

export interface RecipeLines {
  pump: MaterialRef;
  pumpLeakFraction: number;
  phosphors: readonly RevisionPhosphor[];
}

/** The recipe for a pump bin; version 1 content has one recipe for every bin. */
export function recipeLines(content: RecipeSource, binKey?: PumpBinKey): RecipeLines {
  void binKey; // version 1: one recipe serves every bin
  return { pump: content.pump, pumpLeakFraction: content.pumpLeakFraction, phosphors: content.phosphors };
}

/** The phosphor lines in mix order. */
export function phosphorLines(content: RecipeSource, binKey?: PumpBinKey): readonly RevisionPhosphor[] {
  return recipeLines(content, binKey).phosphors;
}

/** Optical fractions in mix order: pump leak first, then the phosphors as listed. */
export function fractionsWithLeak(content: RecipeSource, binKey?: PumpBinKey): number[] {
  const lines = recipeLines(content, binKey);
  return [lines.pumpLeakFraction, ...lines.phosphors.map((p) => p.opticalFraction)];
}

/** Per-phosphor loadings (wt % of total slurry), or null unless every phosphor has a positive one. */
export function loadingOf(content: RecipeSource, binKey?: PumpBinKey): number[] | null {
  const wt = phosphorLines(content, binKey).map((p) => p.wtPct);
  return wt.every((w): w is number => w !== null && w > 0) ? wt : null;
}

/** Library ids of the pump and the phosphors, in mix order (for loading their spectra). */
export function materialIdsOf(content: RecipeSource, binKey?: PumpBinKey): { pump: number; phosphors: number[] } {
  const lines = recipeLines(content, binKey);
  return { pump: lines.pump.materialId, phosphors: lines.phosphors.map((p) => p.materialId) };
}
