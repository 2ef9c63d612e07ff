import { error, redirect } from '@sveltejs/kit';
import { z } from 'zod';
import { requireUser } from '$lib/server/auth/require';
import { eventsFor } from '$lib/server/audit/search';
import {
  currentApprovedRevision,
  getRevision,
  listAttachments,
  listSignatures,
  storedContentVerified
} from '$lib/server/formulations/read';
import { contentFromForm, editorOptions } from '$lib/server/formulations/page-support';
import { mayActOnRevisions, mayAuthorFormulations, mayDesign, maySetVariationModel, maySignRevisions } from '$lib/access/policies';
import { listYieldPredictions } from '$lib/server/yield-predictions/store';
import { predictRevisionYield } from '$lib/server/yield-predictions/predict';
import { getRevisionVariationModel, putRevisionVariationModel } from '$lib/server/yield-predictions/variation-model';
import { variationModelFromForm } from '$lib/blend/spread/model-form';
import { MAX_PARTS } from '$lib/blend/spread';
import { actionFailure } from '$lib/server/http/action-failure';
import { idParam } from '$lib/server/http/id-param';
import { createRevision, updateDraft } from '$lib/server/formulations/save';
import { siliconeHandling } from '$lib/server/formulations/silicone';
import { returnRevision, sign, submit, withdraw } from '$lib/server/formulations/workflow';
import { signingProblems } from '$lib/server/formulations/signing-problems';
import { solveRevisionMatrix } from '$lib/server/formulations/bin-matrix';
import { addAttachment, removeAttachment } from '$lib/server/formulations/attachments';
import { contentToFormValues, formDataToValues, type FormValues } from '$lib/formulations/form-values';
import { allowedCommands } from '$lib/formulations/workflow-rules';
import { citedPackageModel } from '$lib/server/package-models/choices';
import { hazardCautionsOf } from '$lib/server/library/hazard-cautions';
import { materialIdsOf } from '$lib/recipe';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/forms/read-form';

/** Actions without form fields of their own keep no input on refusal. */
const NO_VALUES: FormValues = {};
const version = z.coerce.number().int().positive('version missing: reload the page');
const signSchema = z
  .object({
    meaning: z.enum(['reviewed', 'approved', 'returned'], 'choose what your signature means'),
    password: z.string().min(1, 're-enter your password to sign'),
    comment: z.string().trim().max(2000).default(''),
    version
  })
  .refine((s) => s.meaning !== 'returned' || s.comment.length >= 3, { message: 'say why the revision is returned', path: ['comment'] });
const predictYieldSchema = z.object({
  parts: z.coerce.number().int('parts must be a whole number').min(100, 'at least 100 parts').max(MAX_PARTS, `at most ${MAX_PARTS} parts`),
  seed: z.coerce
    .number()
    .int('seed must be a whole number')
    .min(0, 'seed must be ≥ 0')
    .max(2 ** 32 - 1)
});
const withdrawSchema = z.object({ reason: z.string().trim().min(3, 'say why the revision is withdrawn').max(2000), version });

async function revisionOf(params: { id: string; revisionId: string }) {
  const rev = await getRevision(idParam(params.revisionId, 'No such revision of this formulation.'));
  if (!rev || rev.formulationId !== idParam(params.id, 'No such revision of this formulation.'))
    error(404, 'No such revision of this formulation.');
  return rev;
}

export const load: PageServerLoad = async ({ locals, params }) => {
  const user = requireUser(locals);
  const rev = await revisionOf(params);
  const commands = allowedCommands(user, rev);
  const ref = rev.content.packageModelRef ?? null;
  const [signatures, attachments, history, current, silicone, hashVerified, cited, yields] = await Promise.all([
    listSignatures(rev.id),
    listAttachments(rev.id),
    eventsFor('formulation_revision', rev.id),
    currentApprovedRevision(rev.formulationId),
    rev.content.silicone.siliconeSystemId ? siliconeHandling(rev.content.silicone.siliconeSystemId) : null,
    storedContentVerified(rev.id),
    ref ? citedPackageModel(ref) : null,
    listYieldPredictions(rev.id)
  ]);
  const variationModel = await getRevisionVariationModel(rev.id);
  const hazardCautions = await hazardCautionsOf(materialIdsOf(rev.content).phosphors);
  return {
    rev,
    commands,
    signatures,
    attachments,
    history,
    currentId: current?.id ?? null,
    hashVerified,
    canStartDraft: mayAuthorFormulations(user),
    editor: commands.includes('edit') ? { values: contentToFormValues(rev.content), options: await editorOptions() } : null,
    silicone,
    latestYield: yields[0] ?? null,
    canPredictYield: mayDesign(user),
    variationModel,
    canSetVariationModel: maySetVariationModel(user),
    packageModel: ref ? { id: ref.id, version: ref.version, name: cited?.name ?? null } : null,
    hazardCautions
  };
};

