/**
 * CIECAM02 colour appearance model and the CAM02-UCS uniform colour space, as used by
 * CIE 224:2017 §4 [CIE224-2017] and ANSI/IES TM-30-20 [IES-TM30-20].
 * CIECAM02: CIE 159:2004 [CIE159-2004] (Moroney et al. 2002), steps numbered as in CIE 159 §3;
 * CAM02-UCS: Luo, Cui & Li, Color Res. Appl. 31:320–330, 2006 [Luo2006]:
 *   J' = 1.7 J / (1 + 0.007 J),  M' = ln(1 + 0.0228 M) / 0.0228,  a' = M' cos h, b' = M' sin h.
 * Viewing conditions fixed by CIE 224: L_A = 100 cd/m², Y_b = 20, average surround
 * (F = 1.0, c = 0.69, N_c = 1.0), complete adaptation D = 1.
 * Input XYZ on the scale of the white (Y_w = 100). Output J', a', b' (dimensionless).
 * Computed without powers or trigonometry per sample: x^p as exp(p·ln x); cos h and sin h as
 * a/√(a²+b²) and b/√(a²+b²); e_t from cos(h + 2) = cos h·cos 2 − sin h·sin 2; √(J/100)·t^0.9
 * folded into one exponential. Equal to the equations as written within rounding (~1e-15).
 */
const L_A = 100;
const Y_B = 20;
const C_SURROUND = 0.69;
const N_C = 1.0;

// CIE 159 eq. 7: M_CAT02; eq. 13: Hunt–Pointer–Estévez M_H.
const M_CAT02 = [0.7328, 0.4296, -0.1624, -0.7036, 1.6975, 0.0061, 0.003, 0.0136, 0.9834];
const M_HPE = [0.38971, 0.68898, -0.07868, -0.22981, 1.1834, 0.04641, 0, 0, 1];

function invert3(m: number[]): number[] {
  const [a, b, c, d, e, f, g, h, i] = m;
  const A = e * i - f * h;
  const B = -(d * i - f * g);
  const C = d * h - e * g;
  const det = a * A + b * B + c * C;
  return [
    A / det,
    -(b * i - c * h) / det,
    (b * f - c * e) / det,
    B / det,
    (a * i - c * g) / det,
    -(a * f - c * d) / det,
    C / det,
    -(a * h - b * g) / det,
    (a * e - b * d) / det
  ];
}

function mul3(a: number[], b: number[]): number[] {
  const out = new Array<number>(9);
  for (let r = 0; r < 3; r++)
    for (let c = 0; c < 3; c++) out[3 * r + c] = a[3 * r] * b[c] + a[3 * r + 1] * b[3 + c] + a[3 * r + 2] * b[6 + c];
  return out;
}

const M_HPE_CAT_INV = mul3(M_HPE, invert3(M_CAT02));

// CIE 159 eq. 8–12: luminance-level adaptation factor and induction factors.
const K = 1 / (5 * L_A + 1);
const F_L = 0.2 * K ** 4 * (5 * L_A) + 0.1 * (1 - K ** 4) ** 2 * Math.cbrt(5 * L_A);
const F_L_025 = F_L ** 0.25;
const F_L_100 = F_L / 100;
const COS_2 = Math.cos(2);
const SIN_2 = Math.sin(2);
const T_FACTOR = (50000 / 13) * N_C;

/** CIE 159 eq. 14: post-adaptation non-linear compression, (F_L·|x|/100)^0.42 as an exponential. */
function compress(x: number): number {
  const p = Math.exp(0.42 * Math.log(F_L_100 * Math.abs(x)));
  return (Math.sign(x) * 400 * p) / (p + 27.13) + 0.1;
}

/** Constants of CIECAM02 that depend only on the adopted white (CIE 159 eq. 9–12, 19, 24). */
export interface Cam02White {
  /** Y_w the constants below were set for (all but `m` depend on Y_w alone). */
  yw: number;
  /** XYZ → adapted Hunt–Pointer–Estévez R'G'B' (CAT02, D = 1, M_H · M_CAT02⁻¹), row-major. */
  m: Float64Array;
  /** N_bb = N_cb (eq. 11). */
  nbb: number;
  /** c·z, the exponent of eq. 20. */
  cz: number;
  /** Achromatic response of the white A_w (eq. 19). */
  aw: number;
  /** N_bb / A_w, so that A / A_w costs no division. */
  nbbOverAw: number;
  /** (1.64 − 0.29^n)^0.73 · F_L^0.25: eq. 24 and 25 without t and J. */
  mFactor: number;
}

export function newCam02White(): Cam02White {
  return { yw: NaN, m: new Float64Array(9), nbb: 0, cz: 0, aw: 0, nbbOverAw: 0, mFactor: 0 };
}

