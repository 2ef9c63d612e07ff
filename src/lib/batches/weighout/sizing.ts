/**
 * Batch size in grams of finished slurry, from a mass or from a part count.
 * Parts: mass = parts × dispense mass per part ÷ (1 − yield-loss allowance), so that after the
 * allowed loss (syringe hold-up, purge shots, rejects) enough slurry is left for every part; then
 * rounded UP to a whole balance step (never short). Common practice.
 */
import { Rat } from './rational';
import type { Sizing } from './schema';
import { MAX_BATCH_MASS_G, MAX_BATCH_MASS_MESSAGE, partsMassG } from './limits';

export interface SizingResult {
  /** Batch mass in balance steps. */
  steps: bigint;
  note: string | null;
  error: { path: string; message: string } | null;
}

export function batchSteps(sizing: Sizing, resolution: Rat, places: number): SizingResult {
  const sized = stepsFor(sizing, resolution, places);
  const massG = new Rat(sized.steps).mul(resolution);
  if (sized.error || !massG.gt(Rat.int(MAX_BATCH_MASS_G))) return sized;
  const path = sizing.kind === 'mass' ? 'sizing.batchMassG' : 'sizing.partCount';
  return { steps: 0n, note: null, error: { path, message: `${MAX_BATCH_MASS_MESSAGE} (this one would be ${massG.toFixed(places)} g)` } };
}

function stepsFor(sizing: Sizing, resolution: Rat, places: number): SizingResult {
  if (sizing.kind === 'mass') {
    const exact = Rat.fromNumber(sizing.batchMassG).div(resolution);
    if (!exact.isInteger()) {
      return {
        steps: 0n,
        note: null,
        error: {
          path: 'sizing.batchMassG',
          message:
            `batch size ${sizing.batchMassG} g is not a whole number of balance steps ` +
            `(${resolution.toDecimal()} g); enter it to ${places} decimal ` +
            `place${places === 1 ? '' : 's'}`
        }
      };
    }
    return { steps: exact.n, note: null, error: null };
  }
  const needed = partsMassG(sizing.partCount, sizing.dispenseMassG, sizing.yieldLossPct);
  const steps = needed.div(resolution).ceil();
  const massG = new Rat(steps).mul(resolution).toFixed(places);
  return {
    steps,
    note:
      `${sizing.partCount} parts × ${sizing.dispenseMassG} g ÷ (1 − ` +
      `${sizing.yieldLossPct} % yield loss) = ${needed.toDecimal(places + 3)} g, ` +
      `rounded up to the balance step: ${massG} g.`,
    error: null
  };
}
