/** The parts list filtered, sorted and paged on the server, and the plot's sample of a large lot. Parts invented. */
import { describe, expect, it } from 'vitest';
import { partsQuerySchema, queryRect, selectParts } from '../../../src/lib/measurements/parts-query';
import { plotSample } from '../../../src/lib/measurements/plotModel';

const part = (i: number) => ({
  label: `P-${i}`,
  metrics: { x: 0.43 + i * 0.0001, y: 0.4 + (i % 10) * 0.0001, cct: 3000 - i, ra: i % 7 === 0 ? null : 80 + (i % 20) },
  verdict: { pass: i % 4 !== 0, ansiBin: i % 5 === 0 ? null : 3000, offset: { steps: (i % 9) * 0.5 } }
});
const parts = Array.from({ length: 250 }, (_, i) => part(i + 1));
const q = (raw: Record<string, string>) => partsQuerySchema.parse(raw);

describe('selectParts', () => {
  it('pages in upload order by default (100 a page), the last page short', () => {
    const first = selectParts(parts, q({}));
    expect(first).toMatchObject({ matched: 250, total: 250, page: 1, pages: 3, pageSize: 100 });
    expect(first.items[0].label).toBe('P-1');
    const last = selectParts(parts, q({ page: '3' }));
    expect(last.items).toHaveLength(50);
    expect(selectParts(parts, q({ page: '9' })).page).toBe(3); // past the end: the last page
  });

  it('filters by verdict, bin, steps and a rectangle given in either order', () => {
    expect(selectParts(parts, q({ verdict: 'fail' })).matched).toBe(62); // every 4th of 250
    expect(selectParts(parts, q({ bin: 'none' })).matched).toBe(50);
    expect(selectParts(parts, q({ bin: '3000', verdict: 'pass' })).items.every((p) => p.verdict.ansiBin === 3000 && p.verdict.pass)).toBe(
      true
    );
    const steps = selectParts(parts, q({ stepsMin: '1', stepsMax: '2', pageSize: '500' }));
    expect(steps.items.every((p) => p.verdict.offset.steps >= 1 && p.verdict.offset.steps <= 2)).toBe(true);
    const a = selectParts(parts, q({ x0: '0.4310', x1: '0.4320', y0: '0.4000', y1: '0.4004' }));
    const b = selectParts(parts, q({ x0: '0.4320', x1: '0.4310', y0: '0.4004', y1: '0.4000' }));
    expect(a.matched).toBeGreaterThan(0);
    expect(b.items).toEqual(a.items);
  });

  it('sorts by steps, CCT, Ra (missing last when descending) and label with numbers in order', () => {
    const bySteps = selectParts(parts, q({ sort: 'steps', dir: 'desc', pageSize: '500' })).items.map((p) => p.verdict.offset.steps);
    expect(bySteps).toEqual([...bySteps].sort((x, y) => y - x));
    expect(
      selectParts(parts, q({ sort: 'label' }))
        .items.slice(0, 3)
        .map((p) => p.label)
    ).toEqual(['P-1', 'P-2', 'P-3']);
    const byRa = selectParts(parts, q({ sort: 'ra', dir: 'desc', pageSize: '500' })).items;
    expect(byRa[0].metrics.ra).toBe(99);
    expect(byRa.at(-1)!.metrics.ra).toBeNull();
  });

  it('refuses a bad filter by name', () => {
    expect(partsQuerySchema.safeParse({ stepsMin: 'abc' }).error?.issues[0].message).toBe('steps from: "abc" is not a number');
    expect(partsQuerySchema.safeParse({ pageSize: '5000' }).error?.issues[0].message).toBe('pageSize: 10–500');
    expect(partsQuerySchema.safeParse({ bin: 'warm' }).error?.issues[0].message).toBe('bin: "warm" is not an ANSI bin\'s nominal CCT');
  });
});

describe('plotSample', () => {
  it('keeps a small lot whole, and draws every failing part then an even sample of the passing ones', () => {
    const small = Array.from({ length: 10 }, (_, i) => ({ pass: i % 2 === 0, i }));
    expect(plotSample(small, 100)).toHaveLength(10);
    const big = Array.from({ length: 10_000 }, (_, i) => ({ pass: i % 10 !== 0, i }));
    const s = plotSample(big, 2000);
    expect(s).toHaveLength(2000);
    expect(s.filter((p) => !p.pass)).toHaveLength(1000);
    const passing = s.filter((p) => p.pass).map((p) => p.i);
    expect(passing[0]).toBe(1);
    expect(passing.at(-1)!).toBeGreaterThan(9900); // spread over the whole run
  });
});

describe('queryRect', () => {
  it('is the rectangle when all four sides are given, else none', () => {
    expect(queryRect(partsQuerySchema.parse({ x0: '0.43', x1: '0.44', y0: '0.40', y1: '0.41' }))).toEqual({
      x0: 0.43,
      x1: 0.44,
      y0: 0.4,
      y1: 0.41
    });
    expect(queryRect(partsQuerySchema.parse({ x0: '0.43', x1: '0.44' }))).toBeNull();
  });
});
