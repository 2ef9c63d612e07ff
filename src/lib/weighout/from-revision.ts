/**
 * Weigh-out input from an approved revision and the batch request: the revision fixes the
 * phosphors, their split and the silicone system; the request sets size, loading basis and level,
 * tolerances, additives and the balance.
 *
 * The revision's per-phosphor loadings are wt % of total slurry (loading model). On the phr basis
 * they are converted keeping the phosphor : silicone ratio of the revision:
 * phrᵢ = wᵢ · 100 / (100 − Σw)  (phosphor mass per 100 g of silicone).
 */
import { Rat } from './rational';
import type { LoadingBasis, Sizing, ToleranceSpec, WeighoutInput } from './schema';
import type { WeighoutIssue } from './compute';
import type { RevisionContent } from '../formulations/content';

/** Common practice: ±0.5 % for phosphors, ±1 % for silicone parts and additives. */
export const DEFAULT_TOLERANCE: Record<'phosphor' | 'additive' | 'silicone', ToleranceSpec> = {
  phosphor: { kind: 'pct', value: 0.5 },
  additive: { kind: 'pct', value: 1 },
  silicone: { kind: 'pct', value: 1 }
};

/** The revision's per-phosphor loadings on the chosen basis, or null when the revision has none. */
export function revisionLoadings(content: RevisionContent, basis: 'wtPctOfSlurry' | 'phr'): number[] | null {
  const wt = content.phosphors.map((p) => p.wtPct);
  if (wt.some((w) => w === null || w <= 0)) return null;
  if (basis === 'wtPctOfSlurry') return wt as number[];
  const sum = (wt as number[]).reduce((a, w) => a.add(Rat.fromNumber(w)), Rat.ZERO);
  if (sum.gte(Rat.HUNDRED)) return null;
  return (wt as number[]).map((w) => Number(Rat.fromNumber(w).mul(Rat.HUNDRED).div(Rat.HUNDRED.sub(sum)).toFixed(4)));
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

export function weighoutInputFromRevision(content: RevisionContent, req: WeighoutRequest): FromRevisionResult {
  const n = content.phosphors.length;
  const fromRevision = revisionLoadings(content, req.loading.basis);
  let pcts: number[];
  let totalPct: number | null = null;
  if (req.loading.mode === 'perPhosphor') {
    const given = req.loading.pcts ?? fromRevision;
    if (!given) return { ok: false, errors: [{ path: 'loading.pcts', message: 'the revision has no per-phosphor loading from the loading model: enter a loading for every phosphor' }] };
    if (given.length !== n) return { ok: false, errors: [{ path: 'loading.pcts', message: `give one loading per phosphor (${n})` }] };
    pcts = given;
  } else {
    if (!fromRevision) return { ok: false, errors: [{ path: 'loading', message: 'the revision has no per-phosphor split from the loading model: enter per-phosphor loadings instead of a total' }] };
    pcts = fromRevision;
    totalPct = req.loading.totalPct;
  }
  const tolerances = req.phosphorTolerances ?? [];
  if (tolerances.length > n) return { ok: false, errors: [{ path: 'phosphorTolerances', message: `at most one tolerance per phosphor (${n})` }] };
  return {
    ok: true,
    input: {
      sizing: req.sizing,
      loading: { basis: req.loading.basis, totalPct },
      phosphors: content.phosphors.map((p, i) => ({
        materialId: p.materialId, code: p.code, name: p.name, pct: pcts[i], tolerance: tolerances[i] ?? DEFAULT_TOLERANCE.phosphor
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
