/** Small builders for weigh-out inputs used by the tests (values invented, ranges common practice). */
import type { ToleranceSpec, WeighoutInput } from '../../../../src/lib/batches/weighout';

export const pct = (value: number): ToleranceSpec => ({ kind: 'pct', value });
export const grams = (value: number): ToleranceSpec => ({ kind: 'g', value });

export function phosphor(code: string, p: number, tolerance: ToleranceSpec = pct(0.5)) {
  return { materialId: null, code, name: `${code} phosphor`, pct: p, tolerance };
}

export function input(over: Partial<WeighoutInput> = {}): WeighoutInput {
  return {
    sizing: { kind: 'mass', batchMassG: 20 },
    loading: { basis: 'wtPctOfSlurry', totalPct: null },
    phosphors: [phosphor('YL-568', 12), phosphor('RD-625', 3)],
    additives: [],
    silicone: { name: 'Test 1:1', ratioA: 1, ratioB: 1, toleranceA: pct(1), toleranceB: pct(1) },
    balance: { resolutionG: 0.001, minWeightG: 0.02 },
    ...over
  };
}
