/**
 * JSON bodies of the API: size limit, parse, zod validation. Every failure becomes a clear
 * JSON error ({ error, issues? }) with 400 (malformed or invalid), 413 (too large) or 415
 * (not JSON). Spectral-core input errors become 422 through `computeOr422`.
 */
import { json, type RequestEvent } from '@sveltejs/kit';
import type { z } from 'zod';
import { SpectrumInputError } from '../../spectral/errors';
import { BlendInputError } from '../../blend/errors';

export const MAX_JSON_BYTES = 2 * 1024 * 1024;

export class ApiError extends Error {
  constructor(readonly status: number, message: string, readonly issues?: { path: string; message: string }[]) {
    super(message);
  }
  response(): Response {
    return json({ error: this.message, ...(this.issues ? { issues: this.issues } : {}) }, { status: this.status });
  }
}

/** zod issues as `path: message` pairs a person can read. */
export function describeIssues(error: z.ZodError): { path: string; message: string }[] {
  return error.issues.map((i) => ({ path: i.path.join('.') || '(body)', message: i.message }));
}

export async function readJson<S extends z.ZodType>(event: Pick<RequestEvent, 'request'>, schema: S): Promise<z.infer<S>> {
  const { request } = event;
  const type = request.headers.get('content-type') ?? '';
  if (!/^application\/json\b/i.test(type)) throw new ApiError(415, 'Send the body as JSON (Content-Type: application/json).');
  const declared = Number(request.headers.get('content-length') ?? '0');
  if (declared > MAX_JSON_BYTES) throw new ApiError(413, `The body is larger than ${MAX_JSON_BYTES / 1024 / 1024} MB.`);
  const text = await request.text();
  if (Buffer.byteLength(text) > MAX_JSON_BYTES) throw new ApiError(413, `The body is larger than ${MAX_JSON_BYTES / 1024 / 1024} MB.`);
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch {
    throw new ApiError(400, 'The body is not valid JSON.');
  }
  const parsed = schema.safeParse(raw);
  if (!parsed.success) {
    const issues = describeIssues(parsed.error);
    throw new ApiError(400, `Invalid request: ${issues.map((i) => `${i.path}: ${i.message}`).join('; ')}`, issues);
  }
  return parsed.data;
}

/** Query-string parameters validated with zod: bad values are a 400 naming them, never a silent default. */
export function readQuery<S extends z.ZodType>(params: URLSearchParams, schema: S, fixed: Record<string, unknown> = {}): z.infer<S> {
  const parsed = schema.safeParse({ ...Object.fromEntries(params), ...fixed });
  if (!parsed.success) {
    const issues = describeIssues(parsed.error);
    throw new ApiError(400, `Invalid query: ${issues.map((i) => `${i.path}: ${i.message}`).join('; ')}`, issues);
  }
  return parsed.data;
}

/** Runs a handler; ApiError and SpectrumInputError become JSON errors, anything else propagates (500). */
export async function handleApi(run: () => Promise<Response> | Response): Promise<Response> {
  try {
    return await run();
  } catch (err) {
    if (err instanceof ApiError) return err.response();
    if (err instanceof SpectrumInputError) return json({ error: `Spectrum rejected: ${err.message}` }, { status: 422 });
    if (err instanceof BlendInputError) return json({ error: `Blend rejected: ${err.message}` }, { status: 422 });
    throw err;
  }
}

/** JSON with non-finite numbers (e.g. TM-30 far from white) written as null. */
export function finiteJson(body: unknown, init?: ResponseInit): Response {
  const text = JSON.stringify(body, (_k, v) => (typeof v === 'number' && !Number.isFinite(v) ? null : v));
  return new Response(text, { ...init, headers: { 'content-type': 'application/json', ...(init?.headers ?? {}) } });
}
