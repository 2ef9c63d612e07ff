/**
 * The variation model as a form: flat text fields ↔ the model. The chip-wavelength spread is chosen by
 * `pumpKind` — uniform ± nm, normal (offset, σ), chip data (the sorted chips' wavelengths, pasted), or
 * kept as it is (the recipe matrix's bins, which the form shows but does not edit). Errors name the field.
 */
import { z } from 'zod';
import { variationModelSchema, type VariationModel } from './model';

export type VariationModelFormValues = Record<string, string>;

const num = (label: string, min: number, max: number) =>
  z
    .string()
    .trim()
    .min(1, `${label}: enter a number`)
    .transform((s) => Number(s.replace(',', '.')))
    .pipe(z.number(`${label}: enter a number`).min(min, `${label}: at least ${min}`).max(max, `${label}: at most ${max}`));

const common = {
  slurryMassCvPct: num('Slurry mass CV', 0, 50),
  weighingTolerancePct: num('Weighing tolerance', 0, 20),
  absorptionLotCvPct: num('Lot absorption CV', 0, 50),
  peakLotSigmaNm: num('Lot peak σ', 0, 10),
  measurementSigmaUvPrime: num('Measurement noise', 0, 0.02)
};

/** Chip wavelengths from sorting data: numbers separated by commas, spaces or line breaks; each 360–830 nm. */
const chipData = z
  .string()
  .trim()
  .min(1, "Chip wavelengths: paste the sorted chips' wavelengths (nm)")
  .transform((s, ctx) => {
    const cells = s.split(/[\s,;]+/).filter(Boolean);
    const out: number[] = [];
    for (let i = 0; i < cells.length; i++) {
      const v = Number(cells[i]);
      if (!Number.isFinite(v) || v < 360 || v > 830) {
        ctx.addIssue({
          code: 'custom',
          message: `Chip wavelengths: value ${i + 1} ("${cells[i].slice(0, 20)}") is not a wavelength of 360–830 nm`
        });
        return z.NEVER;
      }
      out.push(v);
    }
    if (out.length > 100_000) {
      ctx.addIssue({ code: 'custom', message: `Chip wavelengths: at most 100,000 values (${out.length} given)` });
      return z.NEVER;
    }
    return out;
  });

const formSchema = z.discriminatedUnion('pumpKind', [
  z.object({ pumpKind: z.literal('uniform'), halfRangeNm: num('Chip wavelength ±', 0, 20), ...common }),
  z.object({ pumpKind: z.literal('empirical'), chipWavelengthsNm: chipData, ...common }),
  z.object({
    pumpKind: z.literal('normal'),
    meanOffsetNm: num('Chip wavelength offset', -20, 20),
    sigmaNm: num('Chip wavelength σ', 0, 10),
    ...common
  }),
  z.object({ pumpKind: z.literal('keep'), ...common })
]);

/** The model as form values (numbers as plain text). */
export function variationModelToForm(model: VariationModel): VariationModelFormValues {
  const p = model.pump;
  return {
    pumpKind: p.kind === 'bins' ? 'keep' : p.kind,
    chipWavelengthsNm: p.kind === 'empirical' ? p.wavelengthsNm.join(', ') : '',
    halfRangeNm: String(p.kind === 'uniform' ? p.halfRangeNm : 1.25),
    meanOffsetNm: String(p.kind === 'normal' ? p.meanOffsetNm : 0),
    sigmaNm: String(p.kind === 'normal' ? p.sigmaNm : 0.7),
    slurryMassCvPct: String(model.slurryMassCvPct),
    weighingTolerancePct: String(model.weighingTolerancePct),
    absorptionLotCvPct: String(model.absorptionLotCvPct),
    peakLotSigmaNm: String(model.peakLotSigmaNm),
    measurementSigmaUvPrime: String(model.measurementSigmaUvPrime)
  };
}

export type ModelFormResult = { ok: true; model: VariationModel } | { ok: false; field: string; message: string };

/** Form values → model; `current` supplies the chip spread kept as it is ('keep'). */
export function variationModelFromForm(values: VariationModelFormValues, current: VariationModel): ModelFormResult {
  const parsed = formSchema.safeParse({ pumpKind: values.pumpKind ?? 'keep', ...values });
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const field = String(issue.path[0] ?? 'pumpKind');
    return { ok: false, field, message: field === 'pumpKind' ? 'Chip wavelength: choose how it spreads' : issue.message };
  }
  const d = parsed.data;
  const pump =
    d.pumpKind === 'uniform'
      ? { kind: 'uniform' as const, halfRangeNm: d.halfRangeNm }
      : d.pumpKind === 'normal'
        ? { kind: 'normal' as const, meanOffsetNm: d.meanOffsetNm, sigmaNm: d.sigmaNm }
        : d.pumpKind === 'empirical'
          ? { kind: 'empirical' as const, wavelengthsNm: d.chipWavelengthsNm }
          : current.pump;
  return {
    ok: true,
    model: variationModelSchema.parse({
      pump,
      slurryMassCvPct: d.slurryMassCvPct,
      weighingTolerancePct: d.weighingTolerancePct,
      absorptionLotCvPct: d.absorptionLotCvPct,
      peakLotSigmaNm: d.peakLotSigmaNm,
      measurementSigmaUvPrime: d.measurementSigmaUvPrime
    })
  };
}
