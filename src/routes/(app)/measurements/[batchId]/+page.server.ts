import { error } from '@sveltejs/kit';
import { z } from 'zod';
import { requireUser } from '$lib/server/auth/require';
import { mayJudgeBatches, maySetVariationModel } from '$lib/access/policies';
import { actionFailure } from '$lib/server/http/action-failure';
import { idParam } from '$lib/server/http/id-param';
import { acceptanceSchema, correctionSchema, dispositionSchema, withdrawUploadSchema } from '$lib/measurements/schema';
import { canActOnMeasurements } from '$lib/server/measurements/caller';
import { computeResults, loadContext } from '$lib/server/measurements/results';
import { dispositionRefusal, disposeBatch } from '$lib/server/measurements/disposition';
import { setAcceptance } from '$lib/server/measurements/acceptance';
import { uploadMeasurements, withdrawUpload } from '$lib/server/measurements/upload';
import { testConditionFieldsSchema, testerProfileChoiceSchema } from '$lib/measurements/schema';
import { listTesterProfiles } from '$lib/server/measurements/tester-profiles';
import { DEFAULT_PARTS_QUERY, partsQueryParams, partsQuerySchema, queryRect, selectParts } from '$lib/measurements/parts-query';

import { makeCorrectionDraft } from '$lib/server/measurements/correction';
import { fitSpreadToBatch } from '$lib/server/measurements/fit-spread';
import { getRevisionVariationModel } from '$lib/server/yield-predictions/variation-model';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/forms/read-form';

const batchId = (param: string): number => idParam(param, `Batch ${param} was not found.`);

export const load: PageServerLoad = async ({ locals, params, url }) => {
  const user = requireUser(locals);
  const ctx = await loadContext(batchId(params.batchId));
  if (!ctx) error(404, `Batch ${params.batchId} was not found.`);
  const [{ view }, model] = await Promise.all([computeResults(ctx), getRevisionVariationModel(ctx.revision.id)]);
  // The parts list travels one page at a time, filtered and sorted here (a lot can hold 100,000 parts).
  const raw = partsQueryParams(url.searchParams);
  const asked = partsQuerySchema.safeParse(raw);
  const { items, ...partsPage } = selectParts(view.parts, asked.success ? asked.data : DEFAULT_PARTS_QUERY);
  return {
    results: { ...view, parts: items },
    partsPage,
    partsQuery: asked.success ? raw : {},
    partsQueryError: asked.success ? null : asked.error.issues[0].message,
    partsRect: asked.success ? queryRect(asked.data) : null,
    canAct: canActOnMeasurements(user),
    dispositionBlocked: await dispositionRefusal(user, ctx),
    variationModel: { version: model.version, source: model.source, fittedBatch: model.fittedBatch?.batchNumber ?? null },
    canFitSpread: mayJudgeBatches(user) && maySetVariationModel(user),
    testerProfiles: (await listTesterProfiles()).map((p) => ({ id: p.id, name: p.profile.name }))
  };
};

