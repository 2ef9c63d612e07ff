/**
 * Synthetic measurement exports for demos, tests and the bench (invented parts, not measurements):
 * each part is the blend model's spectrum (optical superposition, `mix`) of the given components at
 * the given optical fractions (pump leak first), the last phosphor scaled by `lastPhosphorScale`
 * (a line bias) and every phosphor wobbled deterministically by up to ±`scatter`. Written as the
 * usual sphere export: wavelength 380–780 nm at 1 nm, one column per part, 6 significant digits.
 */
import { mix } from '../blend/mix';
import type { BlendComponents } from '../blend/types';

export interface SyntheticPartsOptions {
  parts: number;
  prefix: string;
  lastPhosphorScale?: number;
  scatter?: number;
}

const WAVELENGTHS = Array.from({ length: 401 }, (_, i) => 380 + i);

/** The parts' spectra on 380–780 nm at 1 nm (full precision), one array of 401 values per part. */
export function syntheticPartSpectra(components: BlendComponents, fractions: number[], o: SyntheticPartsOptions): number[][] {
  const last = fractions.length - 1;
  return Array.from({ length: o.parts }, (_, k) => {
    const f = fractions.map((v, i) => {
      if (i === 0) return v;
      const wobble = 1 + (o.scatter ?? 0.01) * Math.sin(1.7 * (k + 1) * i + 0.3 * i * i);
      return v * wobble * (i === last ? (o.lastPhosphorScale ?? 1) : 1);
    });
    const spd = mix(components, { kind: 'optical', fractions: f }).spd;
    return WAVELENGTHS.map((w) => spd.values[w - spd.wavelengths[0]]);
  });
}

/** The same parts as a sphere export (CSV text, one column per part, 6 significant digits). */
export function syntheticPartsCsv(components: BlendComponents, fractions: number[], o: SyntheticPartsOptions): string {
  const cols = syntheticPartSpectra(components, fractions, o);
  const header = ['Wavelength (nm)', ...cols.map((_, k) => `${o.prefix}${String(k + 1).padStart(3, '0')}`)].join(',');
  return [header, ...WAVELENGTHS.map((w, r) => [w, ...cols.map((c) => c[r].toPrecision(6))].join(','))].join('\n');
}
