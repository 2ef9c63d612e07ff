/**
 * A tester profile: how one inline tester's per-part table reads — lines before the header row, the
 * field delimiter and decimal mark, which chromaticity space it reports (CIE 1931 x,y or CIE 1976 u′,v′),
 * which header names hold which quantity, and the units of flux and forward voltage. Chosen once, saved
 * by name, used for every table from that tester.
 */
import { z } from 'zod';

/** The quantities a tester table can carry, each mapped to a header name. */
export const TESTER_FIELDS = [
  'label',
  'x',
  'y',
  'uPrime',
  'vPrime',
  'cct',
  'duv',
  'ra',
  'r9',
  'flux',
  'forwardVoltage',
  'peakNm',
  'bin'
] as const;
export type TesterField = (typeof TESTER_FIELDS)[number];

export const TESTER_FIELD_LABELS: Record<TesterField, string> = {
  label: 'Part label',
  x: 'CIE x',
  y: 'CIE y',
  uPrime: 'u′',
  vPrime: 'v′',
  cct: 'CCT (K)',
  duv: 'Duv',
  ra: 'Ra',
  r9: 'R9',
  flux: 'Luminous flux',
  forwardVoltage: 'Forward voltage',
  peakNm: 'Peak wavelength (nm)',
  bin: "Tester's bin label"
};

const header = z
  .string()
  .trim()
  .max(80, 'a column name has at most 80 characters')
  .transform((s) => (s === '' ? undefined : s))
  .optional();

export const testerProfileSchema = z
  .object({
    name: z.string().trim().min(1, 'name the profile (e.g. the tester and its export)').max(80, 'a profile name has at most 80 characters'),
    headerLines: z.coerce.number('lines before the header must be a number').int().min(0).max(50, 'at most 50 lines before the header'),
    delimiter: z.enum(['auto', ',', ';', 'tab'], 'choose the field delimiter'),
    decimalMark: z.enum(['.', ','], 'choose the decimal mark'),
    chromaticity: z.enum(['xy', 'uvPrime'], 'choose the chromaticity the tester reports'),
    columns: z.object(Object.fromEntries(TESTER_FIELDS.map((f) => [f, header])) as Record<TesterField, typeof header>),
    fluxUnit: z.enum(['lm', 'mlm']).default('lm'),
    voltageUnit: z.enum(['V', 'mV']).default('V')
  })
  .superRefine((p, ctx) => {
    const need: TesterField[] = p.chromaticity === 'xy' ? ['x', 'y'] : ['uPrime', 'vPrime'];
    for (const f of need)
      if (!p.columns[f])
        ctx.addIssue({
          code: 'custom',
          path: ['columns', f],
          message: `${TESTER_FIELD_LABELS[f]}: name its column (the chromaticity is required)`
        });
    if (p.decimalMark === ',' && p.delimiter === ',')
      ctx.addIssue({ code: 'custom', path: ['delimiter'], message: 'a decimal comma needs another delimiter (semicolon or tab)' });
    const seen = new Map<string, TesterField>();
    for (const f of TESTER_FIELDS) {
      const name = p.columns[f]?.toLowerCase();
      if (!name) continue;
      const other = seen.get(name);
      if (other)
        ctx.addIssue({
          code: 'custom',
          path: ['columns', f],
          message: `${TESTER_FIELD_LABELS[f]}: column "${p.columns[f]}" is already ${TESTER_FIELD_LABELS[other]}`
        });
      seen.set(name, f);
    }
  });
export type TesterProfile = z.output<typeof testerProfileSchema>;
export type TesterProfileInput = z.input<typeof testerProfileSchema>;
