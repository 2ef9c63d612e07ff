import { describe, expect, it } from 'vitest';
import { hueBinColours, lightSwatchHex, surfaceHex, testSampleColours } from '../../../src/lib/charts/display-colours';

describe('display colours (IEC 61966-2-1 sRGB through colorjs.io)', () => {
  it('shows the D65 white point as sRGB white', () => {
    // CIE 15:2004 Table T.3: D65 XYZ (Y = 1) = (0.95047, 1, 1.08883); sRGB's white is D65.
    expect(lightSwatchHex([0.95047, 1, 1.08883])).toBe('#ffffff');
    expect(surfaceHex([0.95047, 1, 1.08883])).toBe('#ffffff');
  });

  it('shows a warm light as orange-ish (red channel highest, blue lowest)', () => {
    // Illuminant A (CIE 15:2004 Table T.3): XYZ = (1.09850, 1, 0.35585).
    const hex = lightSwatchHex([1.0985, 1, 0.35585]);
    const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16));
    expect(r).toBe(255);
    expect(r > g && g > b).toBe(true);
  });

  it('has one colour per CIE 13.3 test sample: TCS09 is a strong red, TCS12 a strong blue', () => {
    const tcs = testSampleColours();
    expect(tcs).toHaveLength(14);
    const rgb = (hex: string) => [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16));
    const [r9, g9, b9] = rgb(tcs[8].hex);
    expect(r9).toBeGreaterThan(g9 + 80); // CIE 13.3: TCS09 "strong red" (common practice)
    expect(r9).toBeGreaterThan(b9 + 80);
    const [r12, , b12] = rgb(tcs[11].hex);
    expect(b12).toBeGreaterThan(r12 + 40); // TCS12 "strong blue"
    expect(hueBinColours()).toHaveLength(16);
  });
});
