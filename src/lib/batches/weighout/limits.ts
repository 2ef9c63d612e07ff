/**
 * What a batch may hold, set by the database columns it is saved in (see the create-batches and
 * create-batch-lines migrations): masses, balance steps and tolerances are DECIMAL(…, 6) — grams to
 * 1 µg — and the yield-loss allowance DECIMAL(6, 3). A finer value would be rounded away on save
 * (a 1e-7 g balance step became 0), so it is refused instead. Pure.
 */
import { Rat } from './rational';

/** Largest batch, g of finished slurry (whether given as a mass or derived from a part count). */
export const MAX_BATCH_MASS_G = 100_000;
export const MAX_BATCH_MASS_MESSAGE = 'batch size must be at most 100 kg';
/** Decimal places kept for grams (balance step, minimum weight, masses, tolerances). */
export const STORED_G_PLACES = 6;
/** Decimal places kept for the yield-loss allowance, %. */
export const STORED_PCT_PLACES = 3;

/** Decimal places of a number as written in its shortest form (1e-7 → 7); Infinity when it is not a decimal. */
export function decimalPlacesOf(v: number): number {
  if (!Number.isFinite(v)) return Infinity;
  return Rat.parse(String(v))?.decimalPlaces() ?? Infinity;
}

/** Zod refinement: refuse a value with more decimal places than its column keeps. */
export function storable(what: string, places: number, unit: string): [(v: number) => boolean, string] {
  const step = `0.${'0'.repeat(places - 1)}1`;
  return [(v) => decimalPlacesOf(v) <= places, `${what} cannot be finer than ${step}${unit} (${places} decimal places are stored)`];
}

/** Batch mass, g, from a part count: parts × dispense mass ÷ (1 − yield loss), before rounding to the balance step. */
export function partsMassG(partCount: number, dispenseMassG: number, yieldLossPct: number): Rat {
  const good = Rat.ONE.sub(Rat.fromNumber(yieldLossPct).div(Rat.HUNDRED));
  return Rat.int(partCount).mul(Rat.fromNumber(dispenseMassG)).div(good);
}
