/**
 * Exact rational numbers on BigInt for the weigh-out arithmetic. Every mass, percentage and ratio
 * is read as the decimal the person typed (0.1 is 1/10, not the nearest binary double), so sums
 * and roundings are exact; nothing is accumulated in floating point.
 */

function gcd(a: bigint, b: bigint): bigint {
  let x = a < 0n ? -a : a;
  let y = b < 0n ? -b : b;
  while (y !== 0n) [x, y] = [y, x % y];
  return x;
}

/** A number the exact arithmetic cannot take (non-finite, or beyond 40 digits/decimal places): bad input, not a fault. */
export class ExactNumberError extends RangeError {
  override readonly name = 'ExactNumberError';
}

export class Rat {
  readonly n: bigint;
  readonly d: bigint;

  constructor(n: bigint, d: bigint = 1n) {
    if (d === 0n) throw new RangeError('division by zero');
    if (d < 0n) [n, d] = [-n, -d];
    const g = gcd(n, d) || 1n;
    this.n = n / g;
    this.d = d / g;
  }

  static readonly ZERO = new Rat(0n);
  static readonly ONE = new Rat(1n);
  static readonly HUNDRED = new Rat(100n);

  static int(v: number | bigint): Rat {
    return new Rat(BigInt(v));
  }

  /** The decimal a number was written as (its shortest round-trip string), exactly. */
  static fromNumber(v: number): Rat {
    if (!Number.isFinite(v)) throw new ExactNumberError(`${v} is not a finite number`);
    const r = Rat.parse(String(v));
    if (!r) throw new ExactNumberError(`${v} has more than 40 digits or decimal places, far beyond any balance`);
    return r;
  }

  /** Parses a plain or exponent decimal ("12.5", "-0.001", "1e-7"); null when it is not one. */
  static parse(text: string): Rat | null {
    const m = /^\s*([+-]?)(\d*)(?:\.(\d*))?(?:[eE]([+-]?\d+))?\s*$/.exec(text);
    if (!m || (m[2] === '' && (m[3] ?? '') === '')) return null;
    const digits = `${m[2]}${m[3] ?? ''}` || '0';
    const exp = -(m[3] ?? '').length + Number(m[4] ?? '0');
    if (Math.abs(exp) > 40 || digits.length > 40) return null; // far outside any balance reading
    let n = BigInt(digits);
    let d = 1n;
    if (exp >= 0) n *= 10n ** BigInt(exp);
    else d = 10n ** BigInt(-exp);
    return new Rat(m[1] === '-' ? -n : n, d);
  }

  /** Parses an exact fraction written by toFraction ("-7/3", "5"); null when it is not one. */
  static parseFraction(text: string): Rat | null {
    const m = /^\s*(-?\d{1,80})(?:\/(\d{1,80}))?\s*$/.exec(text);
    if (!m) return null;
    const d = BigInt(m[2] ?? '1');
    return d === 0n ? null : new Rat(BigInt(m[1]), d);
  }

  /** Exact text "n/d" (or "n" for an integer) that parseFraction reads back unchanged. */
  toFraction(): string {
    return this.d === 1n ? this.n.toString() : `${this.n}/${this.d}`;
  }

  add(o: Rat): Rat {
    return new Rat(this.n * o.d + o.n * this.d, this.d * o.d);
  }
  sub(o: Rat): Rat {
    return new Rat(this.n * o.d - o.n * this.d, this.d * o.d);
  }
  mul(o: Rat): Rat {
    return new Rat(this.n * o.n, this.d * o.d);
  }
  div(o: Rat): Rat {
    if (o.n === 0n) throw new RangeError('division by zero');
    return new Rat(this.n * o.d, this.d * o.n);
  }

  cmp(o: Rat): -1 | 0 | 1 {
    const l = this.n * o.d;
    const r = o.n * this.d;
    return l < r ? -1 : l > r ? 1 : 0;
  }
  lt(o: Rat): boolean {
    return this.cmp(o) < 0;
  }
  lte(o: Rat): boolean {
    return this.cmp(o) <= 0;
  }
  gt(o: Rat): boolean {
    return this.cmp(o) > 0;
  }
  gte(o: Rat): boolean {
    return this.cmp(o) >= 0;
  }
  eq(o: Rat): boolean {
    return this.cmp(o) === 0;
  }
  isZero(): boolean {
    return this.n === 0n;
  }
  isInteger(): boolean {
    return this.d === 1n;
  }

  /** Largest integer ≤ this. */
  floor(): bigint {
    const q = this.n / this.d;
    return this.n < 0n && q * this.d !== this.n ? q - 1n : q;
  }
  /** Smallest integer ≥ this. */
  ceil(): bigint {
    const q = this.n / this.d;
    return this.n > 0n && q * this.d !== this.n ? q + 1n : q;
  }
  /** this − floor(this), in [0, 1). */
  frac(): Rat {
    return this.sub(new Rat(this.floor()));
  }

  /** For display only (never fed back into the arithmetic). */
  toNumber(): number {
    return Number(this.n) / Number(this.d);
  }

  /**
   * Decimal string rounded half-up to `places` digits (trailing zeros kept), e.g. 1/3 → "0.333".
   * Exact when the value has at most `places` decimals.
   */
  toFixed(places: number): string {
    const scale = 10n ** BigInt(places);
    const neg = this.n < 0n;
    const abs = new Rat(neg ? -this.n : this.n, this.d).mul(new Rat(scale));
    const r = abs.add(new Rat(1n, 2n)).floor();
    const int = (r / scale).toString();
    const fracPart = places > 0 ? '.' + (r % scale).toString().padStart(places, '0') : '';
    return `${neg && r !== 0n ? '-' : ''}${int}${fracPart}`;
  }

  /** Digits after the point of the shortest exact decimal, or null if it does not terminate. */
  decimalPlaces(): number | null {
    let d = this.d;
    let twos = 0;
    let fives = 0;
    while (d % 2n === 0n) {
      d /= 2n;
      twos++;
    }
    while (d % 5n === 0n) {
      d /= 5n;
      fives++;
    }
    return d === 1n ? Math.max(twos, fives) : null;
  }

  /** Exact decimal string when it terminates, else rounded to `fallbackPlaces`. */
  toDecimal(fallbackPlaces = 6): string {
    const places = this.decimalPlaces();
    return this.toFixed(places ?? fallbackPlaces);
  }
}

export const rat = (v: number): Rat => Rat.fromNumber(v);
