/** Reading the library's HTML forms: zod on the server, values echoed back on failure (nothing lost). */
import { z } from 'zod';
import { materialFieldsSchema, versionSchema, type MaterialFieldsInput } from '../../library/schema';
import { EDITABLE_COLUMNS } from './records';

export type FormValues = Record<string, string>;
export type FieldErrors = Record<string, string[] | undefined>;

export function formValues(fd: FormData, keys: readonly string[]): FormValues {
  // Checkbox groups (hazards) send one value per ticked box.
  return Object.fromEntries(keys.map((k) => [k, k === 'hazards' ? fd.getAll(k).map(String).join(',') : String(fd.get(k) ?? '')]));
}

export const MATERIAL_FORM_KEYS = Object.keys(EDITABLE_COLUMNS);

export function readMaterialForm(
  fd: FormData
): { ok: true; data: MaterialFieldsInput; values: FormValues } | { ok: false; values: FormValues; errors: FieldErrors } {
  const values = formValues(fd, MATERIAL_FORM_KEYS);
  const parsed = materialFieldsSchema.safeParse(values);
  if (!parsed.success) return { ok: false, values, errors: z.flattenError(parsed.error).fieldErrors };
  return { ok: true, data: parsed.data, values };
}

export function readVersion(fd: FormData): number | null {
  const v = versionSchema.safeParse(fd.get('version'));
  return v.success ? v.data : null;
}

/** The uploaded file of a form field, or null when none was chosen. */
export async function formFile(fd: FormData, key: string): Promise<{ name: string; contentType: string; body: Buffer } | null> {
  const f = fd.get(key);
  if (!(f instanceof File) || (f.size === 0 && !f.name)) return null;
  return { name: f.name || 'upload', contentType: f.type || 'application/octet-stream', body: Buffer.from(await f.arrayBuffer()) };
}

/** Form values of an existing material (numbers as plain strings). */
export function valuesOf(m: object): FormValues {
  const r = m as Record<string, unknown>;
  return Object.fromEntries(MATERIAL_FORM_KEYS.map((k) => [k, r[k] == null ? '' : String(r[k])]));
}
