import { describe, expect, it } from 'vitest';
import {
  CMF_1964_10DEG,
  createCam02Ucs,
  planckSpd,
  resampleToGrid,
  spdToXyz,
  tableToGrid,
  tm30Cie224,
  tm30ReferenceSpd,
  uvToCctOhno2014,
  xyzToUv,
  type Tm30Result
} from '../../src/lib/spectral/index';
import { TM30_CES99 } from '../../src/lib/spectral/data/tm30-ces99';
import { CIE_ILLUMINANTS_F } from '../../src/lib/spectral/data/cie-illuminants';
import { bandsSpd } from './helpers';

// A plain second implementation of CIE 224:2017 / TM-30-20, written straight from the equations:
// CES linearly interpolated to 1 nm and summed with the CIE 1964 10° CMF over 380–780 nm,
// CIECAM02 as in CIE 159:2004 §3 (powers, atan2, cos and sin as printed), CAM02-UCS (Luo et al. 2006),
// ΔE' and Rf (CIE 224 eq. 8–9), 16 hue bins, Rg and the bin indices (TM-30-20 §4.4).
// The product computes the same quantities by a faster route (knot weights, exponentials, no trig);
// the two must agree to rounding (common practice: check an optimised path against a plain one).

const CES_1NM = TM30_CES99.values.map((v) => tableToGridPlain(v, TM30_CES99.startNm, TM30_CES99.stepNm));

function tableToGridPlain(values: readonly number[], startNm: number, stepNm: number): Float64Array {
  const out = new Float64Array(471);
  for (let i = 0; i < 471; i++) {
    const pos = (360 + i - startNm) / stepNm;
    if (pos < 0 || pos > values.length - 1) continue;
    const k = Math.min(Math.floor(pos), values.length - 2);
    out[i] = values[k] + (values[k + 1] - values[k]) * (pos - k);
  }
  return out;
}

function xyz10(spd: Float64Array, r: Float64Array | null): number[] {
  const { xBar, yBar, zBar } = CMF_1964_10DEG;
  let X = 0;
  let Y = 0;
  let Z = 0;
  for (let i = 20; i <= 420; i++) {
    const w = spd[i] * (r ? r[i] : 1);
    X += w * xBar[i];
    Y += w * yBar[i];
    Z += w * zBar[i];
  }
  return [X, Y, Z];
}

const M_CAT02 = [
  [0.7328, 0.4296, -0.1624],
  [-0.7036, 1.6975, 0.0061],
  [0.003, 0.0136, 0.9834]
];
const M_HPE = [
  [0.38971, 0.68898, -0.07868],
  [-0.22981, 1.1834, 0.04641],
  [0, 0, 1]
];
const apply = (m: number[][], v: number[]): number[] => m.map((row) => row[0] * v[0] + row[1] * v[1] + row[2] * v[2]);

/** CIE 159:2004 §3 forward model with L_A = 100, Y_b = 20, average surround, D = 1; then CAM02-UCS. */
function cam02ucsPlain(white: number[]): (xyz: number[]) => number[] {
  const LA = 100;
  const k = 1 / (5 * LA + 1);
  const FL = 0.2 * Math.pow(k, 4) * 5 * LA + 0.1 * Math.pow(1 - Math.pow(k, 4), 2) * Math.pow(5 * LA, 1 / 3);
  const n = 20 / white[1];
  const nbb = 0.725 * Math.pow(1 / n, 0.2);
  const z = 1.48 + Math.sqrt(n);
  const rgbW = apply(M_CAT02, white);
  // M_CAT02⁻¹ of CIE 159 is printed to 6 decimals; invert exactly instead so D = 1 maps the white to itself.
  const inv = invert(M_CAT02);
  const adapt = (xyz: number[]): number[] => {
    const rgb = apply(M_CAT02, xyz);
    const rgbC = rgb.map((v, i) => (white[1] / rgbW[i]) * v);
    const rgbP = apply(M_HPE, apply(inv, rgbC));
    return rgbP.map((v) => {
      const p = Math.pow((FL * Math.abs(v)) / 100, 0.42);
      return (Math.sign(v) * 400 * p) / (27.13 + p) + 0.1;
    });
  };
  const [rw, gw, bw] = adapt(white);
  const aw = (2 * rw + gw + bw / 20 - 0.305) * nbb;
  return (xyz) => {
    const [ra, ga, ba] = adapt(xyz);
    const a = ra - (12 * ga) / 11 + ba / 11;
    const b = (ra + ga - 2 * ba) / 9;
    const h = Math.atan2(b, a);
    const et = 0.25 * (Math.cos(h + 2) + 3.8);
    const A = (2 * ra + ga + ba / 20 - 0.305) * nbb;
    const J = 100 * Math.pow(A / aw, 0.69 * z);
    const t = ((50000 / 13) * nbb * et * Math.sqrt(a * a + b * b)) / (ra + ga + (21 / 20) * ba);
    const C = Math.pow(t, 0.9) * Math.sqrt(J / 100) * Math.pow(1.64 - Math.pow(0.29, n), 0.73);
    const M = C * Math.pow(FL, 0.25);
    const Mp = Math.log(1 + 0.0228 * M) / 0.0228;
    return [(1.7 * J) / (1 + 0.007 * J), Mp * Math.cos(h), Mp * Math.sin(h)];
  };
}

