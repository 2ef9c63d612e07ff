/**
 * Floors (minimum/maximum metric values) and objectives of a blend solve.
 *
 * Metrics: Ra and R9 (CIE 13.3-1995), Rf and Rg (ANSI/IES TM-30-20 = CIE 224:2017 for
 * Rf), LER (lm/W, CIE 15:2004 photometry), melanopic DER (CIE S 026/E:2018, as a floor or a
 * ceiling), all from the spectral core. Typical floor
 * sets: "90 CRI" = Ra ≥ 90 and R9 ≥ 50; TM-30 P2 = Rf ≥ 75 [from memory], Rg ≥ 92
 * [common practice]. A floor "binds" when the candidate sits within
 * its margin (BINDING_MARGIN, or the rule's own) of it: the optimiser pushed against it.
 * Melanopic DER shortfalls count 100 per unit DER (0.01 DER weighs as 1 index point).
 */
import { intentDefinition, type IntentLevel } from '../spectral/tm30/design-intents';

export interface Floors {
  raMin?: number;
  r9Min?: number;
  rfMin?: number;
  rgMin?: number;
  rgMax?: number;
  lerMin?: number;
  /** Melanopic daylight efficacy ratio floor and ceiling (CIE S 026/E:2018, dimensionless). */
  melDerMin?: number;
  melDerMax?: number;
  /** A TM-30-20 Annex E design-intent level the blend must meet (../spectral/tm30/design-intents.ts). */
  intent?: IntentLevel;
}

export type Objective = 'maxLer' | 'maxRa' | 'maxRf' | 'minCost' | 'maxMelDer' | 'minMelDer';

export interface LoopMetrics {
  ra: number;
  r9: number;
  ler: number;
  /** Melanopic DER (CIE S 026/E:2018). */
  melDer: number;
  rf: number | null;
  rg: number | null;
  /** Local indices of TM-30 hue bin 1 (Rf,h1; Rcs,h1 as a fraction), for the design intents. */
  rfh1?: number | null;
  rcsh1?: number | null;
  costPer1000Lm: number | null;
}

/** Floors with a numeric limit (the design intent is judged on its own criteria). */
type FloorKey = Exclude<keyof Floors, 'intent'>;

/** The metrics a floor can hold. */
export type FloorMetric = 'ra' | 'r9' | 'rf' | 'rg' | 'ler' | 'melDer';

export interface FloorRule {
  key: FloorKey;
  metric: FloorMetric;
  sense: 1 | -1;
  label: string;
  /** Shortfall weight per unit (default 1), binding margin (default BINDING_MARGIN), decimals shown (default 1). */
  scale?: number;
  margin?: number;
  digits?: number;
}

const DER = { scale: 100, margin: 0.005, digits: 3 };

export const FLOOR_RULES: FloorRule[] = [
  { key: 'raMin', metric: 'ra', sense: 1, label: 'Ra' },
  { key: 'r9Min', metric: 'r9', sense: 1, label: 'R9' },
  { key: 'rfMin', metric: 'rf', sense: 1, label: 'Rf' },
  { key: 'rgMin', metric: 'rg', sense: 1, label: 'Rg' },
  { key: 'rgMax', metric: 'rg', sense: -1, label: 'Rg' },
  { key: 'lerMin', metric: 'ler', sense: 1, label: 'LER' },
  { key: 'melDerMin', metric: 'melDer', sense: 1, label: 'Melanopic DER', ...DER },
  { key: 'melDerMax', metric: 'melDer', sense: -1, label: 'Melanopic DER', ...DER }
];

/** A floored metric's value as the solver reports it (rule's decimals). */
export function formatFloorValue(rule: FloorRule, value: number | undefined): string {
  return value === undefined ? 'n/a' : value.toFixed(rule.digits ?? 1);
}

/** Within this distance of its limit a floor is reported as binding (index points, lm/W). */
export const BINDING_MARGIN = 0.5;

/**
 * The same floors moved `margin` inward (minimums up, maximums down), for a search that must land inside them.
 * `margin` is in index points; a rule with a shortfall weight moves by margin / weight in its own unit
 * (0.05 points = 0.0005 melanopic DER).
 */
export function floorsInside(floors: Floors, margin: number): Floors {
  // A design intent has no single limit to move; it is kept as it is.
  const out: Floors = floors.intent ? { intent: floors.intent } : {};
  for (const r of FLOOR_RULES) {
    const limit = floors[r.key];
    if (limit !== undefined) out[r.key] = limit + (r.sense * margin) / (r.scale ?? 1);
  }
  return out;
}

export function needsTm30(floors: Floors, objective: Objective): boolean {
  return (
    objective === 'maxRf' ||
    floors.rfMin !== undefined ||
    floors.rgMin !== undefined ||
    floors.rgMax !== undefined ||
    floors.intent !== undefined
  );
}

/** Shortfall of a design-intent level in index points (Rcs,h1 in percentage points); 0 when met. */
function intentShortfall(level: IntentLevel, m: LoopMetrics): number {
  const values = { rf: m.rf, rg: m.rg, rfh1: m.rfh1 ?? null, rcsh1: m.rcsh1 ?? null };
  if (Object.values(values).some((v) => v === null || !Number.isFinite(v))) return 100;
  let v = 0;
  for (const c of intentDefinition(level).criteria) {
    const scale = c.metric === 'rcsh1' ? 100 : 1;
    const x = values[c.metric]! * scale;
    if (c.min !== undefined) v += Math.max(0, c.min * scale - x);
    if (c.max !== undefined) v += Math.max(0, x - c.max * scale);
  }
  return v;
}

/** Sum of floor shortfalls (0 when every floor is met). */
export function violation(floors: Floors, m: LoopMetrics): number {
  let v = 0;
  for (const r of FLOOR_RULES) {
    const limit = floors[r.key];
    const value = m[r.metric];
    if (limit === undefined || value === null) continue;
    v += Math.max(0, r.sense * (limit - value)) * (r.scale ?? 1);
  }
  if (floors.intent) v += intentShortfall(floors.intent, m);
  return v;
}

export function violatedFloors(floors: Floors, m: LoopMetrics): string[] {
  const rules = FLOOR_RULES.filter((r) => {
    const limit = floors[r.key];
    const value = m[r.metric];
    return limit !== undefined && value !== null && r.sense * (limit - value) > 0;
  }).map((r) => `${r.label} ${formatFloorValue(r, m[r.metric] ?? undefined)} ${r.sense > 0 ? '<' : '>'} ${floors[r.key]}`);
  const intent = floors.intent && intentShortfall(floors.intent, m) > 0 ? [`TM-30 design intent ${floors.intent} not met`] : [];
  return [...rules, ...intent];
}

export function bindingFloors(floors: Floors, m: LoopMetrics): FloorKey[] {
  return FLOOR_RULES.filter((r) => {
    const limit = floors[r.key];
    const value = m[r.metric];
    return limit !== undefined && value !== null && Math.abs(value - limit) <= (r.margin ?? BINDING_MARGIN);
  }).map((r) => r.key);
}

/** Objective as a value to maximise. */
export function objectiveValue(objective: Objective, m: LoopMetrics): number {
  switch (objective) {
    case 'maxLer':
      return m.ler;
    case 'maxRa':
      return m.ra;
    case 'maxRf':
      return m.rf ?? -Infinity;
    case 'minCost':
      return m.costPer1000Lm === null ? -Infinity : -m.costPer1000Lm;
    case 'maxMelDer':
      return m.melDer;
    case 'minMelDer':
      return -m.melDer;
  }
}
