/**
 * The recipe lines of a revision as every feature reads them: the pump leak and the phosphors in
 * mix order, their optical fractions and their loadings. Each accessor takes an optional pump-bin
 * key. Content without a recipe matrix holds one recipe, which serves every bin; with a matrix
 * (version 3 `binRecipes`), a key picks its bin's recipe, and a key the matrix does not hold is refused
 * (a chip bin nobody solved for is never weighed with another bin's recipe). No key: the nominal recipe.
 */
import type { RevisionContent } from './upgrade';
import type { MaterialRef, RevisionPhosphor } from './schema';
import type { BinRecipe } from './schemaV3';

/** Names a pump wavelength bin (the supplier's bin code as the line writes it). */
export type PumpBinKey = string;

/** What an accessor needs of the content: the nominal recipe lines and the recipes per bin. */
export type RecipeSource = Pick<RevisionContent, 'pump' | 'pumpLeakFraction' | 'phosphors' | 'binRecipes'>;

/** A pump-bin key the content's recipe matrix has no recipe for. */
export class UnknownPumpBinError extends Error {
  constructor(
    readonly binKey: PumpBinKey,
    readonly known: readonly string[]
  ) {
    super(`this revision has no recipe for pump bin ${binKey} (its recipes are for ${known.join(', ')})`);
    this.name = 'UnknownPumpBinError';
  }
}

/** True when the content holds a recipe per pump bin. */
export function hasRecipeMatrix(content: Pick<RecipeSource, 'binRecipes'>): boolean {
  return (content.binRecipes?.length ?? 0) > 0;
}

/** Bin codes of the recipe matrix, in order (empty without a matrix). */
export function binCodesOf(content: Pick<RecipeSource, 'binRecipes'>): string[] {
  return (content.binRecipes ?? []).map((r) => r.bin.code);
}

/** The matrix entry for a bin (codes compare without case), or null. */
export function binRecipeOf(content: Pick<RecipeSource, 'binRecipes'>, binKey: PumpBinKey): BinRecipe | null {
  const key = binKey.trim().toUpperCase();
  return (content.binRecipes ?? []).find((r) => r.bin.code.toUpperCase() === key) ?? null;
}

export interface RecipeLines {
  pump: MaterialRef;
  pumpLeakFraction: number;
  phosphors: readonly RevisionPhosphor[];
}

/** The recipe for a pump bin: the bin's own with a matrix, else the one recipe (also with no key). */
export function recipeLines(content: RecipeSource, binKey?: PumpBinKey): RecipeLines {
  if (binKey !== undefined && hasRecipeMatrix(content)) {
    const entry = binRecipeOf(content, binKey);
    if (!entry) throw new UnknownPumpBinError(binKey, binCodesOf(content));
    return { pump: content.pump, pumpLeakFraction: entry.pumpLeakFraction, phosphors: entry.phosphors };
  }
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
