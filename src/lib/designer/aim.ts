/**
 * The designer's aim: target colour point (nominal CCT + Duv, x,y, or an ANSI C78.377 bin),
 * tolerance in SDCM steps and floors (Ra, R9, Rf, LER, melanopic DER floor/ceiling), as edited in the form, turned into
 * the blend model's Target / Tolerance / Floors through the same zod schemas the API uses.
 */
import {
  floorsSchema,
  resolveTarget,
  targetSchema,
  type Floors,
  type Objective,
  type ResolvedTarget,
  type Target,
  type Tolerance
} from '../aim/index';
import { fieldLabel, readableIssue, readableSummary } from '../errors/readable-issues';
import type { IntentLevel } from '../spectral/tm30/design-intents';
import { ANSI_C78377_2017_TABLE1 } from '../spectral/data/ansi-c78377-2017';

export type TargetKind = Target['kind'];

export interface AimFloors {
  raMin: number | null;
  r9Min: number | null;
  rfMin: number | null;
  lerMin: number | null;
  /** Melanopic DER floor and ceiling (CIE S 026/E:2018); absent in older saved aims. */
  melDerMin?: number | null;
  melDerMax?: number | null;
  /** TM-30-20 Annex E level the blend must meet, or null. */
  intent: IntentLevel | null;
}

export interface AimState {
  kind: TargetKind;
  cct: number | null;
  duv: number | null;
  x: number | null;
  y: number | null;
  nominalCct: number;
  toleranceSdcm: number | null;
  floors: AimFloors;
}

/** Nominal CCTs of ANSI C78.377-2017 Table 1. */
export const ANSI_NOMINAL_CCTS: number[] = ANSI_C78377_2017_TABLE1.map((r) => r.nominalCct);

/** "90 CRI" market class at 3000 K: Ra ≥ 90, R9 ≥ 50 [common practice]. */
export const DEFAULT_AIM: AimState = {
  kind: 'cctDuv',
  cct: 3000,
  duv: 0,
  x: 0.4339,
  y: 0.4033,
  nominalCct: 3000,
  toleranceSdcm: 3,
  floors: { raMin: 90, r9Min: 50, rfMin: null, lerMin: null, intent: null }
};

export const OBJECTIVES: { value: Objective; label: string }[] = [
  { value: 'maxLer', label: 'Highest LER (lm/W)' },
  { value: 'maxRa', label: 'Highest Ra' },
  { value: 'maxRf', label: 'Highest Rf' },
  { value: 'minCost', label: 'Lowest phosphor cost' },
  { value: 'maxMelDer', label: 'Highest melanopic DER' },
  { value: 'minMelDer', label: 'Lowest melanopic DER' }
];

export type AimResult =
  | { ok: true; target: Target; resolved: ResolvedTarget; tolerance: Tolerance; floors: Floors }
  | { ok: false; errors: Partial<Record<'target' | 'tolerance' | 'floors', string>> };

const blank = (v: number | null | undefined): v is null | undefined => v === null || v === undefined || Number.isNaN(v);

function targetInput(aim: AimState): unknown {
  if (aim.kind === 'cctDuv') return { kind: 'cctDuv', cct: aim.cct, duv: aim.duv };
  if (aim.kind === 'xy') return { kind: 'xy', x: aim.x, y: aim.y };
  return { kind: 'ansiBin', nominalCct: aim.nominalCct };
}

export function floorsOf(f: AimFloors): Floors {
  const out: Floors = {};
  if (!blank(f.raMin)) out.raMin = f.raMin;
  if (!blank(f.r9Min)) out.r9Min = f.r9Min;
  if (!blank(f.rfMin)) out.rfMin = f.rfMin;
  if (!blank(f.lerMin)) out.lerMin = f.lerMin;
  if (!blank(f.melDerMin)) out.melDerMin = f.melDerMin;
  if (!blank(f.melDerMax)) out.melDerMax = f.melDerMax;
  if (f.intent) out.intent = f.intent;
  return out;
}

export function resolveAim(aim: AimState): AimResult {
  const errors: Partial<Record<'target' | 'tolerance' | 'floors', string>> = {};
  const t = targetSchema.safeParse(targetInput(aim));
  if (!t.success)
    errors.target = t.error.issues
      .map((i) => {
        const path = i.path.join('.');
        return i.code === 'invalid_type' ? `${fieldLabel(path) || 'A value'} is required` : readableIssue({ path, message: i.message });
      })
      .join('; ');
  const steps = aim.toleranceSdcm;
  if (blank(steps) || !(steps > 0 && steps <= 20)) errors.tolerance = 'tolerance must be 0–20 SDCM steps';
  const f = floorsSchema.safeParse(floorsOf(aim.floors));
  if (!f.success) errors.floors = readableSummary(f.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message })));
  if (!t.success || !f.success || errors.tolerance) return { ok: false, errors };
  return { ok: true, target: t.data, resolved: resolveTarget(t.data), tolerance: { kind: 'sdcm', steps: steps as number }, floors: f.data };
}

/** Aim fields from a stored target, tolerance and floors (opening a revision in the designer). */
export function aimFrom(target: Target, tolerance: Tolerance, floors: Floors): AimState {
  const r = resolveTarget(target);
  return {
    kind: target.kind,
    cct: target.kind === 'cctDuv' ? target.cct : Math.round(r.cct),
    duv: target.kind === 'cctDuv' ? target.duv : Number(r.duv.toFixed(4)),
    x: target.kind === 'xy' ? target.x : Number(r.x.toFixed(4)),
    y: target.kind === 'xy' ? target.y : Number(r.y.toFixed(4)),
    nominalCct: target.kind === 'ansiBin' ? target.nominalCct : DEFAULT_AIM.nominalCct,
    toleranceSdcm: tolerance.kind === 'sdcm' ? tolerance.steps : DEFAULT_AIM.toleranceSdcm,
    floors: {
      raMin: floors.raMin ?? null,
      r9Min: floors.r9Min ?? null,
      rfMin: floors.rfMin ?? null,
      lerMin: floors.lerMin ?? null,
      melDerMin: floors.melDerMin ?? null,
      melDerMax: floors.melDerMax ?? null,
      intent: floors.intent ?? null
    }
  };
}
