/**
 * The designer's hot view: the bench recipe (cold output fractions) evaluated at the condition
 * equals the blend model's mix of the components at the condition with the quenched fractions
 * (superposition, Ohno, Opt. Eng. 44 (2005) 111302); missing data is said. Thermal data [from memory].
 */
import { describe, expect, it } from 'vitest';
import { mix } from '../../../src/lib/blend';
import { quenchedFractions, requireHotComponents } from '../../../src/lib/blend/thermal';
import { hotViewOf } from '../../../src/lib/designer/hot-view';
import { COMPONENTS, TYPICAL } from '../../blend/thermal/fixtures';

const HOT = { reference: 'junction' as const, temperatureC: 85, driveCurrentMa: 350 };
const COLD = [0.2, 0.6, 0.2];

describe('designer hot view', () => {
  it('is the bench at the bench', () => {
    expect(hotViewOf(COMPONENTS, {}, null, COLD)).toEqual({ status: 'bench' });
  });

  it('evaluates the recipe at the condition, quenched shares on the hot components', () => {
    const v = hotViewOf(COMPONENTS, TYPICAL, HOT, COLD);
    expect(v.status).toBe('ok');
    if (v.status !== 'ok') return;
    // 0.6·0.98 and 0.2·0.96 renormalised with the 0.2 pump leak (TYPICAL quench at 85 °C).
    const s = 0.2 + 0.6 * 0.98 + 0.2 * 0.96;
    expect(quenchedFractions(COLD, v.quench)).toEqual([0.2 / s, (0.6 * 0.98) / s, (0.2 * 0.96) / s].map((x) => expect.closeTo(x, 12)));
    const ref = mix(requireHotComponents(COMPONENTS, TYPICAL, HOT).components, {
      kind: 'optical',
      fractions: quenchedFractions(COLD, v.quench)
    });
    expect(v.frame.evaluation.x).toBeCloseTo(ref.evaluation.x, 9);
    expect(v.frame.evaluation.y).toBeCloseTo(ref.evaluation.y, 9);
    expect(v.label).toBe('Tj 85 °C, 350 mA');
  });

  it('says what is not characterised, and refuses a temperature outside the data', () => {
    const v = hotViewOf(COMPONENTS, {}, HOT, COLD);
    expect(v.status === 'unavailable' && v.message).toMatch(/^Not characterised at Tj 85 °C, 350 mA: B-450/);
    const far = hotViewOf(COMPONENTS, TYPICAL, { ...HOT, temperatureC: 180 }, COLD);
    expect(far.status === 'unavailable' && far.message).toMatch(/180 °C is outside the characterised range 25–150 °C/);
  });
});