/** Fills `v` with the viewing constants of an adopted white (X_w, Y_w, Z_w); allocates nothing. */
export function setCam02White(white: ArrayLike<number>, v: Cam02White): Cam02White {
  const xw = white[0];
  const yw = white[1];
  const zw = white[2];
  if (yw !== v.yw) setLuminanceConstants(yw, v);
  // eq. 9 with D = 1: R_c = (Y_w / R_w) R; fold CAT02, adaptation and HPE into one matrix.
  const d0 = yw / (M_CAT02[0] * xw + M_CAT02[1] * yw + M_CAT02[2] * zw);
  const d1 = yw / (M_CAT02[3] * xw + M_CAT02[4] * yw + M_CAT02[5] * zw);
  const d2 = yw / (M_CAT02[6] * xw + M_CAT02[7] * yw + M_CAT02[8] * zw);
  const m = v.m;
  for (let r = 0; r < 3; r++) {
    const h0 = M_HPE_CAT_INV[3 * r];
    const h1 = M_HPE_CAT_INV[3 * r + 1];
    const h2 = M_HPE_CAT_INV[3 * r + 2];
    for (let c = 0; c < 3; c++) m[3 * r + c] = h0 * (d0 * M_CAT02[c]) + h1 * (d1 * M_CAT02[3 + c]) + h2 * (d2 * M_CAT02[6 + c]);
  }
  return v;
}

/** CIE 159 eq. 10–12, 19 and the constant part of eq. 24–25: they depend on Y_w only (D = 1). */
function setLuminanceConstants(yw: number, v: Cam02White): void {
  v.yw = yw;
  const n = Y_B / yw; // eq. 10
  v.nbb = 0.725 * (1 / n) ** 0.2; // eq. 11: N_bb = N_cb
  v.cz = C_SURROUND * (1.48 + Math.sqrt(n)); // eq. 12
  v.mFactor = (1.64 - 0.29 ** n) ** 0.73 * F_L_025;
  // With D = 1 the adapted white is R_c = G_c = B_c = Y_w (eq. 9), so R'_w = M_H · M_CAT02⁻¹ · (Y_w, Y_w, Y_w).
  const h = M_HPE_CAT_INV;
  const ra = compress(yw * (h[0] + h[1] + h[2]));
  const ga = compress(yw * (h[3] + h[4] + h[5]));
  const ba = compress(yw * (h[6] + h[7] + h[8]));
  v.aw = (2 * ra + ga + ba / 20 - 0.305) * v.nbb; // eq. 19
  v.nbbOverAw = v.nbb / v.aw;
}

/**
 * CAM02-UCS J', a', b' of two colours under the white of `v`, written to out[o1..o1+2] and out[o2..o2+2].
 * Two at a time, step by step, so that the processor overlaps their eleven logarithms and exponentials each
 * (about a fifth faster than one colour at a time); one colour is the same colour twice.
 */
