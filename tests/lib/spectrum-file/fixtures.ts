/**
 * Hand-built spectrum files for the parser tests: a Gaussian band sampled every 10 nm from
 * 400 nm, written in each dialect. Line numbers in the tests are counted by hand from these.
 */
export const WAVELENGTHS = Array.from({ length: 30 }, (_, i) => 400 + 10 * i); // 400…690 nm, 30 points
export const INTENSITIES = WAVELENGTHS.map((w) => Number(Math.exp(-(((w - 550) / 40) ** 2)).toFixed(4)));

export function rows(sep: string, decimalComma = false, data = WAVELENGTHS.map((w, i) => [w, INTENSITIES[i]])): string[] {
  const fmt = (v: number | string) => (decimalComma ? String(v).replace('.', ',') : String(v));
  return data.map((r) => r.map(fmt).join(sep));
}

export const file = (...lines: string[]) => lines.join('\n');