export const actions: Actions = {
  predictYield: async ({ locals, params, request }) => {
    const user = requireUser(locals, mayDesign);
    const rev = await revisionOf(params);
    const values = formDataToValues(await readForm(request));
    const parsed = predictYieldSchema.safeParse(values);
    if (!parsed.success) return actionFailure(400, { action: 'predictYield', values, error: parsed.error.issues[0].message });
    try {
      await predictRevisionYield(user, { revisionId: rev.id, model: null, parts: parsed.data.parts, seed: parsed.data.seed });
      return { action: 'predictYield', done: 'Yield forecast computed and kept with the revision.' };
    } catch (err) {
      return actionFailure(err, { action: 'predictYield', values });
    }
  },
  setVariationModel: async ({ locals, params, request }) => {
    const user = requireUser(locals, maySetVariationModel);
    const rev = await revisionOf(params);
    const values = formDataToValues(await readForm(request));
    const read = z.coerce.number().int().min(0).safeParse(values.version);
    if (!read.success) return actionFailure(400, { action: 'setVariationModel', values, error: 'version missing: reload the page' });
    const current = await getRevisionVariationModel(rev.id);
    const parsed = variationModelFromForm(values, current.model);
    if (!parsed.ok) return actionFailure(400, { action: 'setVariationModel', values, error: parsed.message, field: parsed.field });
    try {
      await putRevisionVariationModel(user, rev.id, { model: parsed.model, version: read.data });
      return { action: 'setVariationModel', done: 'Variation model saved; the next forecast uses it.' };
    } catch (err) {
      return actionFailure(err, { action: 'setVariationModel', values });
    }
  },
  solveBins: async ({ locals, params, request }) => {
    const user = requireUser(locals, mayActOnRevisions);
    const rev = await revisionOf(params);
    const parsed = version.safeParse((await readForm(request)).get('version'));
    if (!parsed.success) return actionFailure(400, { action: 'solveBins', error: parsed.error.issues[0].message });
    try {
      await solveRevisionMatrix(user, rev.id, parsed.data);
      return { action: 'solveBins', done: 'Recipe matrix solved and saved in the draft.' };
    } catch (err) {
      return actionFailure(err, { action: 'solveBins', values: NO_VALUES });
    }
  },
  save: async ({ locals, params, request }) => {
    const user = requireUser(locals, mayActOnRevisions);
    const rev = await revisionOf(params);
    const values = formDataToValues(await readForm(request));
    try {
      const saved = await updateDraft(user, rev.id, Number(values.version), contentFromForm(values));
      return { action: 'save', saved: saved.version };
    } catch (err) {
      return actionFailure(err, { action: 'save', values });
    }
  },
  submit: async ({ locals, params, request }) => {
    const user = requireUser(locals, mayActOnRevisions);
    const rev = await revisionOf(params);
    const fd = await readForm(request);
    const parsed = version.safeParse(fd.get('version'));
    if (!parsed.success) return actionFailure(400, { action: 'submit', error: parsed.error.issues[0].message });
    const offAimReason = String(fd.get('offAimReason') ?? '').slice(0, 2000);
    try {
      await submit(user, rev.id, parsed.data, offAimReason);
      return { action: 'submit', done: 'Submitted for review; quality has been notified.' };
    } catch (err) {
      return actionFailure(err, { action: 'submit', values: { offAimReason } });
    }
  },
  withdraw: async ({ locals, params, request }) => {
    const user = requireUser(locals, mayActOnRevisions);
    const rev = await revisionOf(params);
    const values = formDataToValues(await readForm(request));
    const parsed = withdrawSchema.safeParse(values);
    if (!parsed.success) return actionFailure(400, { action: 'withdraw', values, error: parsed.error.issues[0].message });
    try {
      await withdraw(user, rev.id, parsed.data.reason, parsed.data.version);
      return { action: 'withdraw', done: 'Revision withdrawn.' };
    } catch (err) {
      return actionFailure(err, { action: 'withdraw', values });
    }
  },
  sign: async ({ locals, params, request }) => {
    const user = requireUser(locals, maySignRevisions);
    const rev = await revisionOf(params);
    const values = formDataToValues(await readForm(request));
    const parsed = signSchema.safeParse(values);
    if (!parsed.success) return actionFailure(await signingProblems(user, rev.id, values, parsed.error), { action: 'sign', values });
    const s = parsed.data;
    try {
      if (s.meaning === 'returned') await returnRevision(user, rev.id, { password: s.password, reason: s.comment }, s.version);
      else await sign(user, rev.id, s.meaning, { password: s.password, comment: s.comment }, s.version);
      return {
        action: 'sign',
        done:
          s.meaning === 'approved'
            ? 'Signed and approved: this is now the current revision.'
            : s.meaning === 'returned'
              ? 'Signed and returned to the author.'
              : 'Review signature recorded.'
      };
    } catch (err) {
      return actionFailure(err, { action: 'sign', values });
    }
  },
  attach: async ({ locals, params, request }) => {
    const user = requireUser(locals, mayActOnRevisions);
    const rev = await revisionOf(params);
    const fd = await readForm(request);
    const file = fd.get('file');
    if (!(file instanceof File) || file.size === 0) return actionFailure(400, { action: 'attach', error: 'Choose a file to attach.' });
    try {
      await addAttachment(user, rev.id, { name: file.name, body: Buffer.from(await file.arrayBuffer()) }, String(fd.get('label') ?? ''));
      return { action: 'attach', done: `Attached ${file.name}.` };
    } catch (err) {
      return actionFailure(err, { action: 'attach', values: NO_VALUES });
    }
  },
  detach: async ({ locals, params, request }) => {
    const user = requireUser(locals, mayActOnRevisions);
    const rev = await revisionOf(params);
    try {
      await removeAttachment(user, rev.id, Number((await readForm(request)).get('attachmentId')));
      return { action: 'detach', done: 'Attachment removed.' };
    } catch (err) {
      return actionFailure(err, { action: 'detach', values: NO_VALUES });
    }
  },
  newDraft: async ({ locals, params }) => {
    const user = requireUser(locals, mayAuthorFormulations);
    const rev = await revisionOf(params);
    let created;
    try {
      created = await createRevision(user, rev.formulationId, rev.content, rev.id);
    } catch (err) {
      return actionFailure(err, { action: 'newDraft', values: NO_VALUES });
    }
    redirect(303, `/formulations/${rev.formulationId}/revisions/${created.revisionId}`);
  }
};
