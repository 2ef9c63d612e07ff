import { describe, expect, it } from 'vitest';
import { solveBlend } from '../../../src/lib/blend/solver/solveBlend';
import { designIntents } from '../../../src/lib/spectral/tm30/design-intents';
import { FOUR, THREE } from '../fixtures';

const target = { kind: 'ansiBin', nominalCct: 3000 } as const;

describe('a TM-30-20 Annex E design intent as a solver constraint', () => {
  it('every proposal of a solve "meets Preference P2" meets P2 when re-evaluated', () => {
    const r = solveBlend({ components: FOUR, target, floors: { intent: 'P2' }, objective: 'maxLer' });
    expect(r.status).toBe('ok');
    for (const c of r.candidates) {
      const report = designIntents(c.evaluation.tm30)!;
      expect(report.checks.find((x) => x.level === 'P2')!.met).toBe(true);
      expect(c.violations).toEqual([]);
    }
  });

  it('costs LER: the unconstrained optimum is at least as efficient', () => {
    const free = solveBlend({ components: FOUR, target, objective: 'maxLer' }).candidates[0].evaluation.ler;
    const p2 = solveBlend({ components: FOUR, target, floors: { intent: 'P2' }, objective: 'maxLer' }).candidates[0].evaluation.ler;
    expect(free).toBeGreaterThanOrEqual(p2 - 1e-9);
  });

  it('says so when no mix meets the level', () => {
    // Vividness V1 asks for Rg ≥ 117 (from memory); three broad garnet/nitride bands stay near Rg 100.
    const r = solveBlend({ components: THREE, target, floors: { intent: 'V1' }, objective: 'maxLer' });
    expect(r.status).toBe('floorsNotMet');
    expect(r.reason).toContain('TM-30 design intent V1');
  });
});
