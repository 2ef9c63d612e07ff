import { describe, expect, it } from 'vitest';
import { floorsSchema } from '../../src/lib/aim/schema';
import { solveProblemSchema } from '../../src/lib/blend/schemas';
import { solveBlend } from '../../src/lib/blend/solver/solveBlend';
import { blue } from './fixtures';

const at3000 = { kind: 'cctDuv', cct: 3000, duv: 0 } as const;
// Green, yellow, orange and deep red on a blue pump: room to trade melanopic content against efficacy.
const FOUR = blue('ph-gl530', 'ph-yl568', 'ph-or600', 'ph-rd650');
const melDer = (c: { evaluation: { alphaOpic: { der: { melanopic: number } } } }) => c.evaluation.alphaOpic.der.melanopic;

describe('melanopic DER (CIE S 026/E:2018) as solver floor, ceiling and objective', () => {
  it('"3000 K, Ra ≥ 80, melanopic DER as low as possible" beats the efficacy-optimal blend on DER', () => {
    const low = solveBlend({ components: FOUR, target: at3000, floors: { raMin: 80 }, objective: 'minMelDer' });
    const eff = solveBlend({ components: FOUR, target: at3000, floors: { raMin: 80 }, objective: 'maxLer' });
    expect(low.status).toBe('ok');
    expect(eff.status).toBe('ok');
    // common practice: with spare degrees of freedom, minimising a metric cannot do worse than a solve that ignores it
    // (lower by at least 0.01, 1 % of daylight's DER, so the difference is worth reporting)
    expect(melDer(low.candidates[0])).toBeLessThan(melDer(eff.candidates[0]) - 0.01);
    expect(low.candidates[0].evaluation.cri.ra).toBeGreaterThanOrEqual(80);
    // common practice: a 3000 K white has a melanopic DER well under daylight's 1 (CIE S 026: D65 = 1)
    expect(melDer(low.candidates[0])).toBeLessThan(0.7);
  });

  it('maximising melanopic DER gives a higher DER than minimising it at the same point', () => {
    const hi = solveBlend({ components: FOUR, target: at3000, floors: { raMin: 80 }, objective: 'maxMelDer' });
    const lo = solveBlend({ components: FOUR, target: at3000, floors: { raMin: 80 }, objective: 'minMelDer' });
    // common practice: the two senses of one objective bracket the feasible range
    expect(melDer(hi.candidates[0])).toBeGreaterThan(melDer(lo.candidates[0]));
  });

  it('honours a melanopic DER floor and a ceiling', () => {
    const lo = solveBlend({ components: FOUR, target: at3000, floors: { raMin: 80 }, objective: 'minMelDer' });
    const hi = solveBlend({ components: FOUR, target: at3000, floors: { raMin: 80 }, objective: 'maxMelDer' });
    const mid = (melDer(lo.candidates[0]) + melDer(hi.candidates[0])) / 2;
    const floored = solveBlend({ components: FOUR, target: at3000, floors: { raMin: 80, melDerMin: mid }, objective: 'minMelDer' });
    expect(floored.status).toBe('ok');
    // common practice: a feasible candidate meets its floor (minimising pushes it onto the floor)
    for (const c of floored.candidates) expect(melDer(c)).toBeGreaterThanOrEqual(mid - 1e-9);
    expect(floored.candidates[0].binding).toContain('melDerMin');
    const capped = solveBlend({ components: FOUR, target: at3000, floors: { raMin: 80, melDerMax: mid }, objective: 'maxLer' });
    expect(capped.status).toBe('ok');
    for (const c of capped.candidates) expect(melDer(c)).toBeLessThanOrEqual(mid + 1e-9);
  });

  it('reports an impossible ceiling with the best achievable value', () => {
    const r = solveBlend({ components: FOUR, target: at3000, floors: { raMin: 80, melDerMax: 0.1 }, objective: 'maxLer' });
    expect(r.status).toBe('floorsNotMet');
    const best = r.bestAchievable.melDerMax as number;
    // common practice: a blue-pumped white at 3000 K cannot reach a melanopic DER of 0.1
    expect(best).toBeGreaterThan(0.1);
    expect(r.reason).toContain(`Melanopic DER ≤ 0.1 (best ${best.toFixed(3)})`);
    // common practice: the best achievable is the lowest over every mix tried, so no candidate is lower
    for (const c of r.candidates) expect(melDer(c)).toBeGreaterThanOrEqual(best - 1e-9);
  });

  it('refuses a floor above its ceiling and an unknown objective', () => {
    // common practice: contradictory limits are refused with a reason
    const f = floorsSchema.safeParse({ melDerMin: 0.6, melDerMax: 0.5 });
    expect(f.success).toBe(false);
    expect(f.error?.issues[0].message).toContain('ceiling');
    expect(floorsSchema.safeParse({ melDerMax: 0 }).success).toBe(false);
    const p = solveProblemSchema.safeParse({ components: {}, target: at3000, objective: 'minMelanopic' });
    expect(p.success).toBe(false);
  });
});
