/**
 * Where the blend on the desk lands on each chip bin of its pump: the same recipe with the pump moved
 * to the bin's centre (`binPump`: peak shift, or dominant wavelength by secant steps, CIE 15:2004 §9.1),
 * on the loading model when wt % are known (a longer blue is absorbed differently: Beer–Lambert), else
 * at the desk's optical shares. What the recipe matrix corrects, bin by bin.
 */
import { colourDistance, type ColourCentre } from '../aim/distance';
import { binPump } from '../blend/matrix/binPump';
import { mix } from '../blend/mix';
import type { BlendComponents } from '../blend/types';
import type { PumpBinSet } from '../pump-bins/schema';

export interface BinPoint {
  code: string;
  fromNm: number;
  toNm: number;
  x: number;
  y: number;
  cct: number;
  duv: number;
  /** Steps from the target (null without one). */
  steps: number | null;
}

export type DeskRecipe = { kind: 'loading'; wtPct: number[]; pathLengthMm: number } | { kind: 'optical'; fractions: number[] };

export function binPoints(components: BlendComponents, set: PumpBinSet, recipe: DeskRecipe, target: ColourCentre | null): BinPoint[] {
  return set.bins.map((bin) => {
    const pump = binPump(components.pump, (bin.fromNm + bin.toNm) / 2, set.basis).pump;
    const e = mix(
      { ...components, pump },
      recipe.kind === 'loading'
        ? { kind: 'loading', concentrationsWtPct: recipe.wtPct, loading: { pathLengthMm: recipe.pathLengthMm } }
        : { kind: 'optical', fractions: recipe.fractions }
    ).evaluation;
    return {
      code: bin.code,
      fromNm: bin.fromNm,
      toNm: bin.toNm,
      x: e.x,
      y: e.y,
      cct: e.cct,
      duv: e.duv,
      steps: target ? colourDistance(e.x, e.y, target).steps : null
    };
  });
}
