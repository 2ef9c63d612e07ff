/**
 * Colour-matching functions on the working grid (360–830 nm, 1 nm) as Float64Array,
 * built once at module load from the generated tables.
 * CIE 1931 2° and CIE 1964 10° standard observers, ISO/CIE 11664-1 (CIE S 014-1)
 * [CIE-S014-1]; CIE 15:2004 [CIE15-2004]. Dimensionless; ȳ(λ) of the 2° observer = V(λ).
 */
import { CIE1931_2DEG_CMF } from '../data/cie1931-2deg-cmf';
import { CIE1964_10DEG_CMF } from '../data/cie1964-10deg-cmf';
import { tableToGrid } from '../grid';

export type Observer = '2deg' | '10deg';

export interface CmfGrid {
  xBar: Float64Array;
  yBar: Float64Array;
  zBar: Float64Array;
}

function toGrid(t: typeof CIE1931_2DEG_CMF): CmfGrid {
  return {
    xBar: tableToGrid(t.xBar, t.startNm, t.stepNm),
    yBar: tableToGrid(t.yBar, t.startNm, t.stepNm),
    zBar: tableToGrid(t.zBar, t.startNm, t.stepNm)
  };
}

export const CMF_1931_2DEG: CmfGrid = toGrid(CIE1931_2DEG_CMF);
export const CMF_1964_10DEG: CmfGrid = toGrid(CIE1964_10DEG_CMF);

export function cmfFor(observer: Observer): CmfGrid {
  return observer === '10deg' ? CMF_1964_10DEG : CMF_1931_2DEG;
}
