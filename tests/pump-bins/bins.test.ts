/**
 * Pump wavelength bins: schema, lookup and shift. Bin widths of 2.5 nm and codes like "B4" are
 * common practice for blue chip sorting; the numbers are invented.
 */
import { describe, expect, it } from 'vitest';
import { binByCode, binCentreNm, binForWavelength, outsideBinsReason, pumpBinSetSchema, shiftPump } from '../../src/lib/pump-bins';

const set = pumpBinSetSchema.parse({
  basis: 'peak',
  bins: [
    { code: 'B3', fromNm: 445, toNm: 447.5, sharePct: 20 },
    { code: 'B4', fromNm: 447.5, toNm: 450, sharePct: 50 },
    { code: 'B5', fromNm: 450, toNm: 452.5, sharePct: 30 }
  ]
});

describe('pump bin set', () => {
  it('puts a wavelength on a shared edge in the upper bin, and the top edge in the last bin', () => {
    expect(binForWavelength(set, 445)?.code).toBe('B3');
    expect(binForWavelength(set, 447.5)?.code).toBe('B4');
    expect(binForWavelength(set, 449.99)?.code).toBe('B4');
    expect(binForWavelength(set, 452.5)?.code).toBe('B5');
    expect(binForWavelength(set, 452.51)).toBeNull();
    expect(binForWavelength(set, Number.NaN)).toBeNull();
  });

  it('says why a wavelength outside every bin is refused', () => {
    expect(outsideBinsReason(set, 449)).toBeNull();
    expect(outsideBinsReason(set, 455)).toBe('455 nm (peak wavelength) lies outside every bin of this pump (445–452.5 nm)');
    const gappy = pumpBinSetSchema.parse({
      basis: 'dominant',
      bins: [
        { code: 'D1', fromNm: 450, toNm: 452 },
        { code: 'D2', fromNm: 453, toNm: 455 }
      ]
    });
    expect(outsideBinsReason(gappy, 452.5)).toBe(
      '452.5 nm (dominant wavelength) lies outside every bin of this pump (450–455 nm, with gaps between bins)'
    );
  });

  it('finds bins by code without case and gives their centres', () => {
    expect(binByCode(set, ' b4 ')?.fromNm).toBe(447.5);
    expect(binByCode(set, 'B9')).toBeNull();
    expect(binCentreNm(set.bins[1])).toBe(448.75);
  });

  it('refuses overlaps, repeated codes, reversed or over-wide bins and shares that do not add to 100 %', () => {
    const bad = (bins: unknown[]) => pumpBinSetSchema.safeParse({ basis: 'peak', bins });
    const messages = (bins: unknown[]) => {
      const r = bad(bins);
      return r.success ? [] : r.error.issues.map((i) => i.message);
    };
    expect(
      messages([
        { code: 'A', fromNm: 445, toNm: 448 },
        { code: 'B', fromNm: 447.5, toNm: 450 }
      ])[0]
    ).toMatch(/starts at 447.5 nm, inside bin A/);
    expect(
      messages([
        { code: 'A', fromNm: 445, toNm: 447 },
        { code: 'a', fromNm: 447, toNm: 449 }
      ])
    ).toEqual(['bin code a is used twice']);
    expect(messages([{ code: 'A', fromNm: 450, toNm: 445 }])).toEqual(['the upper edge must be above the lower edge']);
    expect(messages([{ code: 'A', fromNm: 440, toNm: 470 }])).toEqual(['a bin is at most 20 nm wide']);
    expect(
      messages([
        { code: 'A', fromNm: 440, toNm: 442, sharePct: 60 },
        { code: 'B', fromNm: 442, toNm: 444, sharePct: 30 }
      ])
    ).toEqual(['the shares add up to 90.0 %, not 100 %']);
    expect(
      messages([
        { code: 'A', fromNm: 440, toNm: 442, sharePct: 60 },
        { code: 'B', fromNm: 442, toNm: 444 }
      ])
    ).toEqual(['give a share for every bin or for none']);
    expect(messages([{ code: 'A B', fromNm: 440, toNm: 442 }])[0]).toMatch(/letters, digits/);
  });
});

describe('a pump moved to another wavelength', () => {
  it('moves the parametric peak and keeps the width', () => {
    const pump = { id: 'p', name: 'p', parametric: { peakNm: 450, fwhmNm: 20, asymmetry: 0.2 } };
    expect(shiftPump(pump, 2.5).parametric).toEqual({ peakNm: 452.5, fwhmNm: 20, asymmetry: 0.2 });
    expect(shiftPump(pump, 0)).toBe(pump);
  });

  it('translates a measured spectrum along the wavelength axis, leaving the input alone', () => {
    const pump = { id: 'p', name: 'p', spectrum: { wavelengths: [440, 450, 460], values: [0.2, 1, 0.3] } };
    expect(shiftPump(pump, -1.25).spectrum).toEqual({ wavelengths: [438.75, 448.75, 458.75], values: [0.2, 1, 0.3] });
    expect(pump.spectrum.wavelengths).toEqual([440, 450, 460]);
    expect(() => shiftPump(pump, Number.POSITIVE_INFINITY)).toThrow(/finite/);
  });
});
