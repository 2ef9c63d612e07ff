/**
 * The "fit a package model" form: fields + builds CSV → the same body the API validates.
 * Phosphors are the CSV header's codes, looked up in the library.
 */
import { db } from '../db/index';
import { parseBuildsCsv } from './builds-csv';
import { packageFitSchema, type PackageFitInput } from './schema';

export const FORM_FIELDS = [
  'name',
  'packageType',
  'dispenseGeometry',
  'pathLengthMm',
  'dispenseMassMg',
  'pumpId',
  'builds',
  'fitEscape',
  'fitIqeScale',
  'cascade',
  'resamples'
] as const;
export type FitFormValues = Record<(typeof FORM_FIELDS)[number], string>;

export type FitForm = { ok: true; data: PackageFitInput; values: FitFormValues } | { ok: false; values: FitFormValues; errors: string[] };

const numberOrUndefined = (v: string): number | undefined => (v.trim() === '' ? undefined : Number(v.trim().replace(',', '.')));

export async function readFitForm(form: FormData): Promise<FitForm> {
  const values = Object.fromEntries(FORM_FIELDS.map((f) => [f, String(form.get(f) ?? '')])) as FitFormValues;
  const csv = parseBuildsCsv(values.builds);
  if (!csv.ok) return { ok: false, values, errors: csv.errors.map((e) => `Builds, line ${e.line}: ${e.message}`) };
  const codes = csv.value.phosphorCodes;
  const rows: { id: number; code: string }[] = await db()('materials')
    .where({ kind: 'phosphor' })
    .whereIn('code', codes)
    .select('id', 'code');
  const missing = codes.filter((c) => !rows.some((r) => r.code.toLowerCase() === c.toLowerCase()));
  if (missing.length)
    return { ok: false, values, errors: [`Builds, line 1: no phosphor with the code ${missing.join(', ')} in the library.`] };
  const body = {
    name: values.name,
    packageType: values.packageType,
    dispenseGeometry: values.dispenseGeometry || 'fixedMass',
    pathLengthMm: numberOrUndefined(values.pathLengthMm),
    dispenseMassMg: numberOrUndefined(values.dispenseMassMg),
    pumpId: numberOrUndefined(values.pumpId),
    phosphorIds: codes.map((c) => Number(rows.find((r) => r.code.toLowerCase() === c.toLowerCase())!.id)),
    fitEscape: values.fitEscape === 'on',
    fitIqeScale: values.fitIqeScale === 'on',
    cascade: values.cascade === 'on',
    bootstrap: { resamples: numberOrUndefined(values.resamples) ?? 50, seed: 1 },
    builds: csv.value.builds
  };
  const parsed = packageFitSchema.safeParse(body);
  if (!parsed.success) {
    return {
      ok: false,
      values,
      errors: parsed.error.issues.map((i) =>
        i.path[0] === 'builds' && typeof i.path[1] === 'number'
          ? `Build ${csv.value.builds[i.path[1]]?.label ?? i.path[1]}: ${i.message}`
          : i.message
      )
    };
  }
  return { ok: true, data: parsed.data, values };
}
