/** The tester profile as flat form fields (`col_<field>` for each column name) and back. Pure. */
import { TESTER_FIELDS, testerProfileSchema, type TesterProfile } from './profile';

export type ProfileFormValues = Record<string, string>;

export const EMPTY_PROFILE_FORM: ProfileFormValues = {
  name: '',
  headerLines: '0',
  delimiter: 'auto',
  decimalMark: '.',
  chromaticity: 'xy',
  fluxUnit: 'lm',
  voltageUnit: 'V',
  ...Object.fromEntries(TESTER_FIELDS.map((f) => [`col_${f}`, '']))
};

export function profileToForm(p: TesterProfile): ProfileFormValues {
  return {
    name: p.name,
    headerLines: String(p.headerLines),
    delimiter: p.delimiter,
    decimalMark: p.decimalMark,
    chromaticity: p.chromaticity,
    fluxUnit: p.fluxUnit,
    voltageUnit: p.voltageUnit,
    ...Object.fromEntries(TESTER_FIELDS.map((f) => [`col_${f}`, p.columns[f] ?? '']))
  };
}

export type ProfileFormResult = { ok: true; profile: TesterProfile } | { ok: false; field: string; message: string };

export function profileFromForm(v: ProfileFormValues): ProfileFormResult {
  const parsed = testerProfileSchema.safeParse({
    name: v.name ?? '',
    headerLines: v.headerLines ?? '0',
    delimiter: v.delimiter,
    decimalMark: v.decimalMark,
    chromaticity: v.chromaticity,
    fluxUnit: v.fluxUnit || 'lm',
    voltageUnit: v.voltageUnit || 'V',
    columns: Object.fromEntries(TESTER_FIELDS.map((f) => [f, v[`col_${f}`] ?? '']))
  });
  if (parsed.success) return { ok: true, profile: parsed.data };
  const issue = parsed.error.issues[0];
  const field = issue.path[0] === 'columns' ? `col_${String(issue.path[1])}` : String(issue.path[0] ?? 'name');
  return { ok: false, field, message: issue.message };
}
