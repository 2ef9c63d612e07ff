/**
 * Display colours for the readout (approximate; for swatches, not colorimetry), via colorjs.io:
 *  - a light's own colour: its XYZ (CIE 1931 2°) taken as D65-relative XYZ, converted to linear
 *    sRGB (IEC 61966-2-1), scaled so the brightest channel is 1, negatives clipped, then encoded;
 *    no chromatic adaptation, so a 3000 K blend shows as the warm colour it is beside daylight;
 *  - the 14 CIE 13.3 test colour samples under D65 (core's `tcsDisplayXyzD65`) in sRGB;
 *  - one hue per TM-30 bin: CIE LCh (L 62, C 45) at the bin-centre hue angle [design choice].
 */
import Color from 'colorjs.io';
import { tcsDisplayXyzD65 } from '../spectral/cri/tcs-display';
import { binCentreHueDeg } from './tm30-vectors';

const clip01 = (v: number) => (Number.isFinite(v) ? Math.min(1, Math.max(0, v)) : 0);

function hexOfLinear(rgb: [number, number, number]): string {
  return new Color('srgb-linear', rgb).to('srgb').toString({ format: 'hex', collapse: false });
}

/** Hex colour of a light with tristimulus values XYZ (any scale). */
export function lightSwatchHex(xyz: readonly [number, number, number]): string {
  const lin = new Color('xyz-d65', [xyz[0], xyz[1], xyz[2]]).to('srgb-linear').coords as [number, number, number];
  const max = Math.max(lin[0], lin[1], lin[2]);
  if (!(max > 0)) return '#000000';
  return hexOfLinear([clip01(lin[0] / max), clip01(lin[1] / max), clip01(lin[2] / max)]);
}

/** Hex colour of a surface colour given as D65-relative XYZ (white Y = 1), clipped to the sRGB cube. */
export function surfaceHex(xyzD65: readonly [number, number, number]): string {
  const lin = new Color('xyz-d65', [xyzD65[0], xyzD65[1], xyzD65[2]]).to('srgb-linear').coords as [number, number, number];
  return hexOfLinear([clip01(lin[0]), clip01(lin[1]), clip01(lin[2])]);
}

let tcs: { name: string; hex: string }[] | null = null;

/** TCS01–TCS14 display colours, in order. */
export function testSampleColours(): { name: string; hex: string }[] {
  tcs ??= tcsDisplayXyzD65().map((s) => ({ name: s.name, hex: surfaceHex(s.xyzD65) }));
  return tcs;
}

let bins: string[] | null = null;

export function hueBinColours(): string[] {
  bins ??= Array.from({ length: 16 }, (_, i) =>
    new Color('lch', [62, 45, binCentreHueDeg(i + 1)]).to('srgb').toGamut().toString({ format: 'hex', collapse: false })
  );
  return bins;
}
