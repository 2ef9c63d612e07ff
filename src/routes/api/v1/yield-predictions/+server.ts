import { requireUser } from '$lib/server/auth/require';
import { finiteJson, readJson } from '$lib/server/api/body';
import { apiHandler } from '$lib/server/http/api-handler';
import { unprocessable } from '$lib/errors/domain-error';
import { prepareBasis } from '$lib/blend/basis';
import { resolveTarget } from '$lib/aim/target';
import { predictYield, pumpPeakNm } from '$lib/blend/spread';
import { yieldPredictionRequestSchema } from '$lib/blend/spread/request';
import type { RequestHandler } from './$types';

const round5 = (v: number): number => Math.round(v * 1e5) / 1e5;

/** A blend on the loading model + variation model → predicted cloud, yield figures and variance breakdown (seeded). */
export const POST: RequestHandler = (event) =>
  apiHandler(async () => {
    requireUser(event.locals);
    const body = await readJson(event, yieldPredictionRequestSchema);
    const basis = prepareBasis(body.components).loading;
    if (!basis) throw unprocessable('every phosphor needs an absorption coefficient for a yield prediction');
    if (body.concentrationsWtPct.length !== basis.emission.length) {
      throw unprocessable(`concentrationsWtPct: expected ${basis.emission.length} values, one per phosphor`);
    }
    const target = resolveTarget(body.target);
    const p = predictYield({
      basis,
      concentrationsWtPct: body.concentrationsWtPct,
      pathLengthMm: body.loading.pathLengthMm,
      pumpPeakNm: pumpPeakNm(basis),
      centre: { x: target.x, y: target.y, cct: target.cct },
      quadrangle: target.ansiBin,
      tolerance: body.tolerance ?? null,
      model: body.model,
      parts: body.parts,
      seed: body.seed,
      breakdown: body.breakdown
    });
    return finiteJson({
      parts: body.parts,
      seed: body.seed,
      model: body.model,
      target: { x: target.x, y: target.y, cct: target.cct, duv: target.duv, label: target.label },
      figures: p.figures,
      rendering: p.rendering,
      breakdown: p.breakdown,
      cloud: body.cloud ? { x: Array.from(p.cloud.x, round5), y: Array.from(p.cloud.y, round5) } : null
    });
  });
