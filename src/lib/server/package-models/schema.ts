/**
 * Body of "fit a package model" (API and page share it). Messages name the field by its label.
 * A build gives its colour as x, y or as a measured spectrum, and optionally its output per
 * watt of pump (needed to fit the IQE scale).
 */
import { z } from 'zod';
import { spdSchema } from '../../blend/schemas';

const positive = (label: string, max: number, unit: string) =>
  z.number(`${label} must be a number`).gt(0, `${label} must be above 0 ${unit}`).max(max, `${label}: at most ${max} ${unit}`);

/** Bootstrap work per request: builds × resamples (each refit runs the loading model for every build). */
const MAX_BOOTSTRAP_FITS = 2000;

export const buildSchema = z
  .object({
    label: z.string('Build label must be text').trim().min(1, 'Build label is required').max(60, 'Build label: at most 60 characters'),
    concentrationsWtPct: z
      .array(z.number('wt % must be a number').min(0, 'wt % cannot be negative').max(100, 'wt % must be 0–100'))
      .min(1, 'Give the wt % of each phosphor'),
    pathLengthMm: positive('Path length', 10, 'mm').optional(),
    dispenseMassMg: positive('Dispense mass', 10_000, 'mg').optional(),
    x: z.number('x must be a number').gt(0, 'x must be 0–1').lt(1, 'x must be 0–1').optional(),
    y: z.number('y must be a number').gt(0, 'y must be 0–1').lt(1, 'y must be 0–1').optional(),
    spectrum: spdSchema.optional(),
    outputWPerPumpW: positive('Output (W per pump W)', 10, 'W/W').optional(),
    outputLmPerPumpW: positive('Output (lm per pump W)', 683, 'lm/W').optional()
  })
  .refine((b) => b.spectrum !== undefined || (b.x !== undefined && b.y !== undefined), {
    message: 'Give the measured x and y, or the measured spectrum'
  })
  .refine((b) => b.concentrationsWtPct.reduce((a, c) => a + c, 0) < 100, { message: 'The phosphors add up to 100 wt % or more' });

export const packageFitSchema = z
  .object({
    name: z.string('Name must be text').trim().min(2, 'Name: at least 2 characters').max(120, 'Name: at most 120 characters'),
    packageType: z
      .string('Package type must be text')
      .trim()
      .min(1, 'Package type is required')
      .max(80, 'Package type: at most 80 characters'),
    dispenseGeometry: z.enum(['fixedMass', 'fixedVolume'], 'Dispense geometry must be fixedMass or fixedVolume').default('fixedMass'),
    pathLengthMm: positive('Path length', 10, 'mm'),
    dispenseMassMg: positive('Dispense mass', 10_000, 'mg').optional(),
    pumpId: z.number('Pump must be chosen').int().positive('Pump must be chosen'),
    phosphorIds: z
      .array(z.number().int().positive(), 'Phosphors must be chosen')
      .min(1, 'Choose 1–5 phosphors')
      .max(5, 'Choose 1–5 phosphors')
      .refine((ids) => new Set(ids).size === ids.length, 'A phosphor is listed twice'),
    cascade: z.boolean().default(false),
    fitEscape: z.boolean().default(true),
    fitIqeScale: z.boolean().default(false),
    bootstrap: z
      .object({
        resamples: z.number().int().min(0, 'Resamples: 0–200').max(200, 'Resamples: 0–200').default(50),
        seed: z
          .number()
          .int()
          .min(0)
          .max(2 ** 31)
          .default(1)
      })
      .default({ resamples: 50, seed: 1 }),
    builds: z.array(buildSchema).min(2, 'Give at least two builds').max(40, 'At most 40 builds per fit')
  })
  .superRefine((body, ctx) => {
    if (body.builds.length * body.bootstrap.resamples > MAX_BOOTSTRAP_FITS) {
      ctx.addIssue({
        code: 'custom',
        path: ['bootstrap', 'resamples'],
        message: `Builds × resamples must stay within ${MAX_BOOTSTRAP_FITS}; use fewer resamples`
      });
    }
    body.builds.forEach((b, i) => {
      if (b.concentrationsWtPct.length !== body.phosphorIds.length) {
        ctx.addIssue({
          code: 'custom',
          path: ['builds', i, 'concentrationsWtPct'],
          message: `${b.label}: give ${body.phosphorIds.length} wt % values, one per phosphor`
        });
      }
      if (b.dispenseMassMg !== undefined && b.pathLengthMm === undefined && body.dispenseMassMg === undefined) {
        ctx.addIssue({
          code: 'custom',
          path: ['builds', i, 'dispenseMassMg'],
          message: `${b.label}: a dispense mass needs the model's reference dispense mass`
        });
      }
    });
  });

export type PackageFitInput = z.infer<typeof packageFitSchema>;
export type BuildInput = z.infer<typeof buildSchema>;
