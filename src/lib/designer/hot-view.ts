/**
 * The designer's view of the blend at its operating condition: the shares are the bench (cold)
 * output fractions the lab weighs; at a hot condition the same recipe is evaluated on the
 * components at the condition (`hotComponents`) with each phosphor's share scaled by its quench
 * (`quenchedFractions`). Missing thermal data or a temperature outside the data is said, not hidden.
 */
import { type OperatingCondition, describeCondition, isBenchCondition } from '../aim/condition';
import type { BlendComponents } from '../blend/types';
import { hotComponents, quenchedFractions, type ThermalById } from '../blend/thermal/index';
import { createLiveEvaluator, type LiveEvaluator, type LiveFrame } from './live-evaluator';

export type HotView =
  | { status: 'bench' }
  | { status: 'unavailable'; message: string }
  | { status: 'ok'; label: string; frame: LiveFrame; quench: number[]; pumpShiftNm: number };

let cached: {
  components: BlendComponents;
  thermal: ThermalById;
  key: string;
  evaluator: LiveEvaluator;
  quench: number[];
  shift: number;
} | null = null;

export function hotViewOf(
  components: BlendComponents | null,
  thermal: ThermalById,
  condition: OperatingCondition | null,
  coldFractions: number[] | null
): HotView {
  if (!condition || isBenchCondition(condition)) return { status: 'bench' };
  if (!components || !coldFractions) return { status: 'unavailable', message: 'Waiting for the components.' };
  const label = describeCondition(condition);
  try {
    const key = JSON.stringify(condition);
    if (!cached || cached.components !== components || cached.thermal !== thermal || cached.key !== key) {
      const r = hotComponents(components, thermal, condition);
      if (r.status === 'notCharacterised')
        return { status: 'unavailable', message: `Not characterised at ${label}: ${r.missing.join('; ')}.` };
      cached = { components, thermal, key, evaluator: createLiveEvaluator(r.components), quench: r.quench, shift: r.pumpShiftNm };
    }
    const frame = cached.evaluator.evaluate(quenchedFractions(coldFractions, cached.quench));
    return { status: 'ok', label, frame, quench: cached.quench, pumpShiftNm: cached.shift };
  } catch (err) {
    return { status: 'unavailable', message: err instanceof Error ? err.message : String(err) };
  }
}
