/**
 * The forecast of a revision with a recipe per chip bin: each bin simulated with its own wt %, its
 * share of the parts (largest remainder, so the counts add up to N) and the pump uniform inside the
 * bin (the other sources from the revision's variation model); the clouds pooled into one set of
 * figures. Rendering and the variance breakdown are those of the bin with the largest share (a breakdown mixes poorly across recipes).
 */
import { loadingOf, type RevisionContent } from '../../recipe';
import { cloudSample, predictYield, yieldFigures, type VariationModel, type YieldPredictionInput } from '../../blend/spread';

type Shared = Omit<YieldPredictionInput, 'concentrationsWtPct' | 'model'> & {
  /** The revision's variation model: every source but the chip wavelength, which is uniform inside each bin. */
  base: VariationModel;
};

interface Bin {
  code: string;
  fromNm: number;
  toNm: number;
  sharePct: number | null;
}

/** Parts per bin by share (equal shares when none are given), adding up to `parts`. */
export function partsPerBin(bins: readonly Bin[], parts: number): number[] {
  const shares = bins.map((b) => b.sharePct ?? 100 / bins.length);
  const total = shares.reduce((a, s) => a + s, 0);
  const exact = shares.map((s) => (total > 0 ? (parts * s) / total : parts / bins.length));
  const counts = exact.map(Math.floor);
  const order = exact.map((e, i) => ({ i, r: e - Math.floor(e) })).sort((a, b) => b.r - a.r);
  for (let k = 0; k < parts - counts.reduce((a, c) => a + c, 0); k++) counts[order[k % order.length].i]++;
  return counts;
}

/** The bin of part i of a cloud pooled in bin order with `counts` parts each. */
function binOf(bins: readonly Bin[], counts: readonly number[]): (i: number) => string {
  const ends = counts.map((_, k) => counts.slice(0, k + 1).reduce((a, c) => a + c, 0));
  return (i) =>
    bins[
      Math.max(
        0,
        ends.findIndex((e) => i < e)
      )
    ].code;
}

export function poolBinForecasts(content: RevisionContent, bins: readonly Bin[], shared: Shared) {
  const counts = partsPerBin(bins, shared.parts);
  const largest = counts.indexOf(Math.max(...counts));
  const runs = bins.map((bin, k) => {
    if (counts[k] === 0) return null;
    const wt = loadingOf(content, bin.code);
    if (!wt) throw new RangeError(`bin ${bin.code} has no wt % on the loading model`);
    const model: VariationModel = { ...shared.base, pump: { kind: 'bins', bins: [{ ...bin, sharePct: 100 }] } };
    return predictYield({ ...shared, concentrationsWtPct: wt, model, parts: counts[k], seed: shared.seed + k, breakdown: k === largest });
  });
  const live = runs.filter((r): r is NonNullable<typeof r> => r !== null);
  const concat = (pick: (r: (typeof live)[number]) => Float64Array) => {
    const out = new Float64Array(live.reduce((a, r) => a + pick(r).length, 0));
    let at = 0;
    for (const r of live) {
      out.set(pick(r), at);
      at += pick(r).length;
    }
    return out;
  };
  const cloud = { x: concat((r) => r.cloud.x), y: concat((r) => r.cloud.y), ler: concat((r) => r.cloud.ler) };
  const figures = yieldFigures(cloud, shared.centre, shared.quadrangle, shared.tolerance);
  const main = runs[largest]!;
  const r5 = (v: number) => Math.round(v * 1e5) / 1e5;
  return {
    figures,
    stored: {
      ...figures,
      rendering: main.rendering,
      breakdown: main.breakdown,
      perBin: bins.map((b, k) => ({ code: b.code, parts: counts[k] })),
      cloudSample: cloudSample(cloud.x, cloud.y, binOf(bins, counts))
    },
    cloud: { x: Array.from(cloud.x, r5), y: Array.from(cloud.y, r5) }
  };
}
