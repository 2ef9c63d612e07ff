/**
 * Public API of the aim (pure TypeScript; no DOM, database or I/O): what a blend aims at and how close it
 * came — the target (CCT + Duv, x,y or ANSI C78.377 bin), the colour tolerance, the metric floors and
 * objective, the colour distance (Δu′v′, Δuv, MacAdam-type steps) and the zod schemas of all three.
 * The solver, the designer, formulations, weigh-out and quality all read it from here.
 */
export { resolveTarget, ansiQuadrangle, type Target, type ResolvedTarget } from './target';
export { colourDistance, stepEllipseAt, withinTolerance, type ColourCentre, type ColourDistance, type Tolerance } from './distance';
export {
  FLOOR_RULES,
  BINDING_MARGIN,
  needsTm30,
  violation,
  violatedFloors,
  bindingFloors,
  objectiveValue,
  type Floors,
  type Objective,
  type LoopMetrics,
  type FloorMetric,
  type FloorRule,
  formatFloorValue
} from './floors';
export { targetSchema, toleranceSchema, floorsSchema } from './schema';
export {
  BENCH_TEMPERATURE_C,
  BENCH_CONDITION,
  operatingConditionSchema,
  conditionOf,
  isBenchCondition,
  describeCondition,
  type OperatingCondition
} from './condition';
