/**
 * The blend at an operating condition: the checks of the thermal model against hand calculation
 * (superposition of component tristimulus values, CIE 15:2004 §7: XYZ is linear in the spectrum)
 * and photon accounting (Stokes loss: a converted photon carries λpump/λem of the pump photon's
 * energy; Schubert, *Light-Emitting Diodes*, 2nd ed. (2006), white-LED chapter).
 */
import { describe, expect, it } from 'vitest';
import { mix, prepareBasis } from '../../../src/lib/blend';
import { tristimulus } from '../../../src/lib/blend/basis';
import { beerLambertPhotonBudget } from '../../../src/lib/blend/loading/beerLambertPhotonBudget';
import { hotComponents, materialThermalSchema, requireHotComponents } from '../../../src/lib/blend/thermal';
import { BENCH_CONDITION } from '../../../src/lib/aim/condition';
import { COMPONENTS, NEUTRAL, RED, TYPICAL, YELLOW } from './fixtures';

const HOT = { reference: 'junction' as const, temperatureC: 85, driveCurrentMa: 350 };
const LOADING = { pathLengthMm: 0.3 };
const WT = [9, 1.6];

describe('hot components', () => {
  it('with zero quenching and zero drift, hot equals cold exactly', () => {
    const r = requireHotComponents(COMPONENTS, NEUTRAL, HOT);
    expect(r.components).toEqual(COMPONENTS);
    const cold = mix(COMPONENTS, { kind: 'loading', concentrationsWtPct: WT, loading: LOADING });
    const hot = mix(r.components, { kind: 'loading', concentrationsWtPct: WT, loading: LOADING });
    expect(hot.evaluation.x).toBe(cold.evaluation.x);
    expect(hot.evaluation.y).toBe(cold.evaluation.y);
    expect(hot.evaluation.cct).toBe(cold.evaluation.cct);
  });

  it('the bench condition needs no thermal data and changes nothing', () => {
    const r = hotComponents(COMPONENTS, {}, BENCH_CONDITION);
    expect(r.status).toBe('ok');
    if (r.status === 'ok') expect(r.components).toBe(COMPONENTS);
  });

  it('missing data is listed as not characterised, never taken as zero', () => {
    const r = hotComponents(COMPONENTS, { [RED.id]: NEUTRAL[RED.id] }, HOT);
    expect(r.status).toBe('notCharacterised');
    if (r.status !== 'notCharacterised') return;
    expect(r.missing).toEqual([
      `${COMPONENTS.pump.name}: pump thermal data (peak drift, relative output)`,
      `${YELLOW.name}: relative emission vs temperature`
    ]);
    expect(() => requireHotComponents(COMPONENTS, {}, HOT)).toThrow(/not characterised at Tj 85 °C, 350 mA/);
  });

  it('a current without a drift per mA is not characterised', () => {
    const pump = materialThermalSchema.parse({
      kind: 'pump',
      peakDriftNmPerK: 0.04,
      relativeOutput: [
        { temperatureC: 25, value: 1 },
        { temperatureC: 150, value: 0.85 }
      ]
    });
    const r = hotComponents(COMPONENTS, { ...TYPICAL, [COMPONENTS.pump.id]: pump }, HOT);
    expect(r.status === 'notCharacterised' && r.missing).toEqual([`${COMPONENTS.pump.name}: peak drift per mA`]);
    // Without a stated current the temperature drift alone applies: 0.04 nm/K × 60 K = 2.4 nm.
    const noCurrent = requireHotComponents(COMPONENTS, { ...TYPICAL, [COMPONENTS.pump.id]: pump }, { ...HOT, driveCurrentMa: null });
    expect(noCurrent.pumpShiftNm).toBeCloseTo(2.4, 12);
  });

  it('shifts the pump by drift·ΔT + drift·ΔI (hand calculation)', () => {
    // 0.04 nm/K × (85 − 25) K + 0.005 nm/mA × (700 − 350) mA = 2.4 + 1.75 = 4.15 nm.
    const r = requireHotComponents(COMPONENTS, TYPICAL, { ...HOT, driveCurrentMa: 700 });
    expect(r.pumpShiftNm).toBeCloseTo(4.15, 12);
    expect(r.components.pump.parametric?.peakNm).toBeCloseTo(450 + 4.15, 12);
    expect(r.pumpOutputFactor).toBe(0.93);
  });

  it('quenching only the red by 10 % moves the point toward higher CCT by what superposition predicts', () => {
    const redOnly = {
      ...NEUTRAL,
      [RED.id]: materialThermalSchema.parse({
        kind: 'phosphor',
        relativeEmission: [
          { temperatureC: 25, value: 1 },
          { temperatureC: 85, value: 0.9 },
          { temperatureC: 150, value: 0.8 }
        ]
      })
    };
    const hot = requireHotComponents(COMPONENTS, redOnly, HOT);
    expect(hot.quench).toEqual([1, 0.9]);
    // Hand calculation: XYZ is linear in the spectrum, and the red's emitted power is IQE × absorbed
    // photons, so the hot XYZ is the cold pump + yellow XYZ plus 0.9 × the cold red XYZ.
    const basis = prepareBasis(COMPONENTS).loading;
    if (!basis) throw new Error('loading basis expected');
    const cold = beerLambertPhotonBudget(basis, WT, LOADING.pathLengthMm);
    const [pumpXyz, yellowXyz, redXyz] = cold.componentSpd.map(tristimulus);
    const X = pumpXyz[0] + yellowXyz[0] + 0.9 * redXyz[0];
    const Y = pumpXyz[1] + yellowXyz[1] + 0.9 * redXyz[1];
    const Z = pumpXyz[2] + yellowXyz[2] + 0.9 * redXyz[2];
    const hotMix = mix(hot.components, { kind: 'loading', concentrationsWtPct: WT, loading: LOADING });
    const coldMix = mix(COMPONENTS, { kind: 'loading', concentrationsWtPct: WT, loading: LOADING });
    expect(hotMix.evaluation.x).toBeCloseTo(X / (X + Y + Z), 9);
    expect(hotMix.evaluation.y).toBeCloseTo(Y / (X + Y + Z), 9);
    expect(hotMix.evaluation.cct).toBeGreaterThan(coldMix.evaluation.cct);
    // The red's share of the output: f′ = 0.9·f / (1 − 0.1·f) (its power × 0.9, the total less 0.1 of it).
    const f = coldMix.opticalFractions[2];
    expect(hotMix.opticalFractions[2]).toBeCloseTo((0.9 * f) / (1 - 0.1 * f), 12);
  });

  it('with typical data a garnet + nitride blend gets bluer and the pump redder at Tj 85 °C', () => {
    const r = requireHotComponents(COMPONENTS, TYPICAL, HOT);
    expect(r.quench).toEqual([0.98, 0.96]);
    expect(r.peakShiftNm[0]).toBeCloseTo(-1.2, 12); // −0.02 nm/K × 60 K
    expect(r.widthFactor[0]).toBeCloseTo(1.03, 12); // 1 + 0.0005/K × 60 K
    expect(r.components.phosphors[0].iqe).toBeCloseTo(YELLOW.iqe * 0.98, 12);
    expect(r.components.phosphors[1].iqe).toBeCloseTo(RED.iqe * 0.96, 12);
  });

  it('refuses a temperature outside the data', () => {
    expect(() => requireHotComponents(COMPONENTS, TYPICAL, { ...HOT, temperatureC: 175 })).toThrow(
      /175 °C is outside the characterised range 25–150 °C/
    );
  });
});
