/**
 * Reference lines of the colour map, in the plane of either mode (pure; cached per mode):
 *  - spectral locus: chromaticity of monochromatic light, x̄,ȳ,z̄ of the CIE 1931 2° observer
 *    [CIE-S014-1] at 1 nm (x = x̄/(x̄+ȳ+z̄), CIE 15:2004 §7.3), 380–700 nm, closed by the
 *    line of purples;
 *  - Planckian locus: exact Planck radiator chromaticity (core's `planckianUv`, CIE 15:2004);
 *  - isotherms: lines of constant CCT, normal to the locus in CIE 1960 u,v (Ohno, LEUKOS 10 (2014)
 *    §4, core's `cctDuvToXy`), drawn from Duv −0.02 to +0.02 (the range where CCT is defined
 *    for white light, ANSI C78.377 / CIE 15 practice [common practice]);
 *  - Duv lines: constant Duv (±0.01, ±0.02) along 1500–20 000 K.
 */
import { CMF_1931_2DEG } from '../spectral/colorimetry/cmf';
import { uvToXy, type Pair } from '../spectral/colorimetry/chromaticity';
import { planckianUv } from '../spectral/cct/planckian-locus';
import { cctDuvToXy } from '../spectral/cct/inverse';
import { GRID_START_NM } from '../spectral/grid';
import { toPlane, type ChromaticityMode } from './chromaticity-plane';

export const LOCUS_RANGE_NM: [number, number] = [380, 700];
export const LOCUS_LABELS_NM = [460, 470, 480, 490, 500, 510, 520, 540, 560, 580, 600, 620, 700];
export const ISOTHERM_CCTS_K = [1800, 2200, 2700, 3000, 3500, 4000, 5000, 6500, 10000];
export const ISOTHERM_DUV_HALF = 0.02;
export const DUV_LINES = [-0.02, -0.01, 0.01, 0.02];
const LOCUS_CCT_RANGE_K: [number, number] = [1000, 20000];
const DUV_LINE_CCT_RANGE_K: [number, number] = [1500, 20000];

/** CIE 1931 x,y of monochromatic light at an integer wavelength (nm) on the core's grid. */
export function spectralXy(wavelengthNm: number): Pair {
  const i = wavelengthNm - GRID_START_NM;
  const X = CMF_1931_2DEG.xBar[i];
  const Y = CMF_1931_2DEG.yBar[i];
  const Z = CMF_1931_2DEG.zBar[i];
  const s = X + Y + Z;
  return [X / s, Y / s];
}

/** Temperatures equally spaced in mired (1e6/T) between lo and hi. */
export function miredSteps(loK: number, hiK: number, count: number): number[] {
  const a = 1e6 / loK;
  const b = 1e6 / hiK;
  return Array.from({ length: count }, (_, i) => 1e6 / (a + ((b - a) * i) / (count - 1)));
}

export interface LocusLabel {
  wavelengthNm: number;
  at: Pair;
}

export interface IsothermLine {
  cctK: number;
  from: Pair;
  to: Pair;
}

export interface ReferenceLines {
  spectralLocus: Pair[];
  locusLabels: LocusLabel[];
  planckian: Pair[];
  isotherms: IsothermLine[];
  duvLines: { duv: number; points: Pair[] }[];
}

const cache = new Map<ChromaticityMode, ReferenceLines>();

export function referenceLines(mode: ChromaticityMode): ReferenceLines {
  const hit = cache.get(mode);
  if (hit) return hit;
  const plane = (xy: Pair) => toPlane(mode, xy[0], xy[1]);
  const spectralLocus: Pair[] = [];
  for (let nm = LOCUS_RANGE_NM[0]; nm <= LOCUS_RANGE_NM[1]; nm++) spectralLocus.push(plane(spectralXy(nm)));
  const lines: ReferenceLines = {
    spectralLocus,
    locusLabels: LOCUS_LABELS_NM.map((nm) => ({ wavelengthNm: nm, at: plane(spectralXy(nm)) })),
    planckian: miredSteps(LOCUS_CCT_RANGE_K[0], LOCUS_CCT_RANGE_K[1], 160).map((t) => plane(uvToXy(...planckianUv(t)))),
    isotherms: ISOTHERM_CCTS_K.map((t) => ({
      cctK: t,
      from: plane(cctDuvToXy(t, -ISOTHERM_DUV_HALF)),
      to: plane(cctDuvToXy(t, ISOTHERM_DUV_HALF))
    })),
    duvLines: DUV_LINES.map((duv) => ({
      duv,
      points: miredSteps(DUV_LINE_CCT_RANGE_K[0], DUV_LINE_CCT_RANGE_K[1], 90).map((t) => plane(cctDuvToXy(t, duv)))
    }))
  };
  cache.set(mode, lines);
  return lines;
}
