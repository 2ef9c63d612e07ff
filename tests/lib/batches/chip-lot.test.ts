/**
 * Planning from a revision with a recipe per chip bin: which bin a chip lot picks, the refusals, and
 * the masses of the picked bin's recipe (hand-worked like tests/lib/batches/weighout/compute.test.ts).
 */
import { describe, expect, it } from 'vitest';
import { chooseChipBin } from '../../../src/lib/batches/chip-lot';
import { planInputFromRevision } from '../../../src/lib/batches/plan-weighout';
import { computeWeighout } from '../../../src/lib/batches/weighout/compute';
import { parseRecipe, type RevisionContent } from '../../../src/lib/recipe';
import { NOMINAL_CONTENT, withRecipeMatrix } from '../../fixtures/recipe-matrix';

const nominal = NOMINAL_CONTENT;
const matrix: RevisionContent = withRecipeMatrix(parseRecipe(nominal));
const single: RevisionContent = parseRecipe(nominal);

const binOf = (lot: Parameters<typeof chooseChipBin>[1]) => {
  const r = chooseChipBin(matrix, lot);
  return r.ok ? r.chosen.binCode : `refused ${r.issue.path}: ${r.issue.message}`;
};

describe('chip bin from the lot (bins [from, to), 2.5 nm wide: common practice)', () => {
  it.each([
    { name: 'inside B1', wavelengthNm: 448.6, expected: 'B1' },
    { name: 'on the shared edge 450 nm belongs to the upper bin', wavelengthNm: 450, expected: 'B2' },
    { name: 'inside B3', wavelengthNm: 453.1, expected: 'B3' },
    { name: 'the last bin holds its upper edge', wavelengthNm: 455, expected: 'B3' }
  ])('$name', ({ wavelengthNm, expected }) => {
    expect(binOf({ lotNumber: 'CL-1', wavelengthNm })).toBe(expected);
  });

  it('a bin code picks its bin, whatever its case', () => {
    expect(binOf({ lotNumber: 'CL-1', binCode: 'b2' })).toBe('B2');
  });

  it('refuses a wavelength outside every bin with the span of the bins', () => {
    expect(binOf({ lotNumber: 'CL-9', wavelengthNm: 457.2 })).toBe(
      'refused chipLot.wavelengthNm: Chip lot CL-9: 457.2 nm (peak wavelength) lies outside every bin of this pump (447.5–455 nm); ' +
        'this revision has no recipe for it'
    );
  });

  it('refuses a bin code the matrix lacks, naming the bins it has', () => {
    expect(binOf({ lotNumber: 'CL-1', binCode: 'B7' })).toBe(
      'refused chipLot.binCode: this revision has no recipe for chip bin B7 (its recipes are for B1, B2, B3)'
    );
  });

  it('refuses a code that disagrees with the wavelength, and a lot with neither', () => {
    expect(binOf({ lotNumber: 'CL-1', binCode: 'B1', wavelengthNm: 451 })).toMatch(/bin B1 does not hold 451 nm .* lies in bin B2/);
    expect(binOf({ lotNumber: 'CL-1' })).toMatch(/enter the chip bin code or the lot's peak wavelength \(bins B1, B2, B3\)/);
  });

  it('needs the chip lot when the revision has a matrix, and only records it without one', () => {
    expect(binOf(null)).toMatch(/recipe per chip bin \(B1, B2, B3\): enter the chip lot number/);
    const plain = chooseChipBin(single, { lotNumber: 'CL-1', wavelengthNm: 470 });
    expect(plain).toEqual({ ok: true, chosen: { lotNumber: 'CL-1', wavelengthNm: 470, binCode: null, binRecipe: null } });
    expect(chooseChipBin(single, undefined)).toMatchObject({ ok: true, chosen: { lotNumber: null, binCode: null } });
  });
});

const request = (chipLot: object | null, pcts?: number[]) => ({
  sizing: { kind: 'mass' as const, batchMassG: 10 },
  loading: { mode: 'perPhosphor' as const, basis: 'wtPctOfSlurry' as const, pcts },
  balance: { resolutionG: 0.001, minWeightG: 0.05 },
  chipLot: chipLot as never
});

function rows(content: RevisionContent, req: ReturnType<typeof request>) {
  const built = planInputFromRevision(content, req);
  if (!built.ok) throw new Error(built.errors.map((e) => e.message).join('; '));
  const r = computeWeighout(built.input);
  if (!r.ok) throw new Error(r.errors.map((e) => e.message).join('; '));
  return r.plan.lines.map((l) => [l.code, l.targetG, l.lowG, l.highG]);
}

describe("weigh-out of the chip bin's recipe (10:1 silicone, 10.000 g, balance 0.001 g)", () => {
  it('bin B3 at 6.5 + 2.4 wt %, masses worked by hand', () => {
    // GL 10 × 6.5 % = 0.650 g; RD 10 × 2.4 % = 0.240 g; silicone 10 − 0.89 = 9.110 g;
    // A = 9.11 × 10/11 = 8.281818… g, B = 0.828181… g. In 0.001 g steps: A 8281.82, B 828.18, GL 650, RD 240
    // → floors 9999, one step left; remainders .82 (A) > .18 (B) → A = 8.282. Sum 8.282 + 0.650 + 0.240 + 0.828 = 10.000.
    // A ±1 %: 9.11 × 0.9 = 8.199 exactly; 8.281818 × 1.01 = 8.36463… → 8.364. B: 9.11 × 0.09 = 0.8199 → inward 0.820;
    // 0.828181 × 1.01 = 0.83646… → 0.836. GL ±0.5 % = ±0.00325 → 0.647–0.653; RD ±0.0012 → 0.239–0.241.
    expect(rows(matrix, request({ lotNumber: 'CL-3', wavelengthNm: 453.1 }))).toEqual([
      ['PART A', '8.282', '8.199', '8.364'],
      ['GL-530', '0.650', '0.647', '0.653'],
      ['RD-625', '0.240', '0.239', '0.241'],
      ['PART B', '0.828', '0.820', '0.836']
    ]);
  });

  it('bin B2 weighs the 7 + 2.5 wt % of the hand-worked 10:1 example', () => {
    // Same numbers as compute.test.ts "10:1 silicone, 10.000 g at 7 + 2.5 wt %".
    expect(rows(matrix, request({ lotNumber: 'CL-2', binCode: 'B2' }))).toEqual([
      ['PART A', '8.227', '8.145', '8.309'],
      ['GL-530', '0.700', '0.697', '0.703'],
      ['RD-625', '0.250', '0.249', '0.251'],
      ['PART B', '0.823', '0.815', '0.830']
    ]);
  });

  it("typed loadings equal to the bin's are accepted; the nominal ones for another bin are refused", () => {
    expect(rows(matrix, request({ lotNumber: 'CL-3', binCode: 'B3' }, [6.5, 2.4]))[1]).toEqual(['GL-530', '0.650', '0.647', '0.653']);
    const refused = planInputFromRevision(matrix, request({ lotNumber: 'CL-3', binCode: 'B3' }, [7, 2.5]));
    expect(refused).toEqual({
      ok: false,
      errors: [{ path: 'loading.pcts', message: 'Chip bin B3 is weighed with its own recipe (6.5 + 2.4): leave the loadings empty' }]
    });
  });

  it('without a matrix the nominal recipe is weighed and the chip lot is kept', () => {
    const built = planInputFromRevision(single, request({ lotNumber: 'CL-0' }));
    expect(built.ok && built.chip.lotNumber).toBe('CL-0');
    expect(rows(single, request({ lotNumber: 'CL-0' }))[1]).toEqual(['GL-530', '0.700', '0.697', '0.703']);
  });
});
