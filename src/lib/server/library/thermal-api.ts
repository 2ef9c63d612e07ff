/**
 * Handlers of /api/v1/{phosphors,pumps}/:id/thermal: GET the thermal data (null = not
 * characterised), PUT a replacement (body names the thermal version read; stale → 409), POST a CSV
 * (?version=, pumps also ?peakDriftNmPerK=&peakDriftNmPerMa=&referenceCurrentMa=); a CSV with any
 * problem saves nothing and names the line (422).
 */
import type { RequestEvent } from '@sveltejs/kit';
import { z } from 'zod';
import { requireUser } from '../auth/require';
import { finiteJson, readJson, readQuery } from '../api/body';
import { apiHandler } from '../http/api-handler';
import { idParam } from '../http/id-param';
import { readUploadedFile } from '../api/upload';
import { mayEditLibrary, mayRead } from '../../access/policies';
import { materialThermalSchema } from '../../blend/thermal/schema';
import { notFound } from './errors';
import * as records from './records';
import { getThermal, putThermal, uploadThermalCsv } from './thermal';
import type { MaterialKind } from './records';

type Event = Pick<RequestEvent, 'request' | 'locals' | 'url'> & { params: Record<string, string> };

const versionField = z.coerce.number().int('version must be a whole number').min(0, 'version must be 0 or more');

export const thermalPutSchema = z
  .object({ version: versionField, thermal: materialThermalSchema, source: z.string().trim().max(200).nullable().default(null) })
  .strict();

const optionalNumber = z.coerce.number().finite().optional();
const csvQuerySchema = z.object({
  version: versionField.default(0),
  peakDriftNmPerK: optionalNumber,
  peakDriftNmPerMa: optionalNumber,
  referenceCurrentMa: optionalNumber
});

const CSV_UPLOAD = { maxBytes: 64 * 1024, what: 'thermal CSV', defaultName: 'thermal.csv' };

async function materialOf(event: Event, kind: MaterialKind) {
  const id = idParam(event.params.id, `No material with id ${event.params.id}.`);
  const m = await records.get(id);
  if (!m || m.kind !== kind) throw notFound(id);
  return m;
}

export function thermalApi(kind: MaterialKind) {
  return {
    GET: (event: Event) =>
      apiHandler(async () => {
        requireUser(event.locals, mayRead);
        const m = await materialOf(event, kind);
        const r = await getThermal(m.id);
        return finiteJson({ ...r, characterised: r.thermal !== null });
      }),
    PUT: (event: Event) =>
      apiHandler(async () => {
        const user = requireUser(event.locals, mayEditLibrary);
        const m = await materialOf(event, kind);
        const body = await readJson(event, thermalPutSchema);
        await putThermal(user, m.id, body.version, body.thermal, body.source);
        return finiteJson({ ...(await getThermal(m.id)), characterised: true });
      }),
    POST: (event: Event) =>
      apiHandler(async () => {
        const user = requireUser(event.locals, mayEditLibrary);
        const m = await materialOf(event, kind);
        const q = readQuery(event.url.searchParams, csvQuerySchema);
        const file = await readUploadedFile(event.request, CSV_UPLOAD);
        const drift =
          kind === 'pump'
            ? {
                peakDriftNmPerK: q.peakDriftNmPerK ?? Number.NaN,
                peakDriftNmPerMa: q.peakDriftNmPerMa ?? null,
                referenceCurrentMa: q.referenceCurrentMa ?? null
              }
            : undefined;
        await uploadThermalCsv(user, m.id, kind, q.version, { name: file.name, text: file.body.toString('utf8') }, drift);
        return finiteJson({ ...(await getThermal(m.id)), characterised: true }, { status: 201 });
      })
  };
}
