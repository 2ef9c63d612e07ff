/** The material page's thermal form: a table typed by hand or a CSV file, checked by the thermal CSV parser (line-named errors). */
import { z } from 'zod';
import { formFile, formValues } from './form';
import { uploadThermalCsv } from './thermal';
import * as records from './records';
import { notFound } from './errors';
import { invalid } from '../../errors/domain-error';
import type { User } from '../accounts/users';

export const THERMAL_FORM_KEYS = ['csv', 'version', 'peakDriftNmPerK', 'peakDriftNmPerMa', 'referenceCurrentMa'] as const;

const optionalNumber = z
  .string()
  .trim()
  .transform((s) => (s === '' ? null : Number(s)))
  .refine((n) => n === null || Number.isFinite(n), 'must be a number');
const formSchema = z.object({
  version: z.coerce.number().int().min(0),
  peakDriftNmPerK: optionalNumber,
  peakDriftNmPerMa: optionalNumber,
  referenceCurrentMa: optionalNumber
});

/** Saves the thermal table of the form; throws a domain error (nothing saved) naming the line or field at fault. */
export async function saveThermalForm(user: User, materialId: number, fd: FormData) {
  const values = formValues(fd, THERMAL_FORM_KEYS);
  const parsed = formSchema.safeParse(values);
  if (!parsed.success) throw invalid('The drift fields must be numbers; reload the page if the version is lost.');
  const material = await records.get(materialId);
  if (!material) throw notFound(materialId);
  const file = await formFile(fd, 'thermalFile');
  const text = file ? file.body.toString('utf8') : values.csv;
  if (!text.trim()) throw invalid('Type the table or choose a CSV file first.');
  const f = parsed.data;
  const drift =
    material.kind === 'pump'
      ? { peakDriftNmPerK: f.peakDriftNmPerK ?? Number.NaN, peakDriftNmPerMa: f.peakDriftNmPerMa, referenceCurrentMa: f.referenceCurrentMa }
      : undefined;
  return uploadThermalCsv(user, materialId, material.kind, f.version, { name: file?.name ?? 'The table', text }, drift);
}
