/**
 * A revision with a recipe per chip bin is forecast as the line builds it: each bin's parts with
 * that bin's recipe. Against the nominal recipe on every bin (the same pump spread, the same seed),
 * the pooled cloud sits closer to the target. Bins of 2.5 nm (common practice); values invented.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb } from '../../../src/lib/server/db/index';
import { createFormulationWithDraft } from '../../../src/lib/server/formulations/save';
import { solveRevisionMatrix } from '../../../src/lib/server/formulations/bin-matrix';
import { getPumpBins, putPumpBins } from '../../../src/lib/server/library/pump-bins';
import { predictRevisionYield } from '../../../src/lib/server/yield-predictions/predict';
import { partsPerBin } from '../../../src/lib/server/yield-predictions/per-bin';
import { pumpBinSetSchema } from '../../../src/lib/pump-bins';
import { variationModelSchema } from '../../../src/lib/blend/spread';
import { cast, uniqueCode, warmWhite, type Cast } from '../formulations/support';

let c: Cast;
const set = pumpBinSetSchema.parse({
  basis: 'peak',
  bins: [
    { code: 'B3', fromNm: 445, toNm: 447.5, sharePct: 25 },
    { code: 'B4', fromNm: 447.5, toNm: 450, sharePct: 25 },
    { code: 'B5', fromNm: 450, toNm: 452.5, sharePct: 25 },
    { code: 'B6', fromNm: 452.5, toNm: 455, sharePct: 25 }
  ]
});

describe('yield forecast of a recipe matrix', () => {
  beforeAll(async () => {
    c = await cast();
  });
  afterAll(closeDb);

  it('splits the parts by share, adding up exactly', () => {
    expect(partsPerBin(set.bins, 1000)).toEqual([250, 250, 250, 250]);
    expect(
      partsPerBin(
        [
          { ...set.bins[0], sharePct: 1 },
          { ...set.bins[1], sharePct: 2 }
        ],
        10
      )
    ).toEqual([3, 7]);
    expect(
      partsPerBin(
        [{ ...set.bins[0], sharePct: null }, { ...set.bins[1], sharePct: null }, set.bins[2]].map((b) => ({ ...b, sharePct: null })),
        10
      )
    ).toEqual([4, 3, 3]);
  });

  it('pools each bin with its own recipe, closer to the target than the nominal recipe on every bin', async () => {
    const content = await warmWhite();
    const pumpId = content.pump.materialId;
    await putPumpBins(c.admin, pumpId, (await getPumpBins(pumpId)).version, set);
    const code = uniqueCode('YB');
    const made = await createFormulationWithDraft(c.rhea, { code, name: `Yield ${code}`, content });
    await solveRevisionMatrix(c.rhea, made.revisionId, 1);
    const perBin = await predictRevisionYield(c.rhea, { revisionId: made.revisionId, model: null, parts: 4000, seed: 3 });
    const nominal = await predictRevisionYield(c.rhea, {
      revisionId: made.revisionId,
      model: variationModelSchema.parse({ pump: { kind: 'bins', bins: set.bins } }),
      parts: 4000,
      seed: 3
    });
    expect(perBin.cloud.x).toHaveLength(4000);
    expect(perBin.figures.meanSteps).toBeLessThan(nominal.figures.meanSteps);
  });
});
