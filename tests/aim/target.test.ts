import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ansiQuadrangle, resolveTarget } from '../../src/lib/aim/index';
import { isInQuadrangle } from '../../src/lib/spectral/ansi/c78377';
import { uvToCct, xyToUv } from '../../src/lib/spectral/index';

describe('an x,y target takes its CCT and Duv from the core', () => {
  // CIE 15:2004 Table T.3: illuminant A at x 0.44757, y 0.40745, a Planckian radiator at 2856 K.
  // Allowance ±15 K and |Duv| ≤ 0.0005 as for the core's own CIE 15 checks (c2 of the period, rounding).
  it('CIE illuminant A', () => {
    const t = resolveTarget({ kind: 'xy', x: 0.44757, y: 0.40745 });
    expect([t.x, t.y]).toEqual([0.44757, 0.40745]);
    expect(Math.abs(t.cct - 2856)).toBeLessThanOrEqual(15);
    expect(Math.abs(t.duv)).toBeLessThanOrEqual(0.0005);
    expect(t.ansiBin).toBeNull();
  });
});

describe('a CCT + Duv target round-trips through the core (Ohno, LEUKOS 10 (2014) 47–55)', () => {
  // Round trip: the x,y of (CCT, Duv) read back gives the same CCT and Duv [Ohno 2014 §4: 1 K, 1e-5 Duv order].
  it('CCT 2200–6500 K, Duv ±0.006', () => {
    fc.assert(
      fc.property(fc.integer({ min: 2200, max: 6500 }), fc.double({ min: -0.006, max: 0.006, noNaN: true }), (cct, duv) => {
        const t = resolveTarget({ kind: 'cctDuv', cct, duv });
        const back = uvToCct(...xyToUv(t.x, t.y));
        expect(Math.abs(back.cct - cct)).toBeLessThan(2);
        expect(Math.abs(back.duv - duv)).toBeLessThan(1e-4);
        expect(t.cct).toBe(cct);
        expect(t.duv).toBe(duv);
      }),
      { numRuns: 60 }
    );
  });
});

describe('an ANSI bin target is the quadrangle centre (ANSI C78.377-2017)', () => {
  // ANSI C78.377-2017 Table 1, 3000 K: target CCT 3045 K, target Duv 0.0001; 2015 centre (0.4339, 0.4033).
  it('3000 K nominal bin', () => {
    const t = resolveTarget({ kind: 'ansiBin', nominalCct: 3000 });
    expect(t.cct).toBe(3045);
    expect(t.duv).toBe(0.0001);
    expect(Math.abs(t.x - 0.4339)).toBeLessThanOrEqual(0.0002);
    expect(Math.abs(t.y - 0.4033)).toBeLessThanOrEqual(0.0002);
    expect(t.label).toBe('ANSI C78.377 3000 K bin centre');
    expect(t.ansiBin?.nominalCct).toBe(3000);
  });
  // ANSI C78.377-2017 §4: flexible CCT in 100 K steps between the nominal bins; the centre lies in its quadrangle.
  it('3200 K flexible bin', () => {
    const q = ansiQuadrangle(3200);
    const t = resolveTarget({ kind: 'ansiBin', nominalCct: 3200 });
    expect(q.nominalCct).toBe(3200);
    expect(isInQuadrangle(t.x, t.y, q)).toBe(true);
  });
});
