import { describe, expect, it } from 'vitest';
import { createLiveEvaluator } from '../../../src/lib/designer/live-evaluator';
import { floorChecks, targetStanding } from '../../../src/lib/designer/readout';
import { resolveTarget } from '../../../src/lib/aim/index';
import { BLUE_PUMP, demoPhosphor, mix } from '../../../src/lib/blend';

const components = { pump: BLUE_PUMP, phosphors: [demoPhosphor('ph-gl530'), demoPhosphor('ph-yl568'), demoPhosphor('ph-rd625')] };
// Fractions of the demo 3000 K formulation KH-W30-90 rev 2 (seeds/03_formulations.ts, found with the solver).
const shares = [0.07, 0.2667, 0.2346, 0.4287];

describe('live evaluation in the designer', () => {
  const live = createLiveEvaluator(components);

  it('gives the same metrics as the mix API for the same fractions', () => {
    const frame = live.evaluate(shares);
    const ref = mix(components, { kind: 'optical', fractions: shares });
    expect(frame.evaluation.cct).toBeCloseTo(ref.evaluation.cct, 9);
    expect(frame.evaluation.cri.ra).toBeCloseTo(ref.evaluation.cri.ra, 9);
    expect(frame.evaluation.tm30.rf).toBeCloseTo(ref.evaluation.tm30.rf, 9);
    expect(frame.computeMs).toBeGreaterThanOrEqual(0);
    expect(live.componentsXy).toHaveLength(4);
    expect(frame.sensitivities.map((x) => x.dCct)).toEqual(ref.sensitivities.map((x) => x.dCct));
  });

  it('says which way each share moves the colour: more red phosphor lowers the CCT, more pump raises it', () => {
    // Common practice: a red phosphor warms the light, blue pump leak cools it.
    const [pump, , , red] = live.evaluate(shares).sensitivities;
    expect(red.dCct).toBeLessThan(0);
    expect(pump.dCct).toBeGreaterThan(0);
  });

  it('is near 3000 K for the demo warm-white fractions', () => {
    const e = live.evaluate(shares).evaluation;
    expect(Math.abs(e.cct - 3000)).toBeLessThan(60);
    expect(Math.abs(e.duv)).toBeLessThan(0.003);
  });

  it('refuses a share vector of the wrong length', () => {
    expect(() => live.evaluate([0.5, 0.5])).toThrow(RangeError);
  });

  it('reports floors and the distance to the target', () => {
    const e = live.evaluate(shares).evaluation;
    const checks = floorChecks({ raMin: 90, r9Min: 50, lerMin: 1000 }, e);
    expect(checks.map((c) => c.label)).toEqual(['Ra', 'R9', 'LER']);
    expect(checks[2].pass).toBe(false); // LER can never reach 1000 lm/W (683 lm/W is the maximum, CIE 15)
    expect(checks[0].value).toBeCloseTo(e.cri.ra, 12);
    const standing = targetStanding(e, resolveTarget({ kind: 'ansiBin', nominalCct: 3000 }), { kind: 'sdcm', steps: 7 });
    expect(standing.ansiBin).toBe(3000);
    expect(standing.inTargetBin).toBe(true);
    expect(standing.steps).toBeGreaterThan(0);
  });

  it('judges a melanopic DER ceiling with three decimals, on the pump alone as well', () => {
    const e = live.evaluate(shares).evaluation;
    const [cap] = floorChecks({ melDerMax: 0.1 }, e);
    // common practice: a blue-pumped warm white sits well above a melanopic DER of 0.1 (CIE S 026: D65 = 1)
    expect(cap).toMatchObject({ label: 'Melanopic DER', sense: '≤', pass: false, digits: 3 });
    expect(cap.value).toBeCloseTo(e.alphaOpic.der.melanopic, 12);
    // CIE S 026 is defined for any spectrum, so unlike Ra it is judged far from white too
    expect(floorChecks({ melDerMin: 0.1 }, live.evaluate([1, 0, 0, 0]).evaluation)[0].value).not.toBeNull();
  });

  it('fails Ra/R9 floors when CIE 13.3 is not meaningful (pump alone: far from white, CIE 13.3 §5.3)', () => {
    const e = live.evaluate([1, 0, 0, 0]).evaluation;
    const [ra] = floorChecks({ raMin: 80 }, e);
    expect(ra.value).toBeNull();
    expect(ra.pass).toBe(false);
    expect(ra.note).toContain('CIE 13.3');
  });
});
