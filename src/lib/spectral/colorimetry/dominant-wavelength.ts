/**
 * Dominant wavelength (CIE 15:2004 §9.1): the wavelength of the spectral stimulus that, mixed
 * additively with the specified achromatic stimulus, matches the sample; found where the line from
 * the achromatic point through the sample meets the spectrum locus (CIE 1931 2° observer). The
 * achromatic point is the equal-energy stimulus E (x = y = 1/3), as LED chip binning commonly uses
 * (common practice). Returns null for purples (the line meets the purple boundary, not the locus).
 */
import { CMF_1931_2DEG } from './cmf';
import { GRID_LENGTH, GRID_START_NM } from '../grid';

const WHITE_E: [number, number] = [1 / 3, 1 / 3];

/** Spectrum locus x,y on the working grid, 380–700 nm (beyond, the locus folds back on itself). */
const LOCUS = (() => {
  const out: { nm: number; x: number; y: number }[] = [];
  for (let i = 0; i < GRID_LENGTH; i++) {
    const nm = GRID_START_NM + i;
    if (nm < 380 || nm > 700) continue;
    const X = CMF_1931_2DEG.xBar[i];
    const Y = CMF_1931_2DEG.yBar[i];
    const Z = CMF_1931_2DEG.zBar[i];
    const s = X + Y + Z;
    if (s > 0) out.push({ nm, x: X / s, y: Y / s });
  }
  return out;
})();

/** Dominant wavelength in nm of chromaticity (x, y), interpolated between locus points; null for purples. */
export function dominantWavelength(x: number, y: number, white: [number, number] = WHITE_E): number | null {
  const dx = x - white[0];
  const dy = y - white[1];
  if (Math.hypot(dx, dy) < 1e-9) return null;
  // Signed side of each locus point against the line white → sample; a sign change brackets the crossing.
  const side = (p: { x: number; y: number }) => dx * (p.y - white[1]) - dy * (p.x - white[0]);
  const ahead = (p: { x: number; y: number }) => dx * (p.x - white[0]) + dy * (p.y - white[1]) > 0;
  for (let i = 0; i + 1 < LOCUS.length; i++) {
    const a = LOCUS[i];
    const b = LOCUS[i + 1];
    const sa = side(a);
    const sb = side(b);
    if (sa === 0 && ahead(a)) return a.nm;
    if (sa * sb < 0 && (ahead(a) || ahead(b))) return a.nm + (b.nm - a.nm) * (sa / (sa - sb));
  }
  return null;
}