export const actions: Actions = {
  upload: async ({ locals, params, request }) => {
    const user = requireUser(locals, mayJudgeBatches);
    const form = await readForm(request);
    const file = form.get('file');
    if (!(file instanceof File) || file.size === 0)
      return actionFailure(400, { uploadError: 'Choose a measurement file first.', uploadIssues: [] });
    const choice = testerProfileChoiceSchema.safeParse({ testerProfile: String(form.get('testerProfile') ?? '') });
    if (!choice.success)
      return actionFailure(400, { uploadError: `${choice.error.issues[0].message}. Nothing was saved.`, uploadIssues: [] });
    const condition = testConditionFieldsSchema.safeParse({
      testTemperatureC: String(form.get('testTemperatureC') ?? ''),
      testReference: String(form.get('testReference') ?? 'junction'),
      testCurrentMa: String(form.get('testCurrentMa') ?? '')
    });
    if (!condition.success)
      return actionFailure(400, {
        uploadError: `Test condition: ${condition.error.issues.map((i) => i.message).join('; ')}. Nothing was saved.`,
        uploadIssues: []
      });
    try {
      const res = await uploadMeasurements(user, batchId(params.batchId), {
        name: file.name,
        contentType: file.type,
        body: Buffer.from(await file.arrayBuffer()),
        condition: condition.data,
        testerProfileId: choice.data.testerProfile
      });
      return { uploaded: { parts: res.parts, warnings: res.warnings } };
    } catch (err) {
      return actionFailure(err, (r) => ({
        uploadError: r.error,
        uploadIssues: r.issues.map((i) => ({ line: i.line ?? null, message: i.message }))
      }));
    }
  },
  setAcceptance: async ({ locals, params, request }) => {
    const user = requireUser(locals, mayJudgeBatches);
    const fd = await readForm(request);
    const parsed = acceptanceSchema.safeParse({
      mode: fd.get('mode'),
      steps: fd.get('steps') ?? undefined,
      requireTargetBin: fd.get('requireTargetBin') ?? 'false',
      version: fd.get('version')
    });
    if (!parsed.success) return actionFailure(400, { acceptanceErrors: z.flattenError(parsed.error).fieldErrors });
    try {
      await setAcceptance(user, batchId(params.batchId), parsed.data);
      return { acceptanceSaved: true };
    } catch (err) {
      return actionFailure(err, (r) => ({ acceptanceErrors: { form: [r.error] } }));
    }
  },
  withdrawUpload: async ({ locals, params, request }) => {
    const user = requireUser(locals, mayJudgeBatches);
    const parsed = withdrawUploadSchema.safeParse(Object.fromEntries(await readForm(request)));
    if (!parsed.success)
      return actionFailure(400, { withdrawError: z.flattenError(parsed.error).fieldErrors.reason?.[0] ?? 'Give a reason and the upload.' });
    try {
      await withdrawUpload(user, batchId(params.batchId), parsed.data.uploadId, parsed.data.reason);
      return { withdrawn: parsed.data.uploadId };
    } catch (err) {
      return actionFailure(err, (r) => ({ withdrawError: r.error }));
    }
  },
  correct: async ({ locals, params, request, url }) => {
    const user = requireUser(locals, mayJudgeBatches);
    const parsed = correctionSchema.safeParse(Object.fromEntries(await readForm(request)));
    if (!parsed.success) return actionFailure(400, { correctionError: parsed.error.issues[0].message });
    try {
      return { corrected: await makeCorrectionDraft(user, batchId(params.batchId), parsed.data.stepFraction, url.origin) };
    } catch (err) {
      return actionFailure(err, (r) => ({ correctionError: r.error }));
    }
  },
  fitSpread: async ({ locals, params, request }) => {
    const user = requireUser(locals, mayJudgeBatches);
    requireUser(locals, maySetVariationModel);
    const read = z.coerce
      .number()
      .int()
      .min(0)
      .safeParse((await readForm(request)).get('version'));
    if (!read.success) return actionFailure(400, { fitError: 'version missing: reload the page' });
    try {
      return { fitted: await fitSpreadToBatch(user, batchId(params.batchId), read.data) };
    } catch (err) {
      return actionFailure(err, (r) => ({ fitError: r.error }));
    }
  },
  dispose: async ({ locals, params, request, url }) => {
    const user = requireUser(locals, mayJudgeBatches);
    const fd = await readForm(request);
    const raw = {
      decision: String(fd.get('decision') ?? ''),
      meaning: String(fd.get('meaning') ?? ''),
      comment: String(fd.get('comment') ?? ''),
      password: String(fd.get('password') ?? ''),
      version: fd.get('version')
    };
    const values = { decision: raw.decision, meaning: raw.meaning, comment: raw.comment };
    const parsed = dispositionSchema.safeParse(raw);
    if (!parsed.success) return actionFailure(400, { disposition: { values, errors: z.flattenError(parsed.error).fieldErrors } });
    try {
      const out = await disposeBatch(user, batchId(params.batchId), parsed.data, url.origin);
      return { disposed: out.decision };
    } catch (err) {
      return actionFailure(err, (r) => ({ disposition: { values, errors: {}, error: r.error } }));
    }
  }
};
