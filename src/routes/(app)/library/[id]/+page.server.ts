import { error, fail, redirect } from '@sveltejs/kit';
import { z } from 'zod';
import { requireUser } from '$lib/server/auth/require';
import { ALL, FORMULATION_EDITORS } from '$lib/access/routes/shared';
import * as detail from '$lib/server/materials/detail';
import * as editing from '$lib/server/materials/editing';
import * as lots from '$lib/server/materials/lots';
import * as attachments from '$lib/server/materials/attachments';
import { formFile, formValues, readVersion } from '$lib/server/materials/form';
import { formGuard, pageId } from '$lib/server/materials/page-errors';
import { attachmentPurposeSchema, lotSchema } from '$lib/schemas/materials';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/forms/read-form';

export const load: PageServerLoad = async ({ locals, params }) => {
  const user = requireUser(locals, ALL);
  const d = await detail.loadPage(pageId(params.id));
  if (!d) error(404, 'No such material.');
  const spd = (s: typeof d.emission) => (s ? { wavelengths: s.wavelengths, values: s.values, sourceFileId: s.sourceFileId, sourceFileName: s.sourceFileName } : null);
  return {
    ...d,
    emission: spd(d.emission),
    excitation: spd(d.excitation),
    canEdit: FORMULATION_EDITORS.some((r) => user.roles.includes(r))
  };
};

const idSchema = z.coerce.number().int().positive();
const LOT_KEYS = ['lotNumber', 'supplier', 'receivedOn', 'expiresOn', 'notes'] as const;

export const actions: Actions = {
  archive: async ({ locals, request, params }) => toggleArchive(locals, request, params.id, true),
  restore: async ({ locals, request, params }) => toggleArchive(locals, request, params.id, false),
  delete: async ({ locals, params }) => {
    const user = requireUser(locals, FORMULATION_EDITORS);
    const done = await formGuard({ action: 'delete' }, () => editing.remove(user, pageId(params.id)));
    if (done) return done;
    redirect(303, '/library?deleted=1');
  },
  addLot: async ({ locals, request, params }) => {
    const user = requireUser(locals, FORMULATION_EDITORS);
    const fd = await readForm(request);
    const values = formValues(fd, LOT_KEYS);
    const parsed = lotSchema.safeParse(values);
    if (!parsed.success) return fail(400, { action: 'addLot', lotValues: values, lotErrors: z.flattenError(parsed.error).fieldErrors, error: 'The lot was not added: please correct the marked fields.' });
    const certificate = await formFile(fd, 'certificate');
    const r = await formGuard({ action: 'addLot', lotValues: values }, () => lots.add(user, pageId(params.id), parsed.data, certificate ?? undefined));
    return typeof r === 'number' ? { action: 'addLot', done: `Lot ${parsed.data.lotNumber} added.` } : r;
  },
  removeLot: async ({ locals, request, params }) => {
    const user = requireUser(locals, FORMULATION_EDITORS);
    const lotId = idSchema.safeParse((await readForm(request)).get('lotId'));
    if (!lotId.success) return fail(400, { action: 'removeLot', error: 'Unknown lot.' });
    const r = await formGuard({ action: 'removeLot' }, () => lots.remove(user, pageId(params.id), lotId.data));
    return r ?? { action: 'removeLot', done: 'Lot removed.' };
  },
  addDocument: async ({ locals, request, params }) => {
    const user = requireUser(locals, FORMULATION_EDITORS);
    const fd = await readForm(request);
    const purpose = attachmentPurposeSchema.safeParse(fd.get('purpose'));
    if (!purpose.success) return fail(400, { action: 'addDocument', error: purpose.error.issues[0].message });
    const file = await formFile(fd, 'document');
    if (!file) return fail(400, { action: 'addDocument', error: 'Choose a PDF file first.' });
    const r = await formGuard({ action: 'addDocument' }, () => attachments.add(user, pageId(params.id), purpose.data, file));
    return typeof r === 'number' ? { action: 'addDocument', done: `${file.name} added.` } : r;
  },
  removeDocument: async ({ locals, request, params }) => {
    const user = requireUser(locals, FORMULATION_EDITORS);
    const fileId = idSchema.safeParse((await readForm(request)).get('fileId'));
    if (!fileId.success) return fail(400, { action: 'removeDocument', error: 'Unknown document.' });
    const r = await formGuard({ action: 'removeDocument' }, () => attachments.remove(user, pageId(params.id), fileId.data));
    return r ?? { action: 'removeDocument', done: 'Document removed.' };
  }
};

async function toggleArchive(locals: App.Locals, request: Request, rawId: string, archived: boolean) {
  const user = requireUser(locals, FORMULATION_EDITORS);
  const version = readVersion(await readForm(request));
  if (version === null) return fail(400, { action: 'archive', error: 'The form lost its version number; reload the page.' });
  const r = await formGuard({ action: 'archive' }, () => editing.setArchived(user, pageId(rawId), version, archived));
  return typeof r === 'number' ? { action: 'archive', done: archived ? 'Archived: it no longer appears in pick lists.' : 'Restored to the active library.' } : r;
}
