import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { finiteJson, readQuery } from '$lib/server/api/body';
import { testConditionFieldsSchema, testerProfileChoiceSchema } from '$lib/measurements/schema';
import { partsQueryParams, partsQuerySchema, selectParts } from '$lib/measurements/parts-query';
import { ndjsonStream, uploadedFile } from '$lib/server/measurements/api';
import { batchResults } from '$lib/server/measurements/results';
import { precheckUpload, uploadMeasurements } from '$lib/server/measurements/upload';
import { apiHandler } from '$lib/server/http/api-handler';
import { idParam } from '$lib/server/http/id-param';
import { notFound } from '$lib/errors/domain-error';
import { mayJudgeBatches } from '$lib/access/policies';
import type { RequestHandler } from './$types';

/**
 * Results of a batch: one page of parts with metrics and verdicts (the page's filters and sort: verdict, bin,
 * stepsMin/Max, x0/x1/y0/y1, sort, dir, page, pageSize ≤ 500), `partsPage` (matched, total, page, pages),
 * summary, lot statistics, prediction check, plot data, disposition.
 */
export const GET: RequestHandler = (event) =>
  apiHandler(async () => {
    requireUser(event.locals);
    const query = readQuery(new URLSearchParams(partsQueryParams(event.url.searchParams)), partsQuerySchema);
    const view = await batchResults(idParam(event.params.batchId, `Batch ${event.params.batchId} was not found.`));
    if (!view) throw notFound(`Batch ${event.params.batchId} was not found.`);
    const { items, ...partsPage } = selectParts(view.parts, query);
    return finiteJson({ ...view, parts: items, partsPage });
  });

/**
 * Upload a measurement file (multipart `file`, or a text/csv body). `Accept: application/x-ndjson` streams progress.
 * Query `testTemperatureC`, `testReference` (junction | solderPoint), `testCurrentMa`: the condition it was measured at (none = bench).
 * Query `testerProfile`: the id of the tester profile that reads a per-part table (none = spectra).
 */
export const POST: RequestHandler = (event) =>
  apiHandler(async () => {
    const user = requireUser(event.locals, mayJudgeBatches);
    const batchId = idParam(event.params.batchId, `Batch ${event.params.batchId} was not found.`);
    await precheckUpload(user, batchId);
    const condition = readQuery(event.url.searchParams, testConditionFieldsSchema);
    const { testerProfile } = readQuery(event.url.searchParams, testerProfileChoiceSchema);
    const file = { ...(await uploadedFile(event.request, testerProfile !== null)), condition, testerProfileId: testerProfile };
    if (!(event.request.headers.get('accept') ?? '').includes('application/x-ndjson')) {
      return json(await uploadMeasurements(user, batchId, file), { status: 201 });
    }
    return ndjsonStream(async (write) => ({
      ...(await uploadMeasurements(user, batchId, file, (p) => write({ type: 'progress', ...p })))
    }));
  });
