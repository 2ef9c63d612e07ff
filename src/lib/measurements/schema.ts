/**
 * Form and API schemas of the quality feature (shared by pages and endpoints): the batch's colour
 * acceptance, the correction request, release/reject with an e-signature, and withdrawing an upload.
 */
import { z } from 'zod';
import { isBenchCondition, operatingConditionSchema, type OperatingCondition } from '../aim/condition';

const version = z.coerce.number('version is required (the version you read)').int().positive('version is required (the version you read)');

/** Colour acceptance chosen for a batch: the revision's own tolerance, or an n-step ellipse. */
export const acceptanceSchema = z
  .object({
    mode: z.enum(['revision', 'steps'], 'choose the revision tolerance or a step ellipse'),
    steps: z.coerce.number('steps must be a number').min(1, 'steps must be 1–7').max(7, 'steps must be 1–7').optional(),
    requireTargetBin: z
      .union([z.boolean(), z.enum(['on', 'true', 'false'])])
      .optional()
      .transform((v) => v === true || v === 'on' || v === 'true'),
    version: z.coerce.number().int().min(0).default(0)
  })
  .refine((v) => v.mode === 'revision' || v.steps !== undefined, { message: 'enter the number of steps (1–7)', path: ['steps'] });
export type AcceptanceInput = z.infer<typeof acceptanceSchema>;

export const correctionSchema = z.object({
  stepFraction: z.coerce
    .number('step must be a number')
    .min(0.1, 'apply between 10 % and 100 % of the correction')
    .max(1, 'apply between 10 % and 100 % of the correction')
    .default(0.8)
});

export const DISPOSITION_MEANINGS = {
  release: ['Release approval: the batch meets its revision', 'Release under concession: deviation recorded in the comment'],
  reject: ['Rejection: the batch does not meet its revision', 'Rejection for rework']
} as const;

export const dispositionSchema = z
  .object({
    decision: z.enum(['release', 'reject'], 'choose release or reject'),
    meaning: z.string().trim().min(1, 'choose the meaning of your signature'),
    comment: z.string().trim().min(3, 'a comment is required (at least 3 characters)').max(2000, 'at most 2000 characters'),
    password: z.string().min(1, 're-enter your password to sign').max(200),
    version
  })
  .refine((v) => (DISPOSITION_MEANINGS[v.decision] as readonly string[]).includes(v.meaning), {
    message: 'choose one of the listed meanings for this decision',
    path: ['meaning']
  });
export type DispositionInput = z.infer<typeof dispositionSchema>;

export const withdrawUploadSchema = z.object({
  uploadId: z.coerce.number().int().positive('which upload?'),
  reason: z.string().trim().min(3, 'give a reason (at least 3 characters)').max(500)
});

/**
 * Largest measurement file accepted (bytes, after gunzip when sent compressed): the 2,000 parts one
 * upload takes (MAX_PARTS_PER_UPLOAD) × 401 points at 6 digits is about 7.5 MB. Kept under the server's
 * request limit (BODY_SIZE_LIMIT, 12M in scripts/profile.sh) so a larger file gets this feature's own
 * message; raise both together for bigger exports.
 */
export const MAX_MEASUREMENT_FILE_BYTES = 11 * 1024 * 1024;
/**
 * A tester's per-part table: up to 100,000 parts (MAX_TABLE_ROWS) of about 100 bytes a row, under the
 * server's request limit (BODY_SIZE_LIMIT, 12M in scripts/profile.sh).
 */
export const MAX_TABLE_FILE_BYTES = 11 * 1024 * 1024;

/**
 * The test condition of a measurement file, from form fields or query parameters: no temperature =
 * the bench (25 °C); otherwise the temperature, which point it is taken at, and the drive current if
 * stated. Checked by the same rules as a revision's operating condition (../aim/condition.ts).
 */
export const testConditionFieldsSchema = z
  .object({
    testTemperatureC: z.string().trim().max(20).optional(),
    testReference: z.enum(['junction', 'solderPoint'], 'the test temperature is taken at the junction or the solder point').optional(),
    testCurrentMa: z.string().trim().max(20).optional()
  })
  .transform((f, ctx): OperatingCondition | null => {
    const number = (raw: string | undefined, path: string, what: string): number | null => {
      if (!raw) return null;
      const v = Number(raw.replace(',', '.'));
      if (Number.isFinite(v)) return v;
      ctx.addIssue({ code: 'custom', path: [path], message: `${what} "${raw}" is not a number` });
      return null;
    };
    const t = number(f.testTemperatureC, 'testTemperatureC', 'test temperature');
    const mA = number(f.testCurrentMa, 'testCurrentMa', 'test current');
    if (t === null) {
      if (mA !== null) ctx.addIssue({ code: 'custom', path: ['testTemperatureC'], message: 'give the test temperature with the current' });
      return null;
    }
    const parsed = operatingConditionSchema.safeParse({ reference: f.testReference ?? 'junction', temperatureC: t, driveCurrentMa: mA });
    if (!parsed.success) {
      for (const i of parsed.error.issues)
        ctx.addIssue({ code: 'custom', path: [i.path[0] === 'driveCurrentMa' ? 'testCurrentMa' : 'testTemperatureC'], message: i.message });
      return null;
    }
    return isBenchCondition(parsed.data) ? null : parsed.data;
  });

/** Which tester profile reads an upload (form field or query parameter `testerProfile`); absent or empty = spectra. */
export const testerProfileChoiceSchema = z.object({
  testerProfile: z
    .string()
    .trim()
    .optional()
    .transform((v, ctx) => {
      if (!v) return null;
      const id = Number(v);
      if (Number.isInteger(id) && id > 0) return id;
      ctx.addIssue({ code: 'custom', message: `testerProfile "${v.slice(0, 20)}" is not a profile id` });
      return z.NEVER;
    })
});
