/** The variation model's form: values round-trip, each refusal names its field, and the chip spread is kept when asked. */
import { describe, expect, it } from 'vitest';
import { DEFAULT_VARIATION_MODEL, variationModelSchema } from '../../../src/lib/blend/spread';
import { variationModelFromForm, variationModelToForm } from '../../../src/lib/blend/spread/model-form';

describe('variation model form', () => {
  it('round-trips the defaults and a normal chip spread', () => {
    const back = variationModelFromForm(variationModelToForm(DEFAULT_VARIATION_MODEL), DEFAULT_VARIATION_MODEL);
    expect(back).toEqual({ ok: true, model: DEFAULT_VARIATION_MODEL });
    const normal = variationModelSchema.parse({ pump: { kind: 'normal', meanOffsetNm: -0.5, sigmaNm: 0.8 }, slurryMassCvPct: 3.5 });
    expect(variationModelFromForm(variationModelToForm(normal), DEFAULT_VARIATION_MODEL)).toEqual({ ok: true, model: normal });
  });

  it('accepts a decimal comma', () => {
    const r = variationModelFromForm({ ...variationModelToForm(DEFAULT_VARIATION_MODEL), slurryMassCvPct: '2,5' }, DEFAULT_VARIATION_MODEL);
    expect(r.ok && r.model.slurryMassCvPct).toBe(2.5);
  });

  it('names the field of a bad value', () => {
    const base = variationModelToForm(DEFAULT_VARIATION_MODEL);
    expect(variationModelFromForm({ ...base, weighingTolerancePct: 'x' }, DEFAULT_VARIATION_MODEL)).toMatchObject({
      ok: false,
      field: 'weighingTolerancePct',
      message: expect.stringMatching(/^Weighing tolerance/)
    });
    expect(variationModelFromForm({ ...base, slurryMassCvPct: '80' }, DEFAULT_VARIATION_MODEL)).toMatchObject({
      ok: false,
      field: 'slurryMassCvPct',
      message: 'Slurry mass CV: at most 50'
    });
    expect(variationModelFromForm({ ...base, halfRangeNm: '' }, DEFAULT_VARIATION_MODEL)).toMatchObject({
      ok: false,
      field: 'halfRangeNm'
    });
  });

  it("keeps chip data or the matrix's bins as they are", () => {
    const bins = variationModelSchema.parse({ pump: { kind: 'bins', bins: [{ code: 'B4', fromNm: 447.5, toNm: 450, sharePct: 100 }] } });
    const form = variationModelToForm(bins);
    expect(form.pumpKind).toBe('keep');
    const r = variationModelFromForm({ ...form, peakLotSigmaNm: '2' }, bins);
    expect(r).toEqual({ ok: true, model: { ...bins, peakLotSigmaNm: 2 } });
  });
});

describe('chip data in the variation model form', () => {
  const base = variationModelToForm(DEFAULT_VARIATION_MODEL);
  it('reads pasted chip wavelengths and writes them back', () => {
    const r = variationModelFromForm(
      { ...base, pumpKind: 'empirical', chipWavelengthsNm: '448.1, 449.0\n450.2 451' },
      DEFAULT_VARIATION_MODEL
    );
    expect(r).toEqual({
      ok: true,
      model: { ...DEFAULT_VARIATION_MODEL, pump: { kind: 'empirical', wavelengthsNm: [448.1, 449, 450.2, 451] } }
    });
    if (r.ok) expect(variationModelToForm(r.model)).toMatchObject({ pumpKind: 'empirical', chipWavelengthsNm: '448.1, 449, 450.2, 451' });
  });
  it('names the value that is not a wavelength', () => {
    expect(
      variationModelFromForm({ ...base, pumpKind: 'empirical', chipWavelengthsNm: '448, 44.9, 450' }, DEFAULT_VARIATION_MODEL)
    ).toEqual({
      ok: false,
      field: 'chipWavelengthsNm',
      message: 'Chip wavelengths: value 2 ("44.9") is not a wavelength of 360–830 nm'
    });
  });
});
