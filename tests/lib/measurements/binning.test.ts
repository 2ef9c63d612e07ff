import { describe, expect, it } from 'vitest';
import { judgePart, qualityTarget, type Acceptance } from '../../../src/lib/measurements/index';
import { cctDuvToXy } from '../../../src/lib/spectral/index';
import { metricsAt } from './support';

// Binning of measured parts against ANSI C78.377.
// Centre and corner points (CIE 1931 x,y): ANSI C78.377-2015 Table 1 as given in a public
// transcription (2700–6500 K; matches the 2008 edition and a US label-program table to ±0.0002).
// Target CCT ± tolerance and Duv target ± 0.006: ANSI C78.377-2017 Table 1 (transcription).
type P = [number, number];
const ansi2015: { nominal: number; centre: P; corners: [P, P, P, P] }[] = [
  {
    nominal: 2700,
    centre: [0.4578, 0.4101],
    corners: [
      [0.4813, 0.4319],
      [0.4562, 0.426],
      [0.4373, 0.3893],
      [0.4593, 0.3944]
    ]
  },
  {
    nominal: 3000,
    centre: [0.4339, 0.4033],
    corners: [
      [0.4562, 0.426],
      [0.4303, 0.4173],
      [0.415, 0.3821],
      [0.4373, 0.3893]
    ]
  },
  {
    nominal: 3500,
    centre: [0.4078, 0.393],
    corners: [
      [0.4303, 0.4173],
      [0.4003, 0.4035],
      [0.3895, 0.3709],
      [0.415, 0.3821]
    ]
  },
  {
    nominal: 4000,
    centre: [0.3818, 0.3797],
    corners: [
      [0.4003, 0.4035],
      [0.3737, 0.388],
      [0.3671, 0.3583],
      [0.3895, 0.3709]
    ]
  },
  {
    nominal: 4500,
    centre: [0.3613, 0.367],
    corners: [
      [0.3737, 0.3882],
      [0.355, 0.3754],
      [0.3514, 0.3482],
      [0.3672, 0.3585]
    ]
  },
  {
    nominal: 5000,
    centre: [0.3446, 0.3551],
    corners: [
      [0.355, 0.3753],
      [0.3375, 0.3619],
      [0.3366, 0.3373],
      [0.3515, 0.3481]
    ]
  },
  {
    nominal: 5700,
    centre: [0.3287, 0.3425],
    corners: [
      [0.3375, 0.3619],
      [0.3205, 0.3476],
      [0.3221, 0.3256],
      [0.3366, 0.3374]
    ]
  },
  {
    nominal: 6500,
    centre: [0.3123, 0.3283],
    corners: [
      [0.3205, 0.3477],
      [0.3026, 0.3311],
      [0.3067, 0.3119],
      [0.3221, 0.3255]
    ]
  }
];
// ANSI C78.377-2017 Table 1: nominal, target CCT, CCT tolerance, target Duv (tolerance ±0.006).
const table1: [number, number, number, number][] = [
  [2700, 2725, 145, 0.0],
  [3000, 3045, 175, 0.0001],
  [3500, 3465, 245, 0.0005],
  [4000, 3985, 275, 0.001],
  [4500, 4503, 243, 0.0015],
  [5000, 5029, 283, 0.002],
  [5700, 5667, 355, 0.0025],
  [6500, 6532, 510, 0.0031]
];
const NEXT: Record<number, number | null> = {
  2700: 3000,
  3000: 3500,
  3500: 4000,
  4000: 4500,
  4500: 5000,
  5000: 5700,
  5700: 6500,
  6500: null
};

const accept: Acceptance = { tolerance: { kind: 'sdcm', steps: 20 }, floors: {}, requireTargetBin: true };
const verdictAt = (nominal: number, [x, y]: P) =>
  judgePart(metricsAt(x, y), qualityTarget({ kind: 'ansiBin', nominalCct: nominal }), accept);

describe('ANSI C78.377-2015 centre points fall in their own bin', () => {
  it.each(ansi2015)('$nominal K centre', ({ nominal, centre }) => {
    const v = verdictAt(nominal, centre);
    expect(v.ansiBin).toBe(nominal);
    expect(v.inTargetBin).toBe(true);
    expect(v.failures).toEqual([]);
  });
});

