/**
 * An approved demo revision with a recipe per chip bin (recipe content version 3), made from the
 * approved KH-W30-90 revision: four 2.5 nm peak-wavelength bins around the demo pump's peak (bin width
 * common practice). Each bin's wt % and optical fractions are invented; its predicted point is the
 * product's blend model (`mix`, optical superposition) of the demo materials with the pump shifted to
 * the bin centre (`shiftPump`), judged against the target with `colourDistance`.
 */
import { colourDistance, resolveTarget } from '../../../src/lib/aim/index';
import { mix } from '../../../src/lib/blend/mix';
import { shiftPump } from '../../../src/lib/pump-bins/shift';
import { binPump } from '../../../src/lib/blend/matrix/binPump';
import { predictRevision, PREDICTION_CORE_VERSION } from '../../../src/lib/formulations/prediction';
import { parseRecipe, type RevisionContent } from '../../../src/lib/recipe';
import { loadRevisionComponents } from '../../../src/lib/server/formulations/components';
import { contentSha256 } from '../../../src/lib/server/formulations/hash';
import { syntheticPartsCsv } from '../../../src/lib/measurements/syntheticParts';
import { DEMO, signedInContext, testDb } from './accounts';
import { B450_CHIP_BINS } from '../../../seeds/08_pump_bins';

export interface MatrixRevision {
  revisionId: number;
  formulationCode: string;
  bins: { code: string; fromNm: number; toNm: number; x: number; y: number }[];
  content: RevisionContent;
  /** Synthetic parts (invented) of a bin's recipe built on chips at the bin's centre; each phosphor wobbled by up to ±scatter. */
  partsCsv: (binCode: string, parts: number, prefix: string, scatter?: number) => string;
}

const round = (v: number, d: number) => Number(v.toFixed(d));

export async function approvedMatrixRevision(): Promise<MatrixRevision> {
  const knex = testDb();
  try {
    const base = await knex('formulation_revisions as r')
      .join('formulations as f', 'f.id', 'r.formulation_id')
      .where({ 'f.code': 'KH-W30-90', 'r.state': 'approved' })
      .first('r.content_json', 'r.created_by', 'f.name');
    const nominal = parseRecipe(base.content_json);
    const { components } = await loadRevisionComponents(knex, nominal);
    const pumpRow = await knex('materials').where({ id: nominal.pump.materialId }).first('peak_nm');
    const peakNm = Number(pumpRow!.peak_nm);
    const from0 = Math.round((peakNm - 5) * 2) / 2;
    const target = resolveTarget(nominal.target);
    const binRecipes = ['C1', 'C2', 'C3', 'C4'].map((code, k) => {
      const fromNm = from0 + 2.5 * k;
      const deltaNm = fromNm + 1.25 - peakNm;
      // Invented: a longer pump wavelength gets a little less phosphor (wt %) and optical share.
      const phosphors = nominal.phosphors.map((p) => ({
        ...p,
        opticalFraction: round(p.opticalFraction * (1 - 0.01 * deltaNm), 6),
        wtPct: p.wtPct === null ? null : round(p.wtPct * (1 - 0.015 * deltaNm), 3)
      }));
      const leak = round(1 - phosphors.reduce((a, p) => a + p.opticalFraction, 0), 6);
      const e = mix(
        { ...components, pump: shiftPump(components.pump, deltaNm) },
        { kind: 'optical', fractions: [leak, ...phosphors.map((p) => p.opticalFraction)] }
      ).evaluation;
      return {
        bin: { code, basis: 'peak' as const, fromNm, toNm: fromNm + 2.5, sharePct: null },
        pumpLeakFraction: leak,
        phosphors,
        predicted: {
          x: e.x,
          y: e.y,
          cct: e.cct,
          duv: e.duv,
          ra: e.cri.valid ? e.cri.ra : null,
          r9: e.cri.valid ? e.cri.ri[8] : null,
          steps: colourDistance(e.x, e.y, target).steps
        }
      };
    });
    const content = parseRecipe({ ...nominal, contentVersion: 3, condition: null, coldCheck: null, binRecipes });
    const sfx = Math.random().toString(36).slice(2, 6).toUpperCase();
    const formulationCode = `KH-W30-B${sfx}`;
    const [formulationId] = await knex('formulations').insert({
      code: formulationCode,
      name: `${base.name} (per chip bin)`,
      created_by: base.created_by
    });
    const [revisionId] = await knex('formulation_revisions').insert({
      formulation_id: formulationId,
      revision_no: 1,
      state: 'approved',
      content_json: JSON.stringify(content),
      predicted_json: JSON.stringify(predictRevision(content, components)),
      core_version: PREDICTION_CORE_VERSION,
      content_sha256: contentSha256(content),
      created_by: base.created_by
    });
    const bins = binRecipes.map((r) => ({ code: r.bin.code, fromNm: r.bin.fromNm, toNm: r.bin.toNm, x: r.predicted.x, y: r.predicted.y }));
    const partsCsv = (binCode: string, parts: number, prefix: string, scatter = 0.01) => {
      const r = binRecipes.find((b) => b.bin.code === binCode)!;
      const pump = shiftPump(components.pump, r.bin.fromNm + 1.25 - peakNm);
      const fractions = [r.pumpLeakFraction, ...r.phosphors.map((p) => p.opticalFraction)];
      return syntheticPartsCsv({ ...components, pump }, fractions, { parts, prefix, scatter });
    };
    return { revisionId, formulationCode, bins, content, partsCsv };
  } finally {
    await knex.destroy();
  }
}

/**
 * Synthetic parts (invented) of one chip bin's recipe of a stored revision: the pump moved to the bin's
 * centre (`binPump`), the bin's optical shares, every phosphor wobbled by up to ±scatter.
 */
export async function binPartsCsv(revisionId: number, binCode: string, parts: number, prefix: string, scatter: number): Promise<string> {
  const knex = testDb();
  try {
    const row = await knex('formulation_revisions').where({ id: revisionId }).first('content_json');
    if (!row) throw new Error(`revision ${revisionId} not found`);
    const content = parseRecipe(row.content_json);
    const bin = (content.binRecipes ?? []).find((b) => b.bin.code === binCode);
    if (!bin) throw new Error(`revision ${revisionId} has no recipe for chip bin ${binCode}`);
    const { components } = await loadRevisionComponents(knex, content);
    const pump = binPump(components.pump, (bin.bin.fromNm + bin.bin.toNm) / 2, bin.bin.basis).pump;
    const fractions = [bin.pumpLeakFraction, ...bin.phosphors.map((p) => p.opticalFraction)];
    return syntheticPartsCsv({ ...components, pump }, fractions, { parts, prefix, scatter });
  } finally {
    await knex.destroy();
  }
}

/** Puts the demo bins back on a pump (other suites change them), through the API as a formulator. */
export async function resetPumpBins(pumpId: number): Promise<void> {
  const api = await signedInContext(DEMO.formulator);
  try {
    const read = await api.get(`/api/v1/pumps/${pumpId}/bins`);
    const { version } = (await read.json()) as { version: number };
    const put = await api.put(`/api/v1/pumps/${pumpId}/bins`, { data: { version, set: B450_CHIP_BINS } });
    if (put.status() !== 200) throw new Error(`resetting the pump bins answered ${put.status()}: ${await put.text()}`);
  } finally {
    await api.dispose();
  }
}
