import { describe, expect, it } from 'vitest';
import { bindingFloors, needsTm30, objectiveValue, violatedFloors, violation, type LoopMetrics } from '../../src/lib/aim/index';

// "90 CRI" = Ra ≥ 90 and R9 ≥ 50 [common practice]; TM-30 Rg kept within 92–110 [common practice].
// Worked by hand: Ra 88.4 is 1.6 short of 90, R9 52 meets 50, Rg 111 is 1 over 110; binding: |88.4 − 87| = 1.4 and
// |300 − 301| = 1 are beyond 0.5, |52 − 52.4| = 0.4 is within.
const m: LoopMetrics = { ra: 88.4, r9: 52, ler: 300, melDer: 0.5, rf: 86, rg: 111, costPer1000Lm: 4 };
const floors = { raMin: 90, r9Min: 50, rgMin: 92, rgMax: 110 };

describe('floors of a blend', () => {
  it('violation sums the shortfalls: 1.6 + 1 = 2.6', () => expect(violation(floors, m)).toBeCloseTo(2.6, 12));
  it('violated floors are named with their values', () => expect(violatedFloors(floors, m)).toEqual(['Ra 88.4 < 90', 'Rg 111.0 > 110']));
  it('a floor binds within half a point of its limit', () => {
    expect(bindingFloors({ raMin: 87, r9Min: 52.4, lerMin: 301 }, m)).toEqual(['r9Min']);
  });
  it('TM-30 is needed only for Rf/Rg floors or the Rf objective', () => {
    expect(needsTm30({ raMin: 90 }, 'maxLer')).toBe(false);
    expect(needsTm30({ rgMax: 110 }, 'maxLer')).toBe(true);
    expect(needsTm30({}, 'maxRf')).toBe(true);
  });
  it('objectives are values to maximise (cost is negated)', () => {
    expect(objectiveValue('maxLer', m)).toBe(300);
    expect(objectiveValue('minCost', m)).toBe(-4);
    expect(objectiveValue('maxRf', { ...m, rf: null })).toBe(-Infinity);
  });
});
