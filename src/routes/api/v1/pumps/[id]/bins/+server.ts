import { z } from 'zod';
import { requireUser } from '$lib/server/auth/require';
import { finiteJson, readJson } from '$lib/server/api/body';
import { apiHandler } from '$lib/server/http/api-handler';
import { idParam } from '$lib/server/http/id-param';
import { mayEditLibrary, mayRead } from '$lib/access/policies';
import { pumpBinSetSchema } from '$lib/pump-bins/schema';
import { getPumpBins, putPumpBins } from '$lib/server/library/pump-bins';
import { notFound } from '$lib/server/library/errors';
import * as records from '$lib/server/library/records';
import type { RequestHandler } from './$types';

const putSchema = z.object({ version: z.coerce.number().int().min(0, 'version must be 0 or more'), set: pumpBinSetSchema }).strict();

async function pumpOf(id: string) {
  const materialId = idParam(id, `No pump with id ${id}.`);
  const m = await records.get(materialId);
  if (!m || m.kind !== 'pump') throw notFound(materialId);
  return m;
}

/** The wavelength bins of one pump: read, or replace (body names the version read; stale → 409). */
export const GET: RequestHandler = (event) =>
  apiHandler(async () => {
    requireUser(event.locals, mayRead);
    return finiteJson(await getPumpBins((await pumpOf(event.params.id)).id));
  });

export const PUT: RequestHandler = (event) =>
  apiHandler(async () => {
    const user = requireUser(event.locals, mayEditLibrary);
    const m = await pumpOf(event.params.id);
    const body = await readJson(event, putSchema);
    const version = await putPumpBins(user, m.id, body.version, body.set);
    return finiteJson(await getPumpBins(m.id), { status: 200, headers: { 'x-version': String(version) } });
  });
