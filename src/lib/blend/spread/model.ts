/**
 * Variation model of production spread: what moves one built part away from the nominal recipe.
 * Every default can be changed by the user; each is tagged with where it comes from.
 */
import { z } from 'zod';

const nm = z.number().finite();

/** Pump (chip) wavelength of a part, as a peak wavelength in nm. */
export const pumpSpreadSchema = z.discriminatedUnion('kind', [
  // Uniform within a bin around the nominal; bins are typically 2.5 nm wide (common practice) → ±1.25 nm.
  z.object({ kind: z.literal('uniform'), halfRangeNm: z.number().min(0).max(20) }),
  z.object({ kind: z.literal('normal'), meanOffsetNm: z.number().min(-20).max(20), sigmaNm: z.number().min(0).max(10) }),
  // Chip wavelengths from sorting data (absolute nm); each part draws one at random.
  z.object({ kind: z.literal('empirical'), wavelengthsNm: z.array(nm.min(360).max(830)).min(1).max(100_000) }),
  // The revision's pump bins (absolute nm); a bin is drawn by its share of supply (equal when none), then uniform inside it.
  z.object({
    kind: z.literal('bins'),
    bins: z
      .array(z.object({ code: z.string().min(1).max(40), fromNm: nm, toNm: nm, sharePct: z.number().min(0).max(100).nullable() }))
      .min(1)
      .max(50)
  })
]);
export type PumpSpread = z.output<typeof pumpSpreadSchema>;

export const variationModelSchema = z.object({
  pump: pumpSpreadSchema.default({ kind: 'uniform', halfRangeNm: 1.25 }),
  // Dispensed slurry mass CV per part: 2 % for a needle dispenser (from memory).
  slurryMassCvPct: z.number().min(0).max(50).default(2),
  // Weighing error per line, uniform within ± this share of the line's mass: 0.5 % (from memory).
  weighingTolerancePct: z.number().min(0).max(20).default(0.5),
  // Lot-to-lot CV of each phosphor's absorption: 3 % (from memory).
  absorptionLotCvPct: z.number().min(0).max(50).default(3),
  // Lot-to-lot σ of each phosphor's emission peak: 1 nm (from memory).
  peakLotSigmaNm: z.number().min(0).max(10).default(1),
  // Measurement noise σ in u′v′ per axis; 0 = off (a spectroradiometer repeats to ~0.0005, from memory).
  measurementSigmaUvPrime: z.number().min(0).max(0.02).default(0)
});
export type VariationModel = z.output<typeof variationModelSchema>;
export type VariationModelInput = z.input<typeof variationModelSchema>;

export const DEFAULT_VARIATION_MODEL: VariationModel = variationModelSchema.parse({});

/** The sources the variance breakdown reports, one at a time. */
export const SPREAD_SOURCES = ['pump', 'slurryMass', 'weighing', 'absorptionLot', 'peakLot', 'measurement'] as const;
export type SpreadSource = (typeof SPREAD_SOURCES)[number];

/** Every source off: each part is the nominal recipe. */
export const NO_VARIATION: VariationModel = {
  pump: { kind: 'uniform', halfRangeNm: 0 },
  slurryMassCvPct: 0,
  weighingTolerancePct: 0,
  absorptionLotCvPct: 0,
  peakLotSigmaNm: 0,
  measurementSigmaUvPrime: 0
};

/** A model with only `source` left on (the others set to no variation). */
export function onlySource(model: VariationModel, source: SpreadSource): VariationModel {
  const off = NO_VARIATION;
  if (source === 'pump') return { ...off, pump: model.pump };
  if (source === 'slurryMass') return { ...off, slurryMassCvPct: model.slurryMassCvPct };
  if (source === 'weighing') return { ...off, weighingTolerancePct: model.weighingTolerancePct };
  if (source === 'absorptionLot') return { ...off, absorptionLotCvPct: model.absorptionLotCvPct };
  if (source === 'peakLot') return { ...off, peakLotSigmaNm: model.peakLotSigmaNm };
  return { ...off, measurementSigmaUvPrime: model.measurementSigmaUvPrime };
}
