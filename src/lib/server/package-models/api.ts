/** Handlers of /api/v1/package-models (list, create by fit) and /api/v1/package-models/[id]. */
import type { RequestEvent } from '@sveltejs/kit';
import { requireUser } from '../auth/require';
import { finiteJson, readJson } from '../api/body';
import { apiHandler } from '../http/api-handler';
import { idParam } from '../http/id-param';
import { notFound } from '../../errors/domain-error';
import { mayEditLibrary, mayRead } from '../../access/policies';
import { packageFitSchema } from './schema';
import { createByFit } from './fit';
import * as records from './records';

type Event = Pick<RequestEvent, 'request' | 'locals'> & { params: Record<string, string> };

export function listModels(event: Event): Promise<Response> {
  return apiHandler(async () => {
    requireUser(event.locals, mayRead);
    return finiteJson({ items: await records.list() });
  });
}

export function createModel(event: Event): Promise<Response> {
  return apiHandler(async () => {
    const user = requireUser(event.locals, mayEditLibrary);
    const body = await readJson(event, packageFitSchema);
    const id = await createByFit(user, body);
    return finiteJson(await records.get(id), { status: 201, headers: { location: `/api/v1/package-models/${id}` } });
  });
}

export function getModel(event: Event): Promise<Response> {
  return apiHandler(async () => {
    requireUser(event.locals, mayRead);
    const message = `No package model with id ${event.params.id}.`;
    const model = await records.get(idParam(event.params.id, message));
    if (!model) throw notFound(message);
    return finiteJson(model);
  });
}