function invert(m: number[][]): number[][] {
  const [[a, b, c], [d, e, f], [g, h, i]] = m;
  const det = a * (e * i - f * h) - b * (d * i - f * g) + c * (d * h - e * g);
  return [
    [(e * i - f * h) / det, (c * h - b * i) / det, (b * f - c * e) / det],
    [(f * g - d * i) / det, (a * i - c * g) / det, (c * d - a * f) / det],
    [(d * h - e * g) / det, (b * g - a * h) / det, (a * e - b * d) / det]
  ];
}

const rfOf = (dE: number): number => 10 * Math.log(Math.exp((100 - 6.73 * dE) / 10) + 1);

function tm30Plain(spd: Float64Array, cctK: number): Tm30Result {
  const ref = tm30ReferenceSpd(cctK);
  const wt = xyz10(spd, null);
  const wr = xyz10(ref, null);
  const kt = 100 / wt[1];
  const kr = 100 / wr[1];
  const camT = cam02ucsPlain(wt.map((v) => v * kt));
  const camR = cam02ucsPlain(wr.map((v) => v * kr));
  const sums = Array.from({ length: 16 }, () => ({ n: 0, dE: 0, at: 0, bt: 0, ar: 0, br: 0 }));
  let total = 0;
  for (const ces of CES_1NM) {
    const jt = camT(xyz10(spd, ces).map((v) => v * kt));
    const jr = camR(xyz10(ref, ces).map((v) => v * kr));
    const dE = Math.hypot(jt[0] - jr[0], jt[1] - jr[1], jt[2] - jr[2]);
    total += dE;
    let h = Math.atan2(jr[2], jr[1]);
    if (h < 0) h += 2 * Math.PI;
    const s = sums[Math.min(Math.floor(h / (Math.PI / 8)), 15)];
    s.n++;
    s.dE += dE;
    s.at += jt[1];
    s.bt += jt[2];
    s.ar += jr[1];
    s.br += jr[2];
  }
  const bins = sums.map((s) => {
    const at = s.at / s.n;
    const bt = s.bt / s.n;
    const ar = s.ar / s.n;
    const br = s.br / s.n;
    let dh = Math.atan2(bt, at) - Math.atan2(br, ar);
    if (dh > Math.PI) dh -= 2 * Math.PI;
    if (dh <= -Math.PI) dh += 2 * Math.PI;
    return {
      rf: rfOf(s.dE / s.n),
      rcs: (Math.hypot(at, bt) - Math.hypot(ar, br)) / Math.hypot(ar, br),
      rhs: dh,
      testAB: [at, bt],
      refAB: [ar, br]
    };
  });
  const area = (pts: number[][]): number =>
    Math.abs(pts.reduce((a, p, j) => a + p[0] * pts[(j + 1) % 16][1] - pts[(j + 1) % 16][0] * p[1], 0)) / 2;
  const rg = (100 * area(bins.map((b) => b.testAB))) / area(bins.map((b) => b.refAB));
  return {
    rf: rfOf(total / CES_1NM.length),
    rg,
    bins: bins.map((b) => ({ ...b, testAB: [b.testAB[0], b.testAB[1]], refAB: [b.refAB[0], b.refAB[1]] }))
  };
}

/** Relative difference for values of magnitude ≥ 1, absolute below (rcs and rhs are near 0 for good sources). */
const differs = (a: number, b: number): number => Math.abs(a - b) / Math.max(1, Math.abs(b));

function worstDifference(a: Tm30Result, b: Tm30Result): number {
  let worst = Math.max(differs(a.rf, b.rf), differs(a.rg, b.rg));
  a.bins.forEach((bin, j) => {
    const o = b.bins[j];
    const pairs = [
      [bin.rf, o.rf],
      [bin.rcs, o.rcs],
      [bin.rhs, o.rhs],
      [bin.testAB[0], o.testAB[0]],
      [bin.testAB[1], o.testAB[1]],
      [bin.refAB[0], o.refAB[0]],
      [bin.refAB[1], o.refAB[1]]
    ];
    for (const [x, y] of pairs) worst = Math.max(worst, differs(x, y));
  });
  return worst;
}

