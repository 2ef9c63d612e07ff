/**
 * The draft form's flat fields ↔ revision content. The form posts strings; this turns them into
 * the raw content object that the server validates with the content schema (materials and the
 * silicone system are named by id; their codes, names and properties are filled in from the
 * library on save). Pure, shared by the pages and their tests.
 */
import { CONTENT_VERSION, type RevisionContent } from '../recipe';

export const MAX_PHOSPHORS = 5;
export type FormValues = Record<string, string>;

const FLOOR_KEYS = ['raMin', 'r9Min', 'rfMin', 'rgMin', 'rgMax', 'lerMin', 'melDerMin', 'melDerMax'] as const;

const str = (v: number | null | undefined) => (v === null || v === undefined ? '' : String(v));

export function contentToFormValues(c: RevisionContent): FormValues {
  const v: FormValues = {
    pumpId: String(c.pump.materialId),
    leak: String(c.pumpLeakFraction),
    siliconeId: str(c.silicone.siliconeSystemId),
    cct: c.target.kind === 'cctDuv' ? String(c.target.cct) : '',
    duv: c.target.kind === 'cctDuv' ? String(c.target.duv) : '0',
    sdcm: c.tolerance.kind === 'sdcm' ? String(c.tolerance.steps) : '3',
    pathMm: str(c.loading?.pathLengthMm),
    packageModel: c.packageModelRef ? `${c.packageModelRef.id}:${c.packageModelRef.version}` : '',
    notes: c.notes
  };
  for (const k of FLOOR_KEYS) v[k] = str(c.floors[k]);
  v.intent = c.floors.intent ?? '';
  c.phosphors.forEach((p, i) => {
    v[`ph${i}`] = String(p.materialId);
    v[`of${i}`] = String(p.opticalFraction);
    v[`wt${i}`] = str(p.wtPct);
  });
  return v;
}

export function formDataToValues(fd: FormData): FormValues {
  const v: FormValues = {};
  for (const [k, val] of fd.entries()) if (typeof val === 'string') v[k] = val.trim();
  return v;
}

/** A number, or undefined for an empty field (so the schema reports it as missing). */
const num = (s: string | undefined) => (s === undefined || s === '' ? undefined : Number(s.replace(',', '.')));

/** The cited package model as `id:version` (hidden field), or null; anything else is left for the schema to refuse. */
function packageModelRefOf(s: string | undefined): unknown {
  if (!s) return null;
  const m = /^(\d+):(\d+)$/.exec(s);
  return m ? { id: Number(m[1]), version: Number(m[2]) } : s;
}

export function formValuesToRaw(v: FormValues): unknown {
  const phosphors = [];
  for (let i = 0; i < MAX_PHOSPHORS; i++) {
    if (!v[`ph${i}`]) continue;
    phosphors.push({
      materialId: num(v[`ph${i}`]),
      code: '?',
      name: '?',
      opticalFraction: num(v[`of${i}`]),
      wtPct: num(v[`wt${i}`]) ?? null
    });
  }
  const floors: Record<string, number | string | undefined> = {};
  for (const k of FLOOR_KEYS) if (v[k]) floors[k] = num(v[k]);
  // A TM-30 Annex E level; the content schema refuses anything else with a readable message.
  if (v.intent) floors.intent = v.intent;
  return {
    contentVersion: CONTENT_VERSION,
    pump: { materialId: num(v.pumpId), code: '?', name: '?' },
    phosphors,
    pumpLeakFraction: num(v.leak),
    loading: v.pathMm ? { pathLengthMm: num(v.pathMm), basis: 'wtPctOfSlurry' } : null,
    silicone: {
      siliconeSystemId: num(v.siliconeId) ?? null,
      name: v.siliconeId ? '?' : '',
      ratioA: 1,
      ratioB: 1,
      potLifeMin: 1,
      cure: '',
      densityGPerCm3: null
    },
    target: { kind: 'cctDuv', cct: num(v.cct), duv: num(v.duv) ?? 0 },
    tolerance: { kind: 'sdcm', steps: num(v.sdcm) },
    floors,
    packageModelRef: packageModelRefOf(v.packageModel),
    notes: v.notes ?? ''
  };
}
