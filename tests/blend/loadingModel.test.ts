import { describe, expect, it } from 'vitest';
import { evaluateGrid } from '../../src/lib/spectral/evaluate';
import { prepareBasis } from '../../src/lib/blend/basis';
import { GRID_NM } from '../../src/lib/blend/grid';
import { beerLambertPhotonBudget } from '../../src/lib/blend/loading/beerLambertPhotonBudget';
import { concentrationsForFractions } from '../../src/lib/blend/loading/concentrationsForFractions';
import { superposeSpd } from '../../src/lib/blend/superposition';
import { BLUE_PUMP, demoPhosphor } from '../../src/lib/blend/demo-components';
import { THREE } from './fixtures';

const basis = prepareBasis(THREE);
const lb = basis.loading!;
const L = 0.3;
const run = (c: number[], cascade = false) => beerLambertPhotonBudget(lb, c, L, cascade);

describe('Beer–Lambert (Beer 1852) pump transmission', () => {
  it('flat absorption gives T = exp(−αcL) exactly', () => {
    // Source: Beer–Lambert law; no excitation spectrum → α independent of λ.
    const flat = prepareBasis({
      pump: BLUE_PUMP,
      phosphors: [{ ...demoPhosphor('ph-yg555'), excitation: undefined, absorptionPerWtPctMm: 0.4, absorptionReferenceNm: undefined }]
    });
    const r = beerLambertPhotonBudget(flat.loading!, [8], 0.25);
    expect(r.pumpTransmission).toBeCloseTo(Math.exp(-0.4 * 8 * 0.25), 12);
  });

  it('thick layer with IQE 1: radiant efficiency = photon-weighted Stokes ratio', () => {
    // Source: energy per photon hc/λ (Schubert 2006, Stokes loss) — expected value built
    // here from the shapes, independently of the model code.
    const p = { ...demoPhosphor('ph-rd625'), excitation: undefined, iqe: 1, absorptionPerWtPctMm: 1, absorptionReferenceNm: undefined };
    const b = prepareBasis({ pump: BLUE_PUMP, phosphors: [p] });
    const r = beerLambertPhotonBudget(b.loading!, [100], 10);
    const pump = b.components[0].spd;
    const em = b.components[1].spd;
    let photonsIn = 0;
    let emPhotons = 0;
    for (let i = 0; i < pump.length; i++) {
      photonsIn += pump[i] * GRID_NM[i];
      emPhotons += em[i] * GRID_NM[i];
    }
    // emitted power per emitted photon = 1 / (photons per unit power of the emission shape)
    expect(r.radiantEfficiency).toBeCloseTo(photonsIn / emPhotons, 6);
  });
});

describe('physical sanity [common practice]', () => {
  it('more phosphor → less pump leak, monotonically', () => {
    let prev = Infinity;
    for (const s of [0.25, 0.5, 1, 2, 4]) {
      const r = run([3 * s, 6 * s, 2 * s]);
      expect(r.opticalFractions[0]).toBeLessThan(prev);
      prev = r.opticalFractions[0];
    }
  });

  it('more red phosphor → lower CCT (loading and optical models)', () => {
    const cct = (c: number[]) => evaluateGrid(run(c).spd, { cri: false, tm30: false }).cct;
    expect(cct([3, 6, 3])).toBeLessThan(cct([3, 6, 2]));
    const w = [0.1, 0.2, 0.4, 0.3];
    const more = [0.1, 0.2, 0.4, 0.4];
    const cctW = (v: number[]) => evaluateGrid(superposeSpd(basis, v), { cri: false, tm30: false }).cct;
    expect(cctW(more)).toBeLessThan(cctW(w));
  });

  it('cascade: red re-absorbs green → lower green share, lower efficiency', () => {
    const c = [4, 8, 3];
    const a = run(c, false);
    const b = run(c, true);
    expect(b.opticalFractions[1]).toBeLessThan(a.opticalFractions[1]);
    expect(b.opticalFractions[3]).toBeGreaterThan(a.opticalFractions[3]);
    expect(b.radiantEfficiency).toBeLessThan(a.radiantEfficiency);
  });

  it('inverse: concentrations for wanted fractions round-trip (with and without cascade)', () => {
    for (const cascade of [false, true]) {
      const c = [4, 8, 3];
      const f = run(c, cascade).opticalFractions;
      const sol = concentrationsForFractions(lb, f, { pathLengthMm: L, cascade });
      sol.concentrationsWtPct.forEach((v, i) => expect(v).toBeCloseTo(c[i], 6));
    }
  });
});
