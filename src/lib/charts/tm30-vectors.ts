/**
 * Geometry of the TM-30 colour-vector graphic and local chroma shifts (pure).
 * ANSI/IES TM-30-20 §4.3 (Colour Vector Graphic): each of the 16 hue-angle bins is drawn with its
 * reference mean a′,b′ normalised onto the unit circle; the test mean is placed at
 *   ref/|ref| + (test − ref)/|ref|,
 * so an arrow's length is the chroma/hue shift relative to the bin's reference chroma.
 * Bin j (1…16) is centred on hue angle (j − ½)·22.5° [TM-30-20 §4.2; from memory].
 */
import type { Pair } from '../spectral/colorimetry/chromaticity';
import type { Tm30Bin } from '../spectral/types';

export interface VectorBin {
  bin: number;
  centreHueDeg: number;
  reference: Pair;
  test: Pair;
  /** Local chroma shift, fraction (Rcs,hj). */
  chromaShift: number;
}

export function binCentreHueDeg(bin: number): number {
  return (bin - 0.5) * 22.5;
}

export function colourVectors(bins: readonly Tm30Bin[]): VectorBin[] {
  return bins.map((b, i) => {
    const [ra, rb] = b.refAB;
    const [ta, tb] = b.testAB;
    const r = Math.hypot(ra, rb);
    const ok = r > 0 && Number.isFinite(r);
    return {
      bin: i + 1,
      centreHueDeg: binCentreHueDeg(i + 1),
      reference: ok ? [ra / r, rb / r] : [NaN, NaN],
      test: ok ? [ra / r + (ta - ra) / r, rb / r + (tb - rb) / r] : [NaN, NaN],
      chromaShift: b.rcs
    };
  });
}
