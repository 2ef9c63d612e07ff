/**
 * Chromaticity conversions.
 * CIE 15:2004 [CIE15-2004]: x = X/(X+Y+Z), y = Y/(X+Y+Z) (eq. 7.4);
 * CIE 1976 UCS u' = 4X/(X+15Y+3Z), v' = 9Y/(X+15Y+3Z) (eq. 8.1);
 * CIE 1960 UCS u = u', v = (2/3) v' (MacAdam 1937; used for CCT, CIE 15:2004 §9.5).
 * u,v from x,y: u = 4x/(−2x+12y+3), v = 6y/(−2x+12y+3). All dimensionless.
 */
export type Pair = [number, number];

export function xyzToXy(X: number, Y: number, Z: number): Pair {
  const s = X + Y + Z;
  return [X / s, Y / s];
}

export function xyzToUv(X: number, Y: number, Z: number): Pair {
  const d = X + 15 * Y + 3 * Z;
  return [(4 * X) / d, (6 * Y) / d];
}

export function xyzToUvPrime(X: number, Y: number, Z: number): Pair {
  const d = X + 15 * Y + 3 * Z;
  return [(4 * X) / d, (9 * Y) / d];
}

export function xyToUv(x: number, y: number): Pair {
  const d = -2 * x + 12 * y + 3;
  return [(4 * x) / d, (6 * y) / d];
}

export function uvToXy(u: number, v: number): Pair {
  const d = 2 * u - 8 * v + 4;
  return [(3 * u) / d, (2 * v) / d];
}

export function uvToUvPrime(u: number, v: number): Pair {
  return [u, 1.5 * v];
}

export function uvPrimeToUv(uPrime: number, vPrime: number): Pair {
  return [uPrime, (2 / 3) * vPrime];
}

export function xyToUvPrime(x: number, y: number): Pair {
  const d = -2 * x + 12 * y + 3;
  return [(4 * x) / d, (9 * y) / d];
}

export function uvPrimeToXy(uPrime: number, vPrime: number): Pair {
  const d = 6 * uPrime - 16 * vPrime + 12;
  return [(9 * uPrime) / d, (4 * vPrime) / d];
}

/** XYZ with the given Y from x,y. */
export function xyToXyz(x: number, y: number, Y = 100): [number, number, number] {
  return [(x * Y) / y, Y, ((1 - x - y) * Y) / y];
}
