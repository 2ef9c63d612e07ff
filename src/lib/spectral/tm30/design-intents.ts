/**
 * Design intents of ANSI/IES TM-30-20 Annex E ("Recommended Color Rendition Specification
 * Criteria"): three intents — Preference (P), Vividness (V), Fidelity (F) — each with priority
 * levels 1 (strictest) to 3, judged on Rf, Rg and the local indices of hue bin 1 (reds), Rf,h1 and
 * Rcs,h1 (TM-30-20 §4.4; bins from ./cie224.ts). A spectrum meets a level when every criterion of
 * that level holds.
 *
 * Provenance of the limits: P2's Rg ≥ 92 and Rcs,h1 −7 %…+19 %, and F3's Rf ≥ 85 and Rf,h1 ≥ 85, are
 * the criteria ANSI/ASHRAE/ICC/USGBC/IES Standard 189.1 (addendum to the 2017 edition, §8.3.5.3)
 * quotes as "TM-30 Annex E, P2 and F3". Every other limit is from memory, marked so in the table,
 * and to be confirmed against the published Annex E before it is relied on for a specification.
 */
import type { Tm30Result } from '../types';

export const INTENT_FAMILIES = ['preference', 'vividness', 'fidelity'] as const;
export type IntentFamily = (typeof INTENT_FAMILIES)[number];
export const INTENT_LEVELS = ['P1', 'P2', 'P3', 'V1', 'V2', 'V3', 'F1', 'F2', 'F3'] as const;
export type IntentLevel = (typeof INTENT_LEVELS)[number];

/** Rf, Rg, Rf,h1 (index points) and Rcs,h1 (fraction: 0.07 = 7 %). */
export type IntentMetric = 'rf' | 'rg' | 'rfh1' | 'rcsh1';

export interface IntentCriterion {
  metric: IntentMetric;
  min?: number;
  max?: number;
  /** 'quoted': as quoted by ASHRAE 189.1 from Annex E; 'fromMemory': recalled, to be confirmed. */
  provenance: 'quoted' | 'fromMemory';
}

export interface IntentDefinition {
  level: IntentLevel;
  family: IntentFamily;
  criteria: IntentCriterion[];
}

const q = (metric: IntentMetric, min?: number, max?: number): IntentCriterion => ({ metric, min, max, provenance: 'quoted' });
const m = (metric: IntentMetric, min?: number, max?: number): IntentCriterion => ({ metric, min, max, provenance: 'fromMemory' });

export const DESIGN_INTENTS: IntentDefinition[] = [
  { level: 'P1', family: 'preference', criteria: [m('rf', 78), m('rg', 95), m('rcsh1', 0.07, 0.19)] },
  { level: 'P2', family: 'preference', criteria: [m('rf', 75), q('rg', 92), q('rcsh1', -0.07, 0.19)] },
  { level: 'P3', family: 'preference', criteria: [m('rf', 70), m('rg', 89), m('rcsh1', -0.12, 0.23)] },
  { level: 'V1', family: 'vividness', criteria: [m('rf', 60), m('rg', 117), m('rcsh1', 0.21)] },
  { level: 'V2', family: 'vividness', criteria: [m('rf', 60), m('rg', 110), m('rcsh1', 0.14)] },
  { level: 'V3', family: 'vividness', criteria: [m('rf', 60), m('rg', 103), m('rcsh1', 0.07)] },
  { level: 'F1', family: 'fidelity', criteria: [m('rf', 95), m('rfh1', 93)] },
  { level: 'F2', family: 'fidelity', criteria: [m('rf', 90), m('rfh1', 89)] },
  { level: 'F3', family: 'fidelity', criteria: [q('rf', 85), q('rfh1', 85)] }
];

export function intentDefinition(level: IntentLevel): IntentDefinition {
  return DESIGN_INTENTS.find((d) => d.level === level)!;
}

export const METRIC_LABEL: Record<IntentMetric, string> = { rf: 'Rf', rg: 'Rg', rfh1: 'Rf,h1', rcsh1: 'Rcs,h1' };

export interface IntentCheck {
  level: IntentLevel;
  family: IntentFamily;
  met: boolean;
  /** Criteria that fail, e.g. "Rcs,h1 3 % < 7 %". */
  misses: string[];
}

export interface DesignIntentReport {
  /** The values judged (Rcs,h1 as a fraction). */
  values: Record<IntentMetric, number>;
  checks: IntentCheck[];
  /** Strictest level met per intent, or null (shown as "–", below level 3). */
  best: Record<IntentFamily, IntentLevel | null>;
}

const show = (metric: IntentMetric, v: number) => (metric === 'rcsh1' ? `${(v * 100).toFixed(0)} %` : v.toFixed(0));

/** The criteria of a level the values miss, e.g. "Rcs,h1 3 % < 7 %"; [] when met. */
export function intentMisses(level: IntentLevel, values: Record<IntentMetric, number>): string[] {
  const misses: string[] = [];
  for (const c of intentDefinition(level).criteria) {
    const v = values[c.metric];
    if (c.min !== undefined && v < c.min) misses.push(`${METRIC_LABEL[c.metric]} ${show(c.metric, v)} < ${show(c.metric, c.min)}`);
    if (c.max !== undefined && v > c.max) misses.push(`${METRIC_LABEL[c.metric]} ${show(c.metric, v)} > ${show(c.metric, c.max)}`);
  }
  return misses;
}

/** Rf, Rg, Rf,h1 and Rcs,h1 of a TM-30 result; null when any is undefined (far from white). */
export function intentValues(tm30: Tm30Result): Record<IntentMetric, number> | null {
  const h1 = tm30.bins[0];
  const values: Record<IntentMetric, number> = { rf: tm30.rf, rg: tm30.rg, rfh1: h1?.rf ?? NaN, rcsh1: h1?.rcs ?? NaN };
  return Object.values(values).every((v) => Number.isFinite(v)) ? values : null;
}

/** Which levels of each intent the TM-30 result meets; null when TM-30 is undefined (NaN indices). */
export function designIntents(tm30: Tm30Result): DesignIntentReport | null {
  const values = intentValues(tm30);
  if (!values) return null;
  const checks = DESIGN_INTENTS.map((d) => {
    const misses = intentMisses(d.level, values);
    return { level: d.level, family: d.family, met: misses.length === 0, misses };
  });
  const best = Object.fromEntries(INTENT_FAMILIES.map((f) => [f, checks.find((c) => c.family === f && c.met)?.level ?? null])) as Record<
    IntentFamily,
    IntentLevel | null
  >;
  return { values, checks, best };
}

/** Whether a result meets a level (for the solver's constraint): false when TM-30 is undefined. */
export function meetsIntent(tm30: Tm30Result, level: IntentLevel): boolean {
  return designIntents(tm30)?.checks.find((c) => c.level === level)?.met ?? false;
}

/** Text of a level's criteria, each marked † when recalled rather than quoted. */
export function describeIntent(level: IntentLevel): string {
  return intentDefinition(level)
    .criteria.map((c) => {
      const label = METRIC_LABEL[c.metric];
      const range =
        c.min !== undefined && c.max !== undefined
          ? `${show(c.metric, c.min)} ≤ ${label} ≤ ${show(c.metric, c.max)}`
          : c.min !== undefined
            ? `${label} ≥ ${show(c.metric, c.min)}`
            : `${label} ≤ ${show(c.metric, c.max!)}`;
      return `${range}${c.provenance === 'fromMemory' ? ' †' : ''}`;
    })
    .join(', ');
}
