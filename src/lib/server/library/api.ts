/**
 * Handlers of /api/v1/phosphors and /api/v1/pumps (one set, parameterised by kind). Route files
 * only pick the handler. Errors are answered by apiHandler as JSON { error, issues? } with 400/404/409/413/415/422.
 */
import type { RequestEvent } from '@sveltejs/kit';
import { z } from 'zod';
import { requireUser } from '../auth/require';
import { finiteJson, readJson, readQuery } from '../api/body';
import { apiHandler } from '../http/api-handler';
import { idParam } from '../http/id-param';
import { materialFieldsSchema, materialUpdateApiSchema, spectrumKindSchema, versionSchema } from '../../library/schema';
import { mayEditLibrary, mayRead } from '../../access/policies';
import { notFound } from './errors';
import * as records from './records';
import * as editing from './editing';
import * as detail from './detail';
import { readUploadedFile } from '../api/upload';
import { previewSpectrumFile, uploadSpectrum } from './spectrum-upload';
import { DEFAULT_MAX_BYTES } from '../../spectrum-file/parse';
import { materialSpectrumTm27, tm27Response } from '../spectrum-exchange/tm27-export';
import type { MaterialKind } from './records';

type Event = Pick<RequestEvent, 'request' | 'locals' | 'url'> & { params: Record<string, string> };

const listQuerySchema = z.object({
  q: z.string().max(100).optional(),
  sort: z.enum(records.SORT_KEYS).optional(),
  dir: z.enum(['asc', 'desc']).optional(),
  archived: z.enum(['0', '1', 'true', 'false']).optional()
});

const idOf = (event: Event): number => idParam(event.params.id, `No material with id ${event.params.id}.`);

async function materialOfKind(id: number, kind: MaterialKind) {
  const m = await records.get(id);
  if (!m || m.kind !== kind) throw notFound(id);
  return m;
}

export function collection(kind: MaterialKind) {
  return {
    GET: (event: Event) =>
      apiHandler(async () => {
        requireUser(event.locals, mayRead);
        const { q, sort, dir, archived } = readQuery(event.url.searchParams, listQuerySchema);
        const list = await records.list({ kind, search: q, sort, dir, includeArchived: archived === '1' || archived === 'true' });
        return finiteJson({ items: list.map((m) => detail.toApi(m)) });
      }),
    POST: (event: Event) =>
      apiHandler(async () => {
        const user = requireUser(event.locals, mayEditLibrary);
        const body = await readJson(event, materialFieldsSchema);
        const id = await editing.create(user, kind, body);
        const created = await detail.load(id);
        return finiteJson(detail.toApi(created!.material, created!), { status: 201, headers: { location: `/api/v1/${kind}s/${id}` } });
      })
  };
}

export function item(kind: MaterialKind) {
  return {
    GET: (event: Event) =>
      apiHandler(async () => {
        requireUser(event.locals, mayRead);
        const d = await detail.load(idOf(event));
        if (!d || d.material.kind !== kind) throw notFound(event.params.id);
        return finiteJson(detail.toApi(d.material, d));
      }),
    PUT: (event: Event) =>
      apiHandler(async () => {
        const user = requireUser(event.locals, mayEditLibrary);
        const id = idOf(event);
        await materialOfKind(id, kind);
        const { version, ...fields } = await readJson(event, materialUpdateApiSchema);
        await editing.update(user, id, version, fields);
        const d = await detail.load(id);
        return finiteJson(detail.toApi(d!.material, d!));
      }),
    DELETE: (event: Event) =>
      apiHandler(async () => {
        const user = requireUser(event.locals, mayEditLibrary);
        const id = idOf(event);
        await materialOfKind(id, kind);
        await editing.remove(user, id);
        return new Response(null, { status: 204 });
      })
  };
}

const SPECTRUM_UPLOAD = { maxBytes: DEFAULT_MAX_BYTES, what: 'spectrum', defaultName: 'spectrum.csv' };

const uploadQuerySchema = z.object({
  kind: spectrumKindSchema.default('emission'),
  version: versionSchema.optional(),
  dryRun: z.enum(['0', '1', 'true', 'false']).optional()
});

const tm27QuerySchema = z.object({ kind: spectrumKindSchema.default('emission') });

/** GET: the material's current spectrum as an IES TM-27-14 document (?kind=emission|excitation). */
export function spectrumTm27(kind: MaterialKind) {
  return {
    GET: (event: Event) =>
      apiHandler(async () => {
        requireUser(event.locals, mayRead);
        const q = readQuery(event.url.searchParams, tm27QuerySchema);
        return tm27Response(await materialSpectrumTm27(idOf(event), q.kind, kind));
      })
  };
}

export function spectrumUpload(kind: MaterialKind) {
  return {
    POST: (event: Event) =>
      apiHandler(async () => {
        const user = requireUser(event.locals, mayEditLibrary);
        const id = idOf(event);
        await materialOfKind(id, kind);
        const q = readQuery(event.url.searchParams, uploadQuerySchema);
        const file = await readUploadedFile(event.request, SPECTRUM_UPLOAD);
        if (q.dryRun === '1' || q.dryRun === 'true') {
          const p = previewSpectrumFile(file, q.kind);
          return finiteJson({ saved: false, points: p.spd.wavelengths.length, metrics: p.summary, warnings: p.warnings, spectrum: p.spd });
        }
        const r = await uploadSpectrum(user, id, q.kind, file, q.version);
        return finiteJson(
          {
            saved: true,
            spectrumId: r.spectrumId,
            version: r.version,
            points: r.preview.spd.wavelengths.length,
            metrics: r.preview.summary,
            warnings: r.preview.warnings
          },
          { status: 201 }
        );
      })
  };
}
