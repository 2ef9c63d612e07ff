import { describe, expect, it } from 'vitest';
import { stepEllipseAt } from '../../../src/lib/aim/index';
import {
  batchAcceptance,
  describeAcceptance,
  describeTolerance,
  judgePart,
  qualityTarget,
  type Acceptance
} from '../../../src/lib/measurements/index';
import { metricsAt } from './support';

// Floors as formulators set them: "90 CRI" = Ra ≥ 90 and R9 ≥ 50 [common practice];
// TM-30 P2 Rg ≥ 92 ; CIE 13.3: Ra not meaningful when DC ≥ 5.4×10⁻³.
const t = qualityTarget({ kind: 'ansiBin', nominalCct: 3000 });
const base: Acceptance = {
  tolerance: { kind: 'sdcm', steps: 5 },
  floors: { raMin: 90, r9Min: 50, rgMin: 92, lerMin: 280 },
  requireTargetBin: true
};
const at = (over: Parameters<typeof metricsAt>[2]) => judgePart(metricsAt(t.x, t.y, over), t, base);

describe('pass/fail against the revision floors', () => {
  it('a part on target meeting every floor passes', () => {
    const v = at({});
    expect(v.pass).toBe(true);
    expect(v.offset.steps).toBeCloseTo(0, 9);
  });
  it('each floor shortfall is named with the value and the limit', () => {
    const v = at({ ra: 88.44, r9: 12, rg: 91, ler: 275 });
    expect(v.failures.map((f) => f.message)).toEqual(['Ra 88.4 < 90', 'R9 12.0 < 50', 'Rg 91.0 < 92', 'LER 275.0 < 280']);
    expect(v.failures.map((f) => f.code)).toEqual(['raMin', 'r9Min', 'rgMin', 'lerMin']);
  });
  it('an Rg above its ceiling fails', () => {
    const v = judgePart(metricsAt(t.x, t.y, { rg: 112 }), t, { ...base, floors: { rgMax: 110 } });
    expect(v.failures.map((f) => f.message)).toEqual(['Rg 112.0 > 110']);
  });
  it('CRI that is not meaningful, or a missing TM-30 value, fails the floors that need it', () => {
    const v = at({ criValid: false, rg: null });
    expect(v.failures.map((f) => f.message)).toEqual([
      'Ra not meaningful (source too far from the Planckian locus)',
      'R9 not meaningful (source too far from the Planckian locus)',
      'Rg not available'
    ]);
  });
  it('a melanopic DER ceiling or floor fails with three decimals; a part measured without α-opic values fails it', () => {
    // CIE S 026/E:2018 DER; common practice: an unknown value is not evidence of compliance
    const der = (melanopic: number) => ({
      efficacyMwPerLm: { sCone: 0, mCone: 0, lCone: 0, rhodopic: 0, melanopic: melanopic * 1.3262 },
      der: { sCone: 0, mCone: 0, lCone: 0, rhodopic: 0, melanopic },
      melanopicEdiPer1000Lx: 1000 * melanopic
    });
    const ceiling = { ...base, floors: { melDerMax: 0.45 } };
    expect(judgePart(metricsAt(t.x, t.y, { alphaOpic: der(0.4612) }), t, ceiling).failures).toEqual([
      { code: 'melDerMax', message: 'Melanopic DER 0.461 > 0.45' }
    ]);
    expect(judgePart(metricsAt(t.x, t.y, { alphaOpic: der(0.44) }), t, ceiling).pass).toBe(true);
    const floor = { ...base, floors: { melDerMin: 0.5 } };
    expect(judgePart(metricsAt(t.x, t.y, { alphaOpic: der(0.44) }), t, floor).failures[0].message).toBe('Melanopic DER 0.440 < 0.5');
    expect(judgePart(metricsAt(t.x, t.y), t, floor).failures[0].message).toBe('Melanopic DER not available');
  });
  it('a floor that is not set is not checked', () => {
    expect(judgePart(metricsAt(t.x, t.y, { ra: 10 }), t, { ...base, floors: {} }).pass).toBe(true);
  });
});

