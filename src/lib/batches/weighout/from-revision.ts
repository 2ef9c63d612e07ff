/**
 * Weigh-out input from an approved revision and the batch request: the revision fixes the
 * phosphors, their split and the silicone system; the request sets size, loading basis and level,
 * tolerances, additives and the balance.
 *
 * The revision's per-phosphor loadings are wt % of total slurry (loading model). On the phr basis
 * they are converted keeping the phosphor : silicone ratio of the revision:
 * phrᵢ = wᵢ · 100 / (100 − Σw)  (phosphor mass per 100 g of silicone).
 * The conversion stays exact (rationals): the phr printed to 4 decimals is for people; the
 * weigh-out is computed from the exact fraction, so the lines weigh the revision's exact masses.
 * With a recipe matrix, `binCode` names the chip bin whose recipe is weighed (the recipe accessors
 * refuse a bin the matrix lacks); without one, the one recipe serves every bin.
 */
import { Rat } from './rational';
import type { LoadingBasis, Sizing, ToleranceSpec, WeighoutInput } from './schema';
import type { WeighoutIssue } from './compute';
import { loadingOf, phosphorLines, type RevisionContent } from '../../recipe';

/** Common practice: ±0.5 % for phosphors, ±1 % for silicone parts and additives. */
export const DEFAULT_TOLERANCE: Record<'phosphor' | 'additive' | 'silicone', ToleranceSpec> = {
  phosphor: { kind: 'pct', value: 0.5 },
  additive: { kind: 'pct', value: 1 },
  silicone: { kind: 'pct', value: 1 }
};

/**
 * The revision's per-phosphor loadings on the chosen basis, exactly (rationals from the wt % as
 * written), or null when the revision has none or they leave no silicone.
 */
export function revisionLoadingsExact(content: RevisionContent, basis: 'wtPctOfSlurry' | 'phr', binCode?: string): Rat[] | null {
  const wt = loadingOf(content, binCode);
  if (wt === null) return null;
  const exact = wt.map((w) => Rat.fromNumber(w));
  if (basis === 'wtPctOfSlurry') return exact;
  const sum = exact.reduce((a, w) => a.add(w), Rat.ZERO);
  if (sum.gte(Rat.HUNDRED)) return null;
  return exact.map((w) => w.mul(Rat.HUNDRED).div(Rat.HUNDRED.sub(sum)));
}

/** The same loadings as printed (4 decimals): for display and for a person to copy, never to weigh from. */
export function revisionLoadings(content: RevisionContent, basis: 'wtPctOfSlurry' | 'phr', binCode?: string): number[] | null {
  return revisionLoadingsExact(content, basis, binCode)?.map(printPct) ?? null;
}

const printPct = (r: Rat) => Number(r.toFixed(4));

/** A typed loading as is; an exact one as its print plus the fraction the masses are computed from. */
function loadingFields(pct: number | Rat): { pct: number; pctExact?: string } {
  if (typeof pct === 'number') return { pct };
  const printed = printPct(pct);
  return Rat.fromNumber(printed).eq(pct) ? { pct: printed } : { pct: printed, pctExact: pct.toFraction() };
}

/** What a batch request sets on top of the revision (the batch schema's request satisfies it). */
export interface WeighoutRequest {
  sizing: Sizing;
  loading: { mode: 'perPhosphor'; basis: LoadingBasis; pcts?: number[] } | { mode: 'total'; basis: LoadingBasis; totalPct: number };
  phosphorTolerances?: ToleranceSpec[];
  siliconeTolerances?: { a: ToleranceSpec; b: ToleranceSpec };
  additives?: WeighoutInput['additives'];
  balance: { resolutionG: number; minWeightG: number };
}

export type FromRevisionResult = { ok: true; input: WeighoutInput } | { ok: false; errors: WeighoutIssue[] };

export function weighoutInputFromRevision(content: RevisionContent, req: WeighoutRequest, binCode?: string): FromRevisionResult {
  const lines = phosphorLines(content, binCode);
  const n = lines.length;
  const fromRevision = revisionLoadingsExact(content, req.loading.basis, binCode);
  let pcts: (number | Rat)[];
  let totalPct: number | null = null;
  if (req.loading.mode === 'perPhosphor') {
    // A typed loading equal to the revision's printed one is the revision's: weigh its exact value.
    const exactOf = (v: number, i: number) => (fromRevision?.[i] && printPct(fromRevision[i]) === v ? fromRevision[i] : v);
    const given = req.loading.pcts?.map(exactOf) ?? fromRevision;
    if (!given)
      return {
        ok: false,
        errors: [
          {
            path: 'loading.pcts',
            message: 'the revision has no per-phosphor loading from the loading model: enter a loading for every phosphor'
          }
        ]
      };
    if (given.length !== n) return { ok: false, errors: [{ path: 'loading.pcts', message: `give one loading per phosphor (${n})` }] };
    pcts = given;
  } else {
    if (!fromRevision)
      return {
        ok: false,
        errors: [
          {
            path: 'loading',
            message: 'the revision has no per-phosphor split from the loading model: enter per-phosphor loadings instead of a total'
          }
        ]
      };
    pcts = fromRevision;
    totalPct = req.loading.totalPct;
  }
  const tolerances = req.phosphorTolerances ?? [];
  if (tolerances.length > n)
    return { ok: false, errors: [{ path: 'phosphorTolerances', message: `at most one tolerance per phosphor (${n})` }] };
  return {
    ok: true,
    input: {
      sizing: req.sizing,
      loading: { basis: req.loading.basis, totalPct },
      phosphors: lines.map((p, i) => ({
        materialId: p.materialId,
        code: p.code,
        name: p.name,
        ...loadingFields(pcts[i]),
        tolerance: tolerances[i] ?? DEFAULT_TOLERANCE.phosphor
      })),
      additives: req.additives ?? [],
      silicone: {
        name: content.silicone.name,
        ratioA: content.silicone.ratioA,
        ratioB: content.silicone.ratioB,
        toleranceA: req.siliconeTolerances?.a ?? DEFAULT_TOLERANCE.silicone,
        toleranceB: req.siliconeTolerances?.b ?? DEFAULT_TOLERANCE.silicone
      },
      balance: { resolutionG: req.balance.resolutionG, minWeightG: req.balance.minWeightG }
    }
  };
}
