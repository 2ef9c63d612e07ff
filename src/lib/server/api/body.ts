/**
 * JSON bodies of the API: size limit, parse, zod validation. Every failure is a domain error
 * (answered `{ error, issues? }` by apiHandler): 400 (malformed or invalid), 413 (too large) or
 * 415 (not JSON).
 */
import type { RequestEvent } from '@sveltejs/kit';
import type { z } from 'zod';
import { invalid, tooLarge, unsupportedType } from '../../errors/domain-error';
import { describeIssues, issueSummary } from '../http/issues';

export const MAX_JSON_BYTES = 2 * 1024 * 1024;

export async function readJson<S extends z.ZodType>(event: Pick<RequestEvent, 'request'>, schema: S): Promise<z.infer<S>> {
  const { request } = event;
  const type = request.headers.get('content-type') ?? '';
  if (!/^application\/json\b/i.test(type)) throw unsupportedType('Send the body as JSON (Content-Type: application/json).');
  const declared = Number(request.headers.get('content-length') ?? '0');
  if (declared > MAX_JSON_BYTES) throw tooLarge(`The body is larger than ${MAX_JSON_BYTES / 1024 / 1024} MB.`);
  const text = await request.text();
  if (Buffer.byteLength(text) > MAX_JSON_BYTES) throw tooLarge(`The body is larger than ${MAX_JSON_BYTES / 1024 / 1024} MB.`);
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch {
    throw invalid('The body is not valid JSON.');
  }
  const parsed = schema.safeParse(raw);
  if (!parsed.success) {
    const issues = describeIssues(parsed.error);
    throw invalid(`Invalid request: ${issueSummary(issues)}`, issues);
  }
  return parsed.data;
}

/** Query-string parameters validated with zod: bad values are a 400 naming them, never a silent default. */
export function readQuery<S extends z.ZodType>(params: URLSearchParams, schema: S, fixed: Record<string, unknown> = {}): z.infer<S> {
  const parsed = schema.safeParse({ ...Object.fromEntries(params), ...fixed });
  if (!parsed.success) {
    const issues = describeIssues(parsed.error);
    throw invalid(`Invalid query: ${issueSummary(issues)}`, issues);
  }
  return parsed.data;
}

/** JSON with non-finite numbers (e.g. TM-30 far from white) written as null. */
export function finiteJson(body: unknown, init?: ResponseInit): Response {
  const text = JSON.stringify(body, (_k, v) => (typeof v === 'number' && !Number.isFinite(v) ? null : v));
  return new Response(text, { ...init, headers: { 'content-type': 'application/json', ...(init?.headers ?? {}) } });
}
