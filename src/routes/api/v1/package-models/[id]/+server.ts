import { getModel } from '$lib/server/package-models/api';
import type { RequestHandler } from './$types';

/** One package model version with its parameters, uncertainties, per-build residuals and builds. */
export const GET: RequestHandler = getModel;