describe('ANSI C78.377-2017 Table 1 tolerances: CCT ± ΔT and Duv target ± 0.006', () => {
  // Points are placed by CCT/Duv (inverse of Ohno 2014 through the core); 15 K and 0.0005 Duv margins
  // keep them clear of the straight-edge approximation of the curved band (≤ 0.0002 in x,y).
  it.each(table1)('%i K: inside just within each tolerance, outside just beyond', (nominal, cct, tol, duv) => {
    for (const inside of [
      cctDuvToXy(cct - tol + 15, duv),
      cctDuvToXy(cct + tol - 15, duv),
      cctDuvToXy(cct, duv + 0.0055),
      cctDuvToXy(cct, duv - 0.0055)
    ]) {
      expect(verdictAt(nominal, inside).ansiBin).toBe(nominal);
    }
    for (const outside of [cctDuvToXy(cct, duv + 0.0065), cctDuvToXy(cct, duv - 0.0065)]) {
      const v = verdictAt(nominal, outside);
      expect(v.ansiBin).toBeNull();
      expect(v.inTargetBin).toBe(false);
      expect(v.failures.map((f) => f.code)).toEqual(['bin']);
      expect(v.failures[0].message).toBe(`outside the ${nominal} K bin (in no ANSI bin)`);
    }
    // Beyond the high-CCT limit the point lies in the next nominal bin (bins share edges), or none after 6500 K.
    expect(verdictAt(nominal, cctDuvToXy(cct + tol + 15, duv)).ansiBin).toBe(NEXT[nominal]);
  });
});

describe('points just outside the published quadrangle edges (ANSI C78.377-2015 corners)', () => {
  // From the midpoint of each published edge, step 0.0006 in x,y away from / toward the published centre:
  // larger than the ±0.0002 agreement of the transcriptions, so the side is unambiguous.
  const STEP = 0.0006;
  it.each(ansi2015)('$nominal K: each edge', ({ nominal, centre, corners }) => {
    for (let i = 0; i < 4; i++) {
      const [x0, y0] = corners[i];
      const [x1, y1] = corners[(i + 1) % 4];
      const mx = (x0 + x1) / 2;
      const my = (y0 + y1) / 2;
      const d = Math.hypot(mx - centre[0], my - centre[1]);
      const out: P = [mx + ((mx - centre[0]) / d) * STEP, my + ((my - centre[1]) / d) * STEP];
      const inn: P = [mx - ((mx - centre[0]) / d) * STEP, my - ((my - centre[1]) / d) * STEP];
      expect(verdictAt(nominal, inn).inTargetBin).toBe(true);
      const vOut = verdictAt(nominal, out);
      expect(vOut.inTargetBin).toBe(false);
      expect(vOut.ansiBin).not.toBe(nominal);
      // Edge order: +Duv, high-CCT, −Duv, low-CCT. Across the CCT edges the neighbour bin takes the point.
      if (i === 1) expect(vOut.ansiBin).toBe(NEXT[nominal]);
      if (i === 0 || i === 2) expect(vOut.ansiBin).toBeNull();
    }
  });
});

describe('targets without a bin rule', () => {
  it('a CCT/Duv target inside a Table 1 quadrangle takes that bin; the bin is only required when asked', () => {
    const t = qualityTarget({ kind: 'cctDuv', cct: 4000, duv: 0.001 });
    expect(t.ansiBin?.nominalCct).toBe(4000);
    const [x, y] = cctDuvToXy(3985, 0.0075); // above the 4000 K band (Duv target 0.001 + 0.006, Table 1)
    const v = judgePart(metricsAt(x, y), t, { ...accept, requireTargetBin: false });
    expect(v.inTargetBin).toBe(false);
    expect(v.pass).toBe(true);
  });
  it('a target far off the locus has no bin and reports none', () => {
    const t = qualityTarget({ kind: 'cctDuv', cct: 3000, duv: 0.02 });
    expect(t.ansiBin).toBeNull();
    expect(judgePart(metricsAt(t.x, t.y), t, accept).inTargetBin).toBeNull();
  });
});
