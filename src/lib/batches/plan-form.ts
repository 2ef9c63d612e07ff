/**
 * The "plan a batch" form as flat string fields (what a browser posts) ↔ the create request.
 * Pure, so the page computes the same preview in the browser as the server does on submit.
 */
import type { CreateBatchRequest } from './schema';
import type { ToleranceSpec } from './weighout/schema';

export const MAX_ADDITIVES = 2;

export type PlanFields = Record<string, string>;

const num = (v: string | undefined): number => (v === undefined || v.trim() === '' ? Number.NaN : Number(v.trim().replace(',', '.')));
const text = (v: string | undefined): string => (v ?? '').trim();
const tol = (f: PlanFields, key: string): ToleranceSpec => ({ kind: f[`${key}Kind`] === 'g' ? 'g' : 'pct', value: num(f[`${key}Value`]) });

/** Request object for zod (numbers may be NaN: zod then names the field). */
export function fieldsToRequest(f: PlanFields, phosphorCount: number): CreateBatchRequest {
  const basis = f.basis === 'phr' ? 'phr' : 'wtPctOfSlurry';
  const idx = Array.from({ length: phosphorCount }, (_, i) => i);
  const additives = Array.from({ length: MAX_ADDITIVES }, (_, j) => j)
    .filter((j) => (f[`add${j}Code`] ?? '').trim() !== '' || (f[`add${j}Pct`] ?? '').trim() !== '')
    .map((j) => ({
      code: (f[`add${j}Code`] ?? '').trim(),
      name: (f[`add${j}Name`] ?? '').trim() || (f[`add${j}Code`] ?? '').trim(),
      pct: num(f[`add${j}Pct`]),
      tolerance: tol(f, `add${j}Tol`)
    }));
  const typedPcts = idx.map((i) => text(f[`pct${i}`]));
  const chipGiven = [f.chipLot, f.chipBinCode, f.chipWavelengthNm].some((v) => text(v) !== '');
  return {
    revisionId: num(f.revisionId),
    sizing:
      f.sizingKind === 'parts'
        ? { kind: 'parts', partCount: num(f.partCount), dispenseMassG: num(f.dispenseMassG), yieldLossPct: num(f.yieldLossPct) }
        : { kind: 'mass', batchMassG: num(f.batchMassG) },
    loading:
      f.loadingMode === 'total'
        ? { mode: 'total', basis, totalPct: num(f.totalPct) }
        : // All loadings left empty: the revision's own (the chip bin's recipe with a recipe matrix).
          { mode: 'perPhosphor', basis, pcts: typedPcts.every((v) => v === '') ? undefined : typedPcts.map((v) => num(v)) },
    phosphorTolerances: idx.map((i) => tol(f, `p${i}Tol`)),
    siliconeTolerances: { a: tol(f, 'aTol'), b: tol(f, 'bTol') },
    additives,
    balance: { resolutionG: num(f.resolutionG), minWeightG: num(f.minWeightG), ref: (f.balanceRef ?? '').trim() || undefined },
    chipLot: chipGiven
      ? {
          lotNumber: text(f.chipLot),
          binCode: text(f.chipBinCode) || undefined,
          wavelengthNm: text(f.chipWavelengthNm) === '' ? undefined : num(f.chipWavelengthNm)
        }
      : null,
    plantLimitMin: (f.plantLimitMin ?? '').trim() === '' ? null : num(f.plantLimitMin),
    notes: (f.notes ?? '').trim() || undefined
  };
}

/** Starting values of the form for a revision (loadings from its loading model when it has them). */
export function defaultFields(revisionId: number, phosphorCount: number, loadings: number[] | null): PlanFields {
  const f: PlanFields = {
    revisionId: String(revisionId),
    sizingKind: 'mass',
    batchMassG: '20',
    partCount: '500',
    dispenseMassG: '0.025',
    yieldLossPct: '15',
    loadingMode: 'perPhosphor',
    basis: 'wtPctOfSlurry',
    totalPct: loadings ? String(Number(loadings.reduce((a, b) => a + b, 0).toFixed(4))) : '',
    aTolKind: 'pct',
    aTolValue: '1',
    bTolKind: 'pct',
    bTolValue: '1',
    resolutionG: '0.001',
    minWeightG: '0.05',
    balanceRef: '',
    chipLot: '',
    chipBinCode: '',
    chipWavelengthNm: '',
    plantLimitMin: '',
    notes: ''
  };
  for (let i = 0; i < phosphorCount; i++) {
    f[`pct${i}`] = loadings ? String(loadings[i]) : '';
    f[`p${i}TolKind`] = 'pct';
    f[`p${i}TolValue`] = '0.5';
  }
  for (let j = 0; j < MAX_ADDITIVES; j++)
    Object.assign(f, { [`add${j}Code`]: '', [`add${j}Name`]: '', [`add${j}Pct`]: '', [`add${j}TolKind`]: 'pct', [`add${j}TolValue`]: '1' });
  return f;
}
