/**
 * Stokes and photon accounting at every temperature (property test): a converted photon carries
 * λpump/λem of the absorbed photon's energy, so the emitted power never exceeds absorbed × IQE(T) ×
 * λpump/λem, and the photon count out is exactly IQE(T) × the photons absorbed (Schubert,
 * *Light-Emitting Diodes*, 2nd ed. (2006), white-LED chapter: Stokes loss). The pump is a narrow
 * measured band (448–452 nm) and the phosphor emits only above 500 nm, so λpump ≤ 452 nm + drift and
 * λem ≥ the hot band's blue edge bound every photon.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { prepareBasis } from '../../../src/lib/blend';
import { GRID_NM } from '../../../src/lib/blend/grid';
import { beerLambertPhotonBudget } from '../../../src/lib/blend/loading/beerLambertPhotonBudget';
import { materialThermalSchema, requireHotComponents } from '../../../src/lib/blend/thermal';
import type { BlendComponents } from '../../../src/lib/blend/types';
import { YELLOW } from './fixtures';

const wl = Array.from({ length: 471 }, (_, i) => 360 + i);
const PUMP = {
  id: 'pump-narrow',
  name: 'narrow test chip',
  spectrum: { wavelengths: wl, values: wl.map((w) => (w >= 448 && w <= 452 ? 1 - Math.abs(w - 450) / 3 : 0)) }
};
const EMITTER = {
  ...YELLOW,
  id: 'ph-test',
  emission: {
    wavelengths: YELLOW.emission.wavelengths,
    values: YELLOW.emission.values.map((v, i) => (YELLOW.emission.wavelengths[i] >= 500 ? v : 0))
  }
};
const COMPONENTS: BlendComponents = { pump: PUMP, phosphors: [EMITTER] };

const curve = (q85: number, q150: number) => [
  { temperatureC: 25, value: 1 },
  { temperatureC: 85, value: q85 },
  { temperatureC: 150, value: q150 }
];

describe('photon accounting at temperature', () => {
  it('emitted power ≤ absorbed × IQE(T) × λpump/λem, and photons out = IQE(T) × photons absorbed', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 25, max: 150, noNaN: true }),
        fc.double({ min: 0.5, max: 1, noNaN: true }),
        fc.double({ min: 0.3, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 0.06, noNaN: true }),
        fc.double({ min: 0.5, max: 20, noNaN: true }),
        (temperatureC, q85, q150share, driftPerK, wtPct) => {
          const thermal = {
            [PUMP.id]: materialThermalSchema.parse({ kind: 'pump', peakDriftNmPerK: driftPerK, relativeOutput: curve(1, 1) }),
            [EMITTER.id]: materialThermalSchema.parse({
              kind: 'phosphor',
              relativeEmission: curve(q85, q85 * q150share),
              peakShiftNm: { perK: 0.02 }
            })
          };
          const hot = requireHotComponents(COMPONENTS, thermal, { reference: 'junction', temperatureC, driveCurrentMa: null });
          const basis = prepareBasis(hot.components).loading;
          if (!basis) throw new Error('loading basis expected');
          const res = beerLambertPhotonBudget(basis, [wtPct], 0.3);
          let absorbedPower = 0;
          let absorbedPhotons = 0;
          let emittedPhotons = 0;
          let emMinNm = Infinity;
          for (let l = 0; l < GRID_NM.length; l++) {
            const a = basis.pump[l] - res.componentSpd[0][l];
            absorbedPower += a;
            absorbedPhotons += a * GRID_NM[l];
            emittedPhotons += res.componentSpd[1][l] * GRID_NM[l];
            if (basis.emission[0][l] > 0) emMinNm = Math.min(emMinNm, GRID_NM[l]);
          }
          const iqeHot = hot.components.phosphors[0].iqe;
          expect(iqeHot).toBeLessThanOrEqual(EMITTER.iqe);
          expect(emittedPhotons).toBeCloseTo(iqeHot * absorbedPhotons, 9);
          const pumpMaxNm = 452 + hot.pumpShiftNm + 1;
          expect(res.componentPower[1]).toBeLessThanOrEqual(absorbedPower * iqeHot * (pumpMaxNm / emMinNm) + 1e-12);
        }
      ),
      { numRuns: 40 }
    );
  });
});
