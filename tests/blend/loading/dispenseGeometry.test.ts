/**
 * Dispense geometry: volume fractions from densities (ideal mixing, volumes add) against
 * hand arithmetic, and the fixed-volume exponent in the loading model.
 */
import { describe, expect, it } from 'vitest';
import { prepareBasis } from '../../../src/lib/blend/basis';
import { beerLambertPhotonBudget, opticalDepthsOf } from '../../../src/lib/blend/loading/beerLambertPhotonBudget';
import { effectiveWtPct, slurryDensityGPerCm3, volumeFractions, wtPctFromEffective } from '../../../src/lib/blend/loading/dispenseGeometry';
import { blue } from '../fixtures';

describe('volume fractions (hand calculation, ideal mixing)', () => {
  const cases = [
    // 50 wt % of 4.5 g/cm³ in 1.1 g/cm³: 1/ρ = 0.5/4.5 + 0.5/1.1 = 0.565657 → ρ = 1.767857; φ = 0.5·1.767857/4.5 = 0.196429.
    { name: '50 wt %, 4.5 in 1.1', c: [50], rho: [4.5], rhoSil: 1.1, slurry: 1.767857, phi: [0.196429] },
    // 10 + 20 wt %, 4.55 and 3.5 in 1.05: 1/ρ = 0.1/4.55 + 0.2/3.5 + 0.7/1.05 = 0.021978 + 0.057143 + 0.666667 = 0.745788 → ρ = 1.340864;
    // φ₁ = 0.1·1.340864/4.55 = 0.029470, φ₂ = 0.2·1.340864/3.5 = 0.076621.
    { name: '10 + 20 wt %, 4.55 and 3.5 in 1.05', c: [10, 20], rho: [4.55, 3.5], rhoSil: 1.05, slurry: 1.340864, phi: [0.02947, 0.076621] }
  ];
  for (const k of cases) {
    it(k.name, () => {
      expect(slurryDensityGPerCm3(k.c, k.rho, k.rhoSil)).toBeCloseTo(k.slurry, 5);
      volumeFractions(k.c, k.rho, k.rhoSil).forEach((v, i) => expect(v).toBeCloseTo(k.phi[i], 6));
    });
  }

  it('the linear (dilute) reading underestimates the volume fraction by ~38 % at 50 wt %', () => {
    // Linear: 0.5·1.1/4.5 = 0.122222; exact 0.196429 (above) → 1 − 0.122222/0.196429 = 0.3778.
    const exact = volumeFractions([50], [4.5], 1.1)[0];
    expect(1 - (0.5 * 1.1) / 4.5 / exact).toBeCloseTo(0.3778, 4);
  });
});

describe('exponent by geometry', () => {
  const spec = { geometry: 'fixedVolume' as const, densityGPerCm3: [4.5], siliconeDensityGPerCm3: 1.1 };
  it('fixed volume: g = c·ρ_slurry/ρ_silicone (50 wt % → 50·1.767857/1.1 = 80.357)', () => {
    expect(effectiveWtPct([50], spec)[0]).toBeCloseTo(80.357, 3);
    expect(effectiveWtPct([50], {})[0]).toBe(50);
  });

  it('fixed volume: wt % back from g, and refusal when the phosphor would fill the cavity', () => {
    const back = wtPctFromEffective([80.357143], spec);
    expect(back.ok && back.concentrationsWtPct[0]).toBeCloseTo(50, 4);
    // φ = g·ρ_sil/100/ρ = 420·1.1/100/4.5 = 1.027 ≥ 1.
    expect(wtPctFromEffective([420], spec).ok).toBe(false);
    expect(wtPctFromEffective([60, 45], {}).ok).toBe(false);
  });

  it('the loading model reads the geometry; dilute mixes agree, dense ones absorb more in a fixed volume', () => {
    const lb = prepareBasis(blue('ph-yg555')).loading!;
    const fv = { geometry: 'fixedVolume' as const, siliconeDensityGPerCm3: 1.1 };
    const [dense] = opticalDepthsOf(lb, [40], 0.3, fv);
    const [linear] = opticalDepthsOf(lb, [40], 0.3);
    // 40 wt % of 4.55 in 1.1: 1/ρ = 0.4/4.55 + 0.6/1.1 = 0.633367 → ρ = 1.578863, factor 1.435330.
    expect(dense / linear).toBeCloseTo(1.43533, 4);
    const t1 = beerLambertPhotonBudget(lb, [0.01], 0.3, false, 1, fv).pumpTransmission;
    const t2 = beerLambertPhotonBudget(lb, [0.01], 0.3).pumpTransmission;
    expect(t1).toBeCloseTo(t2, 6);
  });
});