describe('colour tolerance kinds', () => {
  // Δu′v′ and Δuv circles (CIE 15:2004 §8.1; CIE 1960 uv). A point moved by +0.004 in x from the target
  // at 3000 K moves u′ by about 0.0023 — beyond a 0.002 Δu′v′ tolerance, within 0.003.
  const off = metricsAt(t.x + 0.004, t.y);
  it('Δu′v′', () => {
    expect(judgePart(off, t, { ...base, floors: {}, tolerance: { kind: 'deltaUvPrime', value: 0.003 } }).pass).toBe(true);
    const v = judgePart(off, t, { ...base, floors: {}, tolerance: { kind: 'deltaUvPrime', value: 0.002 } });
    expect(v.failures[0].message).toMatch(/^Δu′v′ 0\.00\d\d > 0\.002$/);
  });
  it('Δuv (v = ⅔ v′, so never larger than Δu′v′)', () => {
    const v = judgePart(off, t, { ...base, floors: {}, tolerance: { kind: 'deltaUv', value: 0.002 } });
    expect(v.offset.deltaUv).toBeLessThanOrEqual(v.offset.deltaUvPrime);
  });
  it('labels', () => {
    expect(describeTolerance({ kind: 'sdcm', steps: 3 })).toBe('3-step ellipse');
    expect(describeTolerance({ kind: 'deltaUvPrime', value: 0.003 })).toBe('Δu′v′ ≤ 0.003');
  });
});

describe('acceptance in force for a batch', () => {
  const content = {
    target: { kind: 'ansiBin' as const, nominalCct: 3000 },
    tolerance: { kind: 'deltaUvPrime' as const, value: 0.003 },
    floors: { raMin: 90 }
  };
  it('defaults to the revision tolerance and requires the bin for a bin target', () => {
    const a = batchAcceptance(content, null);
    expect(a).toEqual({ tolerance: { kind: 'deltaUvPrime', value: 0.003 }, floors: { raMin: 90 }, requireTargetBin: true });
    expect(describeAcceptance(a)).toBe('Δu′v′ ≤ 0.003, inside the target ANSI bin');
  });
  it('a step ellipse chosen by quality replaces the colour tolerance only', () => {
    const a = batchAcceptance(content, { mode: 'steps', steps: 3, requireTargetBin: false });
    expect(a).toEqual({ tolerance: { kind: 'sdcm', steps: 3 }, floors: { raMin: 90 }, requireTargetBin: false });
    expect(describeAcceptance(a)).toBe('3-step ellipse');
  });
});

describe('step tolerance in pass/fail', () => {
  // Target: ANSI 2700 K bin centre (Table 1: 2725 K, Duv 0). A point 2 steps and one 4 steps out along
  // the default ellipse's major axis, judged against a 3-step tolerance.
  const t2700 = qualityTarget({ kind: 'ansiBin', nominalCct: 2700 });
  const e = stepEllipseAt(t2700);
  const along = (n: number) => {
    const th = (e.thetaDeg * Math.PI) / 180;
    return metricsAt(t2700.x + n * e.a * Math.cos(th), t2700.y + n * e.a * Math.sin(th));
  };
  const acceptance = { tolerance: { kind: 'sdcm' as const, steps: 3 }, floors: {}, requireTargetBin: true };
  it('2 steps passes a 3-step tolerance', () => {
    const v = judgePart(along(2), t2700, acceptance);
    expect(v.offset.steps).toBeCloseTo(2, 6);
    expect(v.pass).toBe(true);
  });
  it('4 steps fails it, saying by how much', () => {
    const v = judgePart(along(4), t2700, acceptance);
    expect(v.pass).toBe(false);
    expect(v.failures).toEqual([{ code: 'colour', message: '4.0 steps from target > 3' }]);
  });
});

describe('a TM-30 design intent on the revision is judged per part', () => {
  const withIntent: Acceptance = { ...base, floors: { intent: 'F3' } };
  it('a part below F3 fails with the criterion named (F3: Rf ≥ 85, Rf,h1 ≥ 85, as quoted by ASHRAE 189.1)', () => {
    const v = judgePart(metricsAt(t.x, t.y, { rf: 84, rg: 100, rfh1: 90, rcsh1: 0 }), t, withIntent);
    expect(v.failures).toEqual([{ code: 'intent', message: 'TM-30 design intent F3 not met: Rf 84 < 85' }]);
  });
  it('a part meeting F3 passes; one measured before hue-bin indices were kept is not judged and fails', () => {
    expect(judgePart(metricsAt(t.x, t.y, { rf: 90, rg: 100, rfh1: 88, rcsh1: 0 }), t, withIntent).pass).toBe(true);
    const old = judgePart(metricsAt(t.x, t.y, { rf: 90, rg: 100 }), t, withIntent);
    expect(old.failures[0].message).toMatch(/not judged/);
  });
});
