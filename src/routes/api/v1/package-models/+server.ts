import { createModel, listModels } from '$lib/server/package-models/api';
import type { RequestHandler } from './$types';

/** Package models: every version (GET); fit a new model or a new version of one from builds (POST). */
export const GET: RequestHandler = listModels;
export const POST: RequestHandler = createModel;
