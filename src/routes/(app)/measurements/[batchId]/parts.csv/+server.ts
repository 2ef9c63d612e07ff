import { error } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { idParam } from '$lib/server/http/id-param';
import { computeResults, loadContext } from '$lib/server/measurements/results';
import { partsQuerySchema, selectParts } from '$lib/measurements/parts-query';
import { partsCsv } from '$lib/measurements/parts-csv';
import type { RequestHandler } from './$types';

/** Every part matching the list's filters (verdict, bin, steps, x,y rectangle; sorted alike, not paged), as CSV. */
export const GET: RequestHandler = async ({ locals, params, url }) => {
  requireUser(locals);
  const ctx = await loadContext(idParam(params.batchId, `Batch ${params.batchId} was not found.`));
  if (!ctx) error(404, `Batch ${params.batchId} was not found.`);
  const keys = Object.keys(partsQuerySchema.shape).filter((k) => k !== 'page' && k !== 'pageSize');
  const asked = partsQuerySchema.safeParse(Object.fromEntries([...url.searchParams].filter(([k]) => keys.includes(k))));
  if (!asked.success) error(400, `Filter not applied: ${asked.error.issues[0].message}`);
  const { view } = await computeResults(ctx);
  const all = selectParts(view.parts, { ...asked.data, page: 1, pageSize: Math.max(1, view.parts.length) });
  const name = `${ctx.detail.batch.batchNumber}-parts.csv`.replace(/[^A-Za-z0-9._-]/g, '_');
  return new Response(partsCsv(all.items), {
    headers: { 'content-type': 'text/csv; charset=utf-8', 'content-disposition': `attachment; filename="${name}"` }
  });
};
