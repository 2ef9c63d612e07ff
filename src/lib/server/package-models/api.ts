/** Handlers of /api/v1/package-models (list, create by fit) and /api/v1/package-models/[id]. */
import type { RequestEvent } from '@sveltejs/kit';
import { requireUser } from '../auth/require';
import { ApiError, finiteJson, handleApi, readJson } from '../api/body';
import { ALL, FORMULATION_EDITORS } from '../../access/routes/shared';
import { packageFitSchema } from './schema';
import { createByFit } from './fit';
import * as records from './records';

type Event = Pick<RequestEvent, 'request' | 'locals'> & { params: Record<string, string> };

export function listModels(event: Event): Promise<Response> {
  return handleApi(async () => {
    requireUser(event.locals, ALL);
    return finiteJson({ items: await records.list() });
  });
}

export function createModel(event: Event): Promise<Response> {
  return handleApi(async () => {
    const user = requireUser(event.locals, FORMULATION_EDITORS);
    const body = await readJson(event, packageFitSchema);
    const id = await createByFit(user, body);
    return finiteJson(await records.get(id), { status: 201, headers: { location: `/api/v1/package-models/${id}` } });
  });
}

export function getModel(event: Event): Promise<Response> {
  return handleApi(async () => {
    requireUser(event.locals, ALL);
    const id = Number(event.params.id);
    const model = Number.isInteger(id) && id > 0 ? await records.get(id) : null;
    if (!model) throw new ApiError(404, `No package model with id ${event.params.id}.`);
    return finiteJson(model);
  });
}
