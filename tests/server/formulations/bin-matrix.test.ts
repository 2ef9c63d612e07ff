/**
 * A draft's recipe matrix from the pump's chip bins (2.5 nm bins, common practice; invented values):
 * solved, stored as content version 3, each bin within 0.5 step of the target, and bound by the
 * signature hash (a changed bin recipe changes the hash).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import { createFormulationWithDraft } from '../../../src/lib/server/formulations/save';
import { solveRevisionMatrix } from '../../../src/lib/server/formulations/bin-matrix';
import { getRevision } from '../../../src/lib/server/formulations/read';
import { contentSha256 } from '../../../src/lib/server/formulations/hash';
import { getPumpBins, putPumpBins } from '../../../src/lib/server/library/pump-bins';
import { pumpBinSetSchema } from '../../../src/lib/pump-bins';
import { cast, uniqueCode, warmWhite, type Cast } from './support';

let c: Cast;

describe('recipe matrix of a draft', () => {
  beforeAll(async () => {
    c = await cast();
  });
  afterAll(closeDb);

  it('is solved from the pump bins, stored, within 0.5 step per bin, and covered by the content hash', async () => {
    const content = await warmWhite();
    const pumpId = content.pump.materialId;
    const set = pumpBinSetSchema.parse({
      basis: 'peak',
      bins: [
        { code: 'B4', fromNm: 447.5, toNm: 450, sharePct: 40 },
        { code: 'B5', fromNm: 450, toNm: 452.5, sharePct: 60 }
      ]
    });
    const before = await getPumpBins(pumpId);
    await putPumpBins(c.admin, pumpId, before.version, set);
    await expect(putPumpBins(c.admin, pumpId, before.version, set)).rejects.toThrow(/changed by someone else/);

    const code = uniqueCode('BM');
    const made = await createFormulationWithDraft(c.rhea, { code, name: `Matrix ${code}`, content });
    await solveRevisionMatrix(c.rhea, made.revisionId, 1);
    const rev = (await getRevision(made.revisionId))!;
    expect(rev.content.contentVersion).toBe(3);
    const matrix = rev.content.binRecipes!;
    expect(matrix.map((r) => r.bin.code)).toEqual(['B4', 'B5']);
    for (const r of matrix) {
      expect(r.predicted!.steps).toBeLessThan(0.5);
      expect(r.phosphors.map((p) => p.materialId)).toEqual(content.phosphors.map((p) => p.materialId));
    }
    // A longer-wavelength bin needs different amounts than a shorter one.
    expect(matrix[0].phosphors.map((p) => p.wtPct)).not.toEqual(matrix[1].phosphors.map((p) => p.wtPct));
    const stored = (await db()('formulation_revisions').where({ id: made.revisionId }).first('content_sha256'))!.content_sha256;
    expect(contentSha256(rev.content)).toBe(stored);
    const tampered = {
      ...rev.content,
      binRecipes: [{ ...matrix[0], phosphors: matrix[0].phosphors.map((p) => ({ ...p, wtPct: (p.wtPct ?? 0) + 0.001 })) }, matrix[1]]
    };
    expect(contentSha256(tampered)).not.toBe(stored);
  });
});
