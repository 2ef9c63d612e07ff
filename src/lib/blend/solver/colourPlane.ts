/**
 * The set of mixes with a given chromaticity, as an affine subspace of the ratio vector.
 *
 * With component tristimulus values (Xⱼ, Yⱼ, Zⱼ), Σⱼ = Xⱼ + Yⱼ + Zⱼ, a mix w has
 * chromaticity (x_t, y_t) iff (Ohno, Opt. Eng. 44 (2005) 111302):
 *   Σ wⱼ(Xⱼ − x_t Σⱼ) = 0,   Σ wⱼ(Yⱼ − y_t Σⱼ) = 0,   and Σ wⱼ = 1 fixes the scale,
 * i.e. A w = b with A 3×k, b = (0, 0, 1). Solutions: w = w₀ + N z, w₀ = A⁺b (Moore–Penrose
 * pseudo-inverse), N an orthonormal basis of null(A) (last k − 3 columns of Q in the QR
 * factorisation of Aᵀ; Golub & Van Loan, *Matrix Computations*, 4th ed., §5.2) — mathjs.
 * With w ≥ 0 the feasible set is a (k − 3)-dimensional polytope; its vertices are the
 * basic feasible solutions: the 3-component mixes (all other wⱼ = 0) that hit the target
 * (standard LP theory, e.g. Chvátal, *Linear Programming*, 1983, ch. 3).
 */
import { multiply, pinv, qr, transpose } from 'mathjs';

export interface ColourPlane {
  /** Particular solution (minimum norm). */
  w0: number[];
  /** k × d orthonormal null-space basis, d = k − 3 (empty columns when d = 0). */
  basis: number[][];
  dimension: number;
  /** Vertices of the feasible polytope {w ≥ 0} (each a full-length ratio vector). */
  vertices: number[][];
}

function solve3(a: number[][], b: number[]): number[] | null {
  const det = (m: number[][]) =>
    m[0][0] * (m[1][1] * m[2][2] - m[1][2] * m[2][1]) -
    m[0][1] * (m[1][0] * m[2][2] - m[1][2] * m[2][0]) +
    m[0][2] * (m[1][0] * m[2][1] - m[1][1] * m[2][0]);
  const d = det(a);
  const scale = Math.max(...a.flat().map(Math.abs));
  if (Math.abs(d) < 1e-14 * scale ** 3) return null;
  return [0, 1, 2].map((c) => det(a.map((row, r) => row.map((v, j) => (j === c ? b[r] : v)))) / d);
}

export function constraintMatrix(xyz: [number, number, number][], target: [number, number]): number[][] {
  const [xt, yt] = target;
  return [xyz.map(([X, Y, Z]) => X - xt * (X + Y + Z)), xyz.map(([X, Y, Z]) => Y - yt * (X + Y + Z)), xyz.map(() => 1)];
}

export function colourPlane(xyz: [number, number, number][], target: [number, number]): ColourPlane {
  const k = xyz.length;
  const A = constraintMatrix(xyz, target);
  const b = [0, 0, 1];
  const w0 = (multiply(pinv(A) as number[][], b) as number[]).map(Number);
  let basis: number[][] = Array.from({ length: k }, () => []);
  if (k > 3) {
    const Q = qr(transpose(A)).Q as number[][];
    basis = Q.map((row) => row.slice(3));
  }
  const vertices: number[][] = [];
  for (let i = 0; i < k; i++)
    for (let j = i + 1; j < k; j++)
      for (let l = j + 1; l < k; l++) {
        const sub = A.map((row) => [row[i], row[j], row[l]]);
        const s = solve3(sub, b);
        if (!s || s.some((v) => v < -1e-10)) continue;
        const w = new Array<number>(k).fill(0);
        w[i] = Math.max(0, s[0]);
        w[j] = Math.max(0, s[1]);
        w[l] = Math.max(0, s[2]);
        vertices.push(w);
      }
  return { w0, basis, dimension: Math.max(0, k - 3), vertices };
}

export function ratiosAt(plane: ColourPlane, z: number[]): number[] {
  return plane.w0.map((v, i) => v + plane.basis[i].reduce((s, nij, j) => s + nij * z[j], 0));
}

export function coordinatesOf(plane: ColourPlane, w: number[]): number[] {
  return Array.from({ length: plane.dimension }, (_, j) => w.reduce((s, wi, i) => s + plane.basis[i][j] * (wi - plane.w0[i]), 0));
}
