/**
 * CIECAM02 colour appearance model and the CAM02-UCS uniform colour space, as used by
 * CIE 224:2017 §4 [CIE224-2017] and ANSI/IES TM-30-20 [IES-TM30-20].
 * CIECAM02: CIE 159:2004 [CIE159-2004] (Moroney et al. 2002), steps numbered as in CIE 159 §3;
 * CAM02-UCS: Luo, Cui & Li, Color Res. Appl. 31:320–330, 2006 [Luo2006]:
 *   J' = 1.7 J / (1 + 0.007 J),  M' = ln(1 + 0.0228 M) / 0.0228,  a' = M' cos h, b' = M' sin h.
 * Viewing conditions fixed by CIE 224: L_A = 100 cd/m², Y_b = 20, average surround
 * (F = 1.0, c = 0.69, N_c = 1.0), complete adaptation D = 1.
 * Input XYZ on the scale of the white (Y_w = 100). Output J', a', b' (dimensionless).
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

/** CIE 159 eq. 14: post-adaptation non-linear compression. */
function compress(x: number): number {
  const p = ((F_L * Math.abs(x)) / 100) ** 0.42;
  return (Math.sign(x) * 400 * p) / (p + 27.13) + 0.1;
}

export type Jab = [number, number, number];

/** A converter XYZ → CAM02-UCS J'a'b' for one adopted white (X_w, Y_w, Z_w). */
export function createCam02Ucs(white: ArrayLike<number>): (X: number, Y: number, Z: number, out?: Float64Array, o?: number) => Jab | null {
  const yw = white[1];
  const n = Y_B / yw; // eq. 10
  const nbb = 0.725 * (1 / n) ** 0.2; // eq. 11: N_bb = N_cb
  const z = 1.48 + Math.sqrt(n); // eq. 12
  const rgbW = [0, 1, 2].map((r) => M_CAT02[3 * r] * white[0] + M_CAT02[3 * r + 1] * white[1] + M_CAT02[3 * r + 2] * white[2]);
  // eq. 9 with D = 1: R_c = (Y_w / R_w) R; fold CAT02, adaptation and HPE into one matrix.
  const diag = [yw / rgbW[0], 0, 0, 0, yw / rgbW[1], 0, 0, 0, yw / rgbW[2]];
  const m = mul3(M_HPE_CAT_INV, mul3(diag, M_CAT02));
  const cFactor = (1.64 - 0.29 ** n) ** 0.73;
  const cz = C_SURROUND * z;
  const achromatic = (ra: number, ga: number, ba: number): number => (2 * ra + ga + ba / 20 - 0.305) * nbb; // eq. 19
  const aw = achromatic(
    compress(m[0] * white[0] + m[1] * white[1] + m[2] * white[2]),
    compress(m[3] * white[0] + m[4] * white[1] + m[5] * white[2]),
    compress(m[6] * white[0] + m[7] * white[1] + m[8] * white[2])
  );

  return (X, Y, Z, out, o = 0) => {
    const ra = compress(m[0] * X + m[1] * Y + m[2] * Z);
    const ga = compress(m[3] * X + m[4] * Y + m[5] * Z);
    const ba = compress(m[6] * X + m[7] * Y + m[8] * Z);
    const a = ra - (12 * ga) / 11 + ba / 11; // eq. 15
    const b = (ra + ga - 2 * ba) / 9;
    const h = Math.atan2(b, a); // eq. 16 (radians)
    const et = 0.25 * (Math.cos(h + 2) + 3.8); // eq. 18
    const J = 100 * (achromatic(ra, ga, ba) / aw) ** cz; // eq. 20
    const t = ((50000 / 13) * N_C * nbb * et * Math.hypot(a, b)) / (ra + ga + (21 / 20) * ba); // eq. 23
    const C = t ** 0.9 * Math.sqrt(J / 100) * cFactor; // eq. 24
    const M = C * F_L_025; // eq. 25
    const jp = (1.7 * J) / (1 + 0.007 * J); // Luo 2006 eq. 4
    const mp = Math.log(1 + 0.0228 * M) / 0.0228;
    const ap = mp * Math.cos(h);
    const bp = mp * Math.sin(h);
    if (out) {
      out[o] = jp;
      out[o + 1] = ap;
      out[o + 2] = bp;
      return null;
    }
    return [jp, ap, bp];
  };
}
