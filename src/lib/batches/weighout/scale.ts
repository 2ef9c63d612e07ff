/**
 * Scaling a planned batch up or down: the same recipe at another size. Part-count sizing scales
 * the number of parts; a mass batch takes the new mass (or old mass × factor, rounded to the
 * nearest balance step — the plan is then recomputed, so the lines still add up exactly).
 */
import { Rat } from './rational';
import type { WeighoutInput } from './schema';

export function scaleToMass(input: WeighoutInput, batchMassG: number): WeighoutInput {
  return { ...input, sizing: { kind: 'mass', batchMassG } };
}

/** Current batch mass (g, exact decimal from the plan) × factor, to the nearest step (half up). */
export function scaleByFactor(input: WeighoutInput, currentMassG: string, factor: number): WeighoutInput {
  const res = Rat.fromNumber(input.balance.resolutionG);
  const places = res.decimalPlaces() ?? 6;
  const scaled = Rat.parse(currentMassG)!.mul(Rat.fromNumber(factor)).div(res).add(new Rat(1n, 2n)).floor();
  return scaleToMass(input, Number(new Rat(scaled).mul(res).toFixed(places)));
}
