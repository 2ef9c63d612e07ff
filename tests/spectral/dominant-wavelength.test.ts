/**
 * Dominant wavelength (CIE 15:2004 §9.1) against the spectrum locus itself: a monochromatic
 * stimulus's dominant wavelength is its own wavelength, and any mix of it with the achromatic
 * stimulus E keeps that wavelength (the definition). Locus chromaticities from the CIE 1931 2°
 * colour-matching functions (CIE 15:2004 Table T.4 as tabulated in the product's data).
 */
import { describe, expect, it } from 'vitest';
import { dominantWavelength } from '../../src/lib/spectral/colorimetry/dominant-wavelength';
import { CMF_1931_2DEG } from '../../src/lib/spectral/colorimetry/cmf';
import { gridIndex } from '../../src/lib/spectral/grid';

const locus = (nm: number) => {
  const i = gridIndex(nm);
  const s = CMF_1931_2DEG.xBar[i] + CMF_1931_2DEG.yBar[i] + CMF_1931_2DEG.zBar[i];
  return { x: CMF_1931_2DEG.xBar[i] / s, y: CMF_1931_2DEG.yBar[i] / s };
};

describe('dominant wavelength', () => {
  it('of a spectral colour is its wavelength, and mixing with E does not move it', () => {
    for (const nm of [450, 470, 520, 580, 620]) {
      const p = locus(nm);
      expect(dominantWavelength(p.x, p.y)).toBeCloseTo(nm, 6);
      const mixed = { x: 0.4 * p.x + 0.6 / 3, y: 0.4 * p.y + 0.6 / 3 };
      expect(dominantWavelength(mixed.x, mixed.y)).toBeCloseTo(nm, 6);
    }
  });

  it('is null for the achromatic point and for purples', () => {
    expect(dominantWavelength(1 / 3, 1 / 3)).toBeNull();
    // A purple between 400 nm and 700 nm lies on the purple boundary side: no spectral match.
    const blue = locus(420);
    const red = locus(680);
    expect(dominantWavelength((blue.x + red.x) / 2, (blue.y + red.y) / 2)).toBeNull();
  });
});
