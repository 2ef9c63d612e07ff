import { describe, expect, it } from 'vitest';
import { prepareBasis } from '../../src/lib/blend/basis';
import { beerLambertPhotonBudget } from '../../src/lib/blend/loading/beerLambertPhotonBudget';
import { solveBlend } from '../../src/lib/blend/solver/solveBlend';
import { FOUR, THREE } from './fixtures';

const target = { kind: 'ansiBin', nominalCct: 3500 } as const;

describe('objectives and loading output', () => {
  it('minCost ranks by cost; wt % reproduce the optical mix through the loading model', () => {
    const loading = { pathLengthMm: 0.3 };
    const r = solveBlend({ components: FOUR, target, floors: { raMin: 90 }, objective: 'minCost', loading, maxCandidates: 3 });
    expect(r.status).toBe('ok');
    const costs = r.candidates.map((c) => c.costPer1000Lm as number);
    costs.forEach((c, i) => i > 0 && expect(c).toBeGreaterThanOrEqual(costs[i - 1] - 1e-12));
    const c0 = r.candidates[0];
    expect(c0.costBasis).toBe('loadingModel');
    // Source: model identity — wt % fed forward through Beer–Lambert give back the fractions.
    const fwd = beerLambertPhotonBudget(prepareBasis(FOUR).loading!, c0.concentrationsWtPct!, 0.3);
    fwd.opticalFractions.forEach((f, i) => expect(f).toBeCloseTo(c0.opticalFractions[i], 5));
  });

  it('without loading parameters the cost uses the thin-layer proxy', () => {
    const r = solveBlend({ components: THREE, target, objective: 'minCost' });
    expect(r.candidates[0].costBasis).toBe('thinLayerProxy');
    expect(r.candidates[0].concentrationsWtPct).toBeNull();
  });

  it('maxRa beats maxLer on Ra, maxLer beats maxRa on LER (same target)', () => {
    const a = solveBlend({ components: FOUR, target, objective: 'maxRa' }).candidates[0].evaluation;
    const b = solveBlend({ components: FOUR, target, objective: 'maxLer' }).candidates[0].evaluation;
    expect(a.cri.ra).toBeGreaterThanOrEqual(b.cri.ra);
    expect(b.ler).toBeGreaterThanOrEqual(a.ler);
  });

  it('binding floors are reported', () => {
    const r = solveBlend({
      components: THREE,
      target: { kind: 'ansiBin', nominalCct: 3000 },
      floors: { raMin: 90, r9Min: 50 },
      objective: 'maxLer'
    });
    expect(r.candidates[0].binding.some((b) => b === 'r9Min' || b === 'raMin')).toBe(true);
    expect(r.candidates[0].inAnsiBin).toBe(true);
  });
});