const cctOf = (g: Float64Array): number => uvToCctOhno2014(...xyzToUv(...spdToXyz(g))).cct;
const led = (bands: [number, number, number][]): Float64Array => resampleToGrid(bandsSpd(bands));

describe('CIE 224:2017 / TM-30-20: the product agrees with a plain implementation of the equations to 1e-9', () => {
  const cases = [
    { name: 'Planckian 2700 K (Planckian reference)', input: planckSpd(2700), source: 'CIE 224 §4.3' },
    { name: 'Planckian 4500 K (blended reference)', input: planckSpd(4500), source: 'CIE 224 §4.3' },
    { name: 'CIE F2 (4230 K, blended reference)', input: tableToGrid(CIE_ILLUMINANTS_F.series.F2, 380, 5), source: 'CIE 15 Table T.6' },
    { name: 'CIE F11 (about 4000 K)', input: tableToGrid(CIE_ILLUMINANTS_F.series.F11, 380, 5), source: 'CIE 15 Table T.6' },
    { name: 'CIE F7 (daylight reference)', input: tableToGrid(CIE_ILLUMINANTS_F.series.F7, 380, 5), source: 'CIE 15 Table T.6' },
    {
      name: 'blue pump + broad phosphor, warm',
      input: led([
        [450, 20, 1],
        [560, 110, 1.4],
        [630, 80, 1.2]
      ]),
      source: 'common practice'
    },
    {
      name: 'blue pump + narrow green + red line, cool',
      input: led([
        [445, 18, 1],
        [530, 40, 1.2],
        [631, 6, 0.4]
      ]),
      source: 'common practice'
    }
  ];
  it.each(cases)('$name: Rf, Rg and every bin within 1e-9', ({ input }) => {
    const cct = cctOf(input);
    expect(worstDifference(tm30Cie224(input, cct), tm30Plain(input, cct))).toBeLessThanOrEqual(1e-9);
  });

  it('a repeated CCT and more CCTs than the product keeps at hand give the same results as a first call', () => {
    // common practice: a cache must never change a result
    const sources = cases.map((c) => c.input);
    const first = sources.map((s) => tm30Cie224(s, cctOf(s)));
    for (let round = 0; round < 2; round++) {
      sources.forEach((s, i) => expect(tm30Cie224(s, cctOf(s))).toEqual(first[i]));
    }
    const shared = cctOf(sources[0]);
    for (const s of sources) expect(worstDifference(tm30Cie224(s, shared), tm30Plain(s, shared))).toBeLessThanOrEqual(1e-9);
  });

  it('a blue pump alone (TM-30 undefined) gives NaN Rf on both routes', () => {
    // CIE 224 / TM-30-20: CIECAM02 responses go negative far from white (module header of cie224.ts)
    const pump = led([[450, 20, 1]]);
    const cct = cctOf(pump);
    expect(Number.isNaN(tm30Plain(pump, cct).rf)).toBe(Number.isNaN(tm30Cie224(pump, cct).rf));
  });
});

describe('CIE 159:2004 CIECAM02 + CAM02-UCS (Luo et al. 2006): the converter agrees with the equations as printed', () => {
  const whites = [
    { name: 'equal-energy white, Y_w = 100', white: [100, 100, 100] },
    { name: 'warm white (about 2700 K), Y_w = 100', white: [114.6, 100, 35.9] },
    { name: 'D65-like white at Y_w = 80 (other luminance constants)', white: [76.04, 80, 87.11] }
  ];
  const colours = [
    [19.31, 23.93, 10.14],
    [57.06, 43.06, 31.96],
    [3.53, 6.56, 2.14],
    [19.01, 20, 21.78],
    [60, 40, 80]
  ];
  it.each(whites)('$name: J′, a′, b′ within 1e-12', ({ white }) => {
    // common practice: an optimised form checked against the printed equations
    const fast = createCam02Ucs(white);
    const plain = cam02ucsPlain(white);
    for (const c of colours) {
      const got = fast(c[0], c[1], c[2]) ?? [NaN, NaN, NaN];
      const want = plain(c);
      for (let k = 0; k < 3; k++) expect(differs(got[k], want[k])).toBeLessThanOrEqual(1e-12);
    }
  });
});
