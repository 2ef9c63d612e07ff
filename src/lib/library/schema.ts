/**
 * Form and API schemas of the material library (shared by pages and endpoints).
 * Form fields arrive as strings: empty means "not known" (null); a decimal comma is accepted.
 */
import { z } from 'zod';
import { HAZARD_CODES, isHazardCode } from './hazards';
import { plainText } from '../errors/hidden-characters';

const text = (max: number, label: string) =>
  z.preprocess(
    (v) => (typeof v === 'string' ? v.trim() : v),
    z.string(`${label} must be text`).max(max, `${label}: at most ${max} characters`).superRefine(plainText(label))
  );

/** Empty = null; `multiline` for notes (tab and line breaks allowed). */
const optionalText = (max: number, label: string, multiline = false) =>
  z.preprocess(
    (v) => (v === undefined || v === null || (typeof v === 'string' && v.trim() === '') ? null : typeof v === 'string' ? v.trim() : v),
    z
      .string(`${label} must be text`)
      .max(max, `${label}: at most ${max} characters`)
      .superRefine(plainText(label, { multiline }))
      .nullable()
  );

const optionalNumber = (label: string, min: number, max: number, unit = '') =>
  z.preprocess(
    (v) =>
      v === undefined || v === null || (typeof v === 'string' && v.trim() === '')
        ? null
        : typeof v === 'string'
          ? Number(v.trim().replace(',', '.'))
          : v,
    z
      .number(`${label} must be a number`)
      .min(min, `${label} must be ${min}–${max}${unit}`)
      .max(max, `${label} must be ${min}–${max}${unit}`)
      .nullable()
  );

export const materialFieldsSchema = z.object({
  code: text(40, 'Code').pipe(
    z.string().regex(/^[A-Za-z0-9][A-Za-z0-9._-]*$/, 'Code: letters, digits, dot, dash or underscore, no spaces (e.g. YL-568)')
  ),
  name: text(200, 'Name').pipe(z.string().min(2, 'Name: at least 2 characters')),
  family: optionalText(200, 'Chemistry / family'),
  supplier: optionalText(200, 'Supplier'),
  densityGCm3: optionalNumber('Density', 0.1, 20, ' g/cm³'),
  iqe: optionalNumber('IQE', 0.01, 1, ' (a fraction)'),
  absorptionPerWtPctMm: optionalNumber('Absorption coefficient', 0.0001, 100, ' 1/(wt %·mm)'),
  absorptionReferenceNm: optionalNumber('Absorption reference wavelength', 300, 900, ' nm'),
  costPerKg: optionalNumber('Cost per kg', 0, 10_000_000),
  d50Um: optionalNumber('Particle size D50', 0.01, 1000, ' µm'),
  notes: optionalText(5000, 'Notes', true),
  safetyNote: optionalText(2000, 'Safety note', true),
  /** Hazard codes, as a list or comma-separated text; stored as sorted comma-separated codes. */
  hazards: z.preprocess(
    (v) => (v === undefined || v === null ? '' : Array.isArray(v) ? v.join(',') : v),
    z
      .string('Hazards must be a list of hazard codes')
      .transform((s) => [
        ...new Set(
          s
            .split(',')
            .map((c) => c.trim())
            .filter(Boolean)
        )
      ])
      .refine((codes) => codes.every(isHazardCode), `Hazards: each must be one of ${HAZARD_CODES.join(', ')}`)
      .transform((codes) => HAZARD_CODES.filter((c) => codes.includes(c)).join(','))
  )
});

export type MaterialFieldsInput = z.infer<typeof materialFieldsSchema>;

/** Rules that depend on the kind: a phosphor needs its IQE for every blend computation. */
export function kindIssues(kind: 'pump' | 'phosphor', fields: Partial<MaterialFieldsInput>): { path: string; message: string }[] {
  if (kind === 'phosphor' && (fields.iqe === null || fields.iqe === undefined))
    return [{ path: 'iqe', message: 'IQE is required for a phosphor (0.01–1).' }];
  return [];
}

export const versionSchema = z.coerce.number('Version must be a number').int().positive('Version must be a positive whole number');

/** API PUT: any subset of the fields, plus the version the client read (optimistic lock). */
export const materialUpdateApiSchema = materialFieldsSchema.partial().extend({ version: versionSchema });

export const lotSchema = z
  .object({
    lotNumber: text(80, 'Lot number').pipe(
      z
        .string()
        .min(1, 'Lot number is required')
        .regex(/^[^\s].*$/, 'Lot number is required')
    ),
    supplier: optionalText(200, 'Supplier'),
    receivedOn: optionalText(10, 'Received on').pipe(z.iso.date('Received on: use a date like 2026-03-14').nullable()),
    expiresOn: optionalText(10, 'Expires on').pipe(z.iso.date('Expires on: use a date like 2027-03-14').nullable()),
    notes: optionalText(2000, 'Notes', true)
  })
  .refine((l) => !l.receivedOn || !l.expiresOn || l.expiresOn >= l.receivedOn, {
    message: 'Expires on must not be before received on',
    path: ['expiresOn']
  });

export const spectrumKindSchema = z.enum(['emission', 'excitation'], 'Spectrum kind must be emission or excitation');

export const ATTACHMENT_PURPOSES = ['safety-data-sheet', 'certificate', 'attachment'] as const;
export const attachmentPurposeSchema = z.enum(ATTACHMENT_PURPOSES, 'Choose safety data sheet, certificate of analysis or other document');
export const ATTACHMENT_LABELS: Record<(typeof ATTACHMENT_PURPOSES)[number], string> = {
  'safety-data-sheet': 'Safety data sheet',
  certificate: 'Certificate of analysis',
  attachment: 'Other document'
};
/** Largest attachment accepted (PDF data sheets and certificates). */
export const MAX_ATTACHMENT_BYTES = 10 * 1024 * 1024;
