import { describe, expect, it } from 'vitest';
import { compareMetrics, compareRatios, compareSettings } from '../../../src/lib/formulations/compare';
import type { RevisionContent } from '../../../src/lib/recipe';
import type { RevisionPrediction } from '../../../src/lib/formulations/prediction';

const ref = (materialId: number, code: string) => ({ materialId, code, name: `${code} test` });
const base: RevisionContent = {
  contentVersion: 1,
  pump: ref(1, 'B-450'),
  phosphors: [
    { ...ref(2, 'GL-530'), opticalFraction: 0.3, wtPct: 9 },
    { ...ref(3, 'RD-625'), opticalFraction: 0.6, wtPct: 8 }
  ],
  pumpLeakFraction: 0.1,
  loading: null,
  silicone: { siliconeSystemId: 1, name: 'S', ratioA: 1, ratioB: 1, potLifeMin: 240, cure: 'c', densityGPerCm3: 1.1 },
  target: { kind: 'cctDuv', cct: 3000, duv: 0 },
  tolerance: { kind: 'sdcm', steps: 3 },
  floors: { raMin: 90 },
  notes: ''
};
const p = (over: Partial<RevisionPrediction>): RevisionPrediction => ({
  x: 0.4369,
  y: 0.4041,
  uPrime: 0.25,
  vPrime: 0.52,
  cct: 3000,
  duv: 0,
  ra: 92,
  r9: 50,
  ri: [],
  rf: 91,
  rg: 99,
  lerLmPerW: 318,
  peakNm: 617,
  ansiBin: 3000,
  target: { x: 0.4369, y: 0.4041, cct: 3000, duv: 0, label: '' },
  deltaUvPrime: 0,
  sdcm: 0.1,
  withinTolerance: true,
  floorsMissed: [],
  spd: { startNm: 360, stepNm: 1, values: [] },
  ...over
});

describe('comparing two revisions (hand-worked)', () => {
  it('lines up phosphors by code, flags changed and missing ones, Δ = B − A', () => {
    const b: RevisionContent = {
      ...base,
      pumpLeakFraction: 0.1,
      phosphors: [
        { ...ref(2, 'GL-530'), opticalFraction: 0.25, wtPct: 9 },
        { ...ref(4, 'NR-631'), opticalFraction: 0.65, wtPct: null }
      ]
    };
    const rows = compareRatios(base, b);
    expect(rows.map((r) => [r.code, r.changed])).toEqual([
      ['B-450 leak', false],
      ['GL-530', true],
      ['RD-625', true],
      ['NR-631', true]
    ]);
    expect(rows[1].deltaOptical).toBeCloseTo(-0.05, 12);
    expect(rows[2]).toMatchObject({ b: null, deltaOptical: -0.6 });
    expect(rows[3]).toMatchObject({ a: null, deltaOptical: 0.65 });
  });

  it('flags a metric only when it differs at the shown resolution', () => {
    const rows = compareMetrics(p({}), p({ ra: 92.04, r9: 52.3, cct: 3000.4 }));
    const byLabel = Object.fromEntries(rows.map((r) => [r.label, r]));
    expect(byLabel.Ra.changed).toBe(false); // 92.0 vs 92.0 at one decimal
    expect(byLabel.R9).toMatchObject({ changed: true });
    expect(byLabel.R9.delta).toBeCloseTo(2.3, 12);
    expect(byLabel.CCT.changed).toBe(false); // 3000 vs 3000 K at whole kelvin
    expect(compareMetrics(p({ ra: null }), p({})).find((r) => r.label === 'Ra')).toMatchObject({ changed: true, delta: null });
  });

  it('compares settings as written on the ticket', () => {
    const rows = compareSettings(base, { ...base, floors: { raMin: 90, r9Min: 50 }, notes: 'more red' });
    expect(rows.filter((r) => r.changed).map((r) => [r.label, r.b])).toEqual([
      ['Floors', 'Ra ≥ 90, R9 ≥ 50'],
      ['Notes', 'more red']
    ]);
  });

  it('shows a change of the cited package model (content version 2)', () => {
    const rows = compareSettings(base, { ...base, packageModelRef: { id: 4, version: 3 } });
    expect(rows.filter((r) => r.changed).map((r) => [r.label, r.a, r.b])).toEqual([['Package model', 'none', 'model 4 v3']]);
  });
});
