import { requireUser } from '$lib/server/auth/require';
import { finiteJson, readJson } from '$lib/server/api/body';
import { solveProblemSchema } from '$lib/blend';
import { isBenchCondition } from '$lib/aim/condition';
import { thermalByMaterialIds } from '$lib/server/library/thermal';
import type { ThermalById } from '$lib/blend/thermal';
import { solveOffThread } from '$lib/server/solver/pool';
import { apiHandler } from '$lib/server/http/api-handler';
import type { RequestHandler } from './$types';

/**
 * Blend problem (components, target, tolerance, floors, objective, optional operating condition) →
 * ranked candidates or the reason none exist. A hot condition without thermal data in the body uses
 * the library's for the components that are library materials (numeric ids).
 */
export const POST: RequestHandler = (event) =>
  apiHandler(async () => {
    requireUser(event.locals);
    const body = await readJson(event, solveProblemSchema);
    const condition = body.condition ?? null;
    let thermal: ThermalById = body.thermal ?? {};
    if (condition && !isBenchCondition(condition) && body.thermal === undefined) {
      const { pump, phosphors } = body.components;
      const ids = [pump.id, ...phosphors.map((p) => p.id)].filter((id) => /^\d{1,10}$/.test(id)).map(Number);
      thermal = await thermalByMaterialIds(ids);
    }
    return finiteJson(await solveOffThread({ ...body, condition, thermal }));
  });