export function cam02UcsPair(
  v: Cam02White,
  X1: number,
  Y1: number,
  Z1: number,
  X2: number,
  Y2: number,
  Z2: number,
  out: Float64Array,
  o1: number,
  o2: number
): void {
  const m = v.m;
  const rp1 = m[0] * X1 + m[1] * Y1 + m[2] * Z1;
  const gp1 = m[3] * X1 + m[4] * Y1 + m[5] * Z1;
  const bp1 = m[6] * X1 + m[7] * Y1 + m[8] * Z1;
  const rp2 = m[0] * X2 + m[1] * Y2 + m[2] * Z2;
  const gp2 = m[3] * X2 + m[4] * Y2 + m[5] * Z2;
  const bp2 = m[6] * X2 + m[7] * Y2 + m[8] * Z2;
  // eq. 14 as in `compress`, written out: (F_L·|x|/100)^0.42 = exp(0.42·ln(F_L·|x|/100)).
  const pr1 = Math.exp(0.42 * Math.log(F_L_100 * Math.abs(rp1)));
  const pg1 = Math.exp(0.42 * Math.log(F_L_100 * Math.abs(gp1)));
  const pb1 = Math.exp(0.42 * Math.log(F_L_100 * Math.abs(bp1)));
  const pr2 = Math.exp(0.42 * Math.log(F_L_100 * Math.abs(rp2)));
  const pg2 = Math.exp(0.42 * Math.log(F_L_100 * Math.abs(gp2)));
  const pb2 = Math.exp(0.42 * Math.log(F_L_100 * Math.abs(bp2)));
  const ra1 = (Math.sign(rp1) * 400 * pr1) / (pr1 + 27.13) + 0.1;
  const ga1 = (Math.sign(gp1) * 400 * pg1) / (pg1 + 27.13) + 0.1;
  const ba1 = (Math.sign(bp1) * 400 * pb1) / (pb1 + 27.13) + 0.1;
  const ra2 = (Math.sign(rp2) * 400 * pr2) / (pr2 + 27.13) + 0.1;
  const ga2 = (Math.sign(gp2) * 400 * pg2) / (pg2 + 27.13) + 0.1;
  const ba2 = (Math.sign(bp2) * 400 * pb2) / (pb2 + 27.13) + 0.1;
  // eq. 15: opponent dimensions a, b; their length √(a² + b²).
  const a1 = ra1 - ga1 * (12 / 11) + ba1 * (1 / 11);
  const b1 = (ra1 + ga1 - 2 * ba1) * (1 / 9);
  const a2 = ra2 - ga2 * (12 / 11) + ba2 * (1 / 11);
  const b2 = (ra2 + ga2 - 2 * ba2) * (1 / 9);
  const ab1 = Math.sqrt(a1 * a1 + b1 * b1);
  const ab2 = Math.sqrt(a2 * a2 + b2 * b2);
  // eq. 16: h = atan2(b, a) (0 for a = b = 0), kept as cos h and sin h.
  const inv1 = ab1 > 0 ? 1 / ab1 : 0;
  const inv2 = ab2 > 0 ? 1 / ab2 : 0;
  const cos1 = ab1 > 0 ? a1 * inv1 : 1;
  const cos2 = ab2 > 0 ? a2 * inv2 : 1;
  const sin1 = b1 * inv1;
  const sin2 = b2 * inv2;
  // eq. 18: e_t = ¼(cos(h + 2) + 3.8); eq. 23: t.
  const t1 = (T_FACTOR * v.nbb * 0.25 * (cos1 * COS_2 - sin1 * SIN_2 + 3.8) * ab1) / (ra1 + ga1 + (21 / 20) * ba1);
  const t2 = (T_FACTOR * v.nbb * 0.25 * (cos2 * COS_2 - sin2 * SIN_2 + 3.8) * ab2) / (ra2 + ga2 + (21 / 20) * ba2);
  // eq. 19: ln(A / A_w); eq. 20: J = 100 (A / A_w)^(cz); eq. 24–25: M = t^0.9 √(J/100) · (1.64 − 0.29^n)^0.73 · F_L^0.25.
  const lnA1 = Math.log((2 * ra1 + ga1 + ba1 * (1 / 20) - 0.305) * v.nbbOverAw);
  const lnA2 = Math.log((2 * ra2 + ga2 + ba2 * (1 / 20) - 0.305) * v.nbbOverAw);
  const J1 = 100 * Math.exp(v.cz * lnA1);
  const J2 = 100 * Math.exp(v.cz * lnA2);
  const M1 = v.mFactor * Math.exp(0.9 * Math.log(t1) + 0.5 * v.cz * lnA1);
  const M2 = v.mFactor * Math.exp(0.9 * Math.log(t2) + 0.5 * v.cz * lnA2);
  // Luo 2006 eq. 4: J' and M'; a' = M' cos h, b' = M' sin h.
  const mp1 = Math.log(1 + 0.0228 * M1) * (1 / 0.0228);
  const mp2 = Math.log(1 + 0.0228 * M2) * (1 / 0.0228);
  out[o2] = (1.7 * J2) / (1 + 0.007 * J2);
  out[o2 + 1] = mp2 * cos2;
  out[o2 + 2] = mp2 * sin2;
  out[o1] = (1.7 * J1) / (1 + 0.007 * J1);
  out[o1 + 1] = mp1 * cos1;
  out[o1 + 2] = mp1 * sin1;
}

/** CAM02-UCS J', a', b' of one colour XYZ under the white of `v`, written to out[o..o+2]. */
export function cam02UcsInto(v: Cam02White, X: number, Y: number, Z: number, out: Float64Array, o: number): void {
  cam02UcsPair(v, X, Y, Z, X, Y, Z, out, o, o);
}

/** CAM02-UCS J'a'b' of `count` colours xyz[3i..3i+2] under the white of `v`, into out[3i..3i+2]. */
export function cam02UcsSamples(v: Cam02White, xyz: Float64Array, count: number, out: Float64Array): void {
  let i = 0;
  for (; i + 1 < count; i += 2) {
    const o = 3 * i;
    cam02UcsPair(v, xyz[o], xyz[o + 1], xyz[o + 2], xyz[o + 3], xyz[o + 4], xyz[o + 5], out, o, o + 3);
  }
  if (i < count) cam02UcsInto(v, xyz[3 * i], xyz[3 * i + 1], xyz[3 * i + 2], out, 3 * i);
}

export type Jab = [number, number, number];

/** A converter XYZ → CAM02-UCS J'a'b' for one adopted white (X_w, Y_w, Z_w). */
export function createCam02Ucs(white: ArrayLike<number>): (X: number, Y: number, Z: number, out?: Float64Array, o?: number) => Jab | null {
  const v = setCam02White(white, newCam02White());
  const jab = new Float64Array(3);
  return (X, Y, Z, out, o = 0) => {
    if (out) {
      cam02UcsInto(v, X, Y, Z, out, o);
      return null;
    }
    cam02UcsInto(v, X, Y, Z, jab, 0);
    return [jab[0], jab[1], jab[2]];
  };
}
