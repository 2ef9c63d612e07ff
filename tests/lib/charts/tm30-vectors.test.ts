import { describe, expect, it } from 'vitest';
import { binCentreHueDeg, colourVectors } from '../../../src/lib/charts/tm30-vectors';

describe('TM-30 colour-vector graphic geometry (ANSI/IES TM-30-20 §4.3)', () => {
  it('normalises the reference onto the unit circle and scales the shift by the reference chroma', () => {
    // Hand-worked: ref (10, 0), test (12, 1) → ref unit (1, 0); test = (1 + 2/10, 0 + 1/10) = (1.2, 0.1).
    const [v] = colourVectors([{ rf: 90, rcs: 0.2, rhs: 0.1, refAB: [10, 0], testAB: [12, 1] }]);
    expect(v.reference).toEqual([1, 0]);
    expect(v.test[0]).toBeCloseTo(1.2, 12);
    expect(v.test[1]).toBeCloseTo(0.1, 12);
    expect(v.bin).toBe(1);
    expect(v.chromaShift).toBe(0.2);
  });

  it('centres bin j on (j − ½)·22.5°', () => {
    expect(binCentreHueDeg(1)).toBe(11.25);
    expect(binCentreHueDeg(16)).toBe(348.75);
  });
});
