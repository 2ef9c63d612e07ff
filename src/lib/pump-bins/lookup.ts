/**
 * Which bin a chip wavelength falls in. Edges are half-open, [from, to), so a wavelength on a shared
 * edge belongs to the upper bin (common practice); the last bin also holds its upper edge.
 */
import type { PumpBin, PumpBinSet } from './schema';

export function binForWavelength(set: Pick<PumpBinSet, 'bins'>, wavelengthNm: number): PumpBin | null {
  if (!Number.isFinite(wavelengthNm)) return null;
  const last = set.bins.length - 1;
  return set.bins.find((b, i) => wavelengthNm >= b.fromNm && (wavelengthNm < b.toNm || (i === last && wavelengthNm === b.toNm))) ?? null;
}

/** The bin with this code (codes compare without case), or null. */
export function binByCode(set: Pick<PumpBinSet, 'bins'>, code: string): PumpBin | null {
  const key = code.trim().toUpperCase();
  return set.bins.find((b) => b.code.toUpperCase() === key) ?? null;
}

/** Centre of a bin, nm. */
export function binCentreNm(bin: Pick<PumpBin, 'fromNm' | 'toNm'>): number {
  return (bin.fromNm + bin.toNm) / 2;
}

/** Why a chip lot's wavelength is refused: it lies outside every bin. Null when a bin holds it. */
export function outsideBinsReason(set: PumpBinSet, wavelengthNm: number): string | null {
  if (binForWavelength(set, wavelengthNm)) return null;
  const span = `${set.bins[0].fromNm}–${set.bins[set.bins.length - 1].toNm} nm`;
  const gaps = set.bins.some((b, i) => i > 0 && b.fromNm > set.bins[i - 1].toNm) ? ', with gaps between bins' : '';
  return `${wavelengthNm} nm (${set.basis} wavelength) lies outside every bin of this pump (${span}${gaps})`;
}
