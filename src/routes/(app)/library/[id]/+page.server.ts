import { error, redirect } from '@sveltejs/kit';
import { z } from 'zod';
import { requireUser } from '$lib/server/auth/require';
import { mayEditLibrary, mayRead } from '$lib/access/policies';
import * as detail from '$lib/server/library/detail';
import * as editing from '$lib/server/library/editing';
import * as lots from '$lib/server/library/lots';
import * as attachments from '$lib/server/library/attachments';
import { formFile, formValues, readVersion } from '$lib/server/library/form';
import { actionFailure, tryAction } from '$lib/server/http/action-failure';
import { idParam } from '$lib/server/http/id-param';
import { attachmentPurposeSchema, lotSchema } from '$lib/library/schema';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/forms/read-form';
import { getThermal } from '$lib/server/library/thermal';
import { THERMAL_FORM_KEYS, saveThermalForm } from '$lib/server/library/thermal-form';
import { getPumpBins, putPumpBins } from '$lib/server/library/pump-bins';
import { binText, parseBinText, wavelengthBasisSchema } from '$lib/pump-bins';
import { lineIssue, invalid } from '$lib/errors/domain-error';

export const load: PageServerLoad = async ({ locals, params }) => {
  const user = requireUser(locals, mayRead);
  const d = await detail.loadPage(idParam(params.id, 'No such material.'));
  if (!d) error(404, 'No such material.');
  const spd = (s: typeof d.emission) =>
    s ? { wavelengths: s.wavelengths, values: s.values, sourceFileId: s.sourceFileId, sourceFileName: s.sourceFileName } : null;
  return {
    ...d,
    emission: spd(d.emission),
    excitation: spd(d.excitation),
    thermal: await getThermal(d.material.id),
    pumpBins: d.material.kind === 'pump' ? await pumpBinsView(d.material.id) : null,
    canEdit: mayEditLibrary(user)
  };
};

async function pumpBinsView(materialId: number) {
  const r = await getPumpBins(materialId);
  return { basis: r.set?.basis ?? 'peak', bins: r.set?.bins ?? [], text: r.set ? binText(r.set) : '', version: r.version };
}

const idSchema = z.coerce.number().int().positive();
const LOT_KEYS = ['lotNumber', 'supplier', 'receivedOn', 'expiresOn', 'notes'] as const;

export const actions: Actions = {
  archive: async ({ locals, request, params }) => toggleArchive(locals, request, params.id, true),
  restore: async ({ locals, request, params }) => toggleArchive(locals, request, params.id, false),
  delete: async ({ locals, params }) => {
    const user = requireUser(locals, mayEditLibrary);
    const done = await tryAction({ action: 'delete' }, () => editing.remove(user, idParam(params.id, 'No such material.')));
    if (done) return done;
    redirect(303, '/library?deleted=1');
  },
  addLot: async ({ locals, request, params }) => {
    const user = requireUser(locals, mayEditLibrary);
    const fd = await readForm(request);
    const values = formValues(fd, LOT_KEYS);
    const parsed = lotSchema.safeParse(values);
    if (!parsed.success)
      return actionFailure(400, {
        action: 'addLot',
        lotValues: values,
        lotErrors: z.flattenError(parsed.error).fieldErrors,
        error: 'The lot was not added: please correct the marked fields.'
      });
    const certificate = await formFile(fd, 'certificate');
    const r = await tryAction({ action: 'addLot', lotValues: values }, () =>
      lots.add(user, idParam(params.id, 'No such material.'), parsed.data, certificate ?? undefined)
    );
    return typeof r === 'number' ? { action: 'addLot', done: `Lot ${parsed.data.lotNumber} added.` } : r;
  },
  removeLot: async ({ locals, request, params }) => {
    const user = requireUser(locals, mayEditLibrary);
    const lotId = idSchema.safeParse((await readForm(request)).get('lotId'));
    if (!lotId.success) return actionFailure(400, { action: 'removeLot', error: 'Unknown lot.' });
    const r = await tryAction({ action: 'removeLot' }, () => lots.remove(user, idParam(params.id, 'No such material.'), lotId.data));
    return r ?? { action: 'removeLot', done: 'Lot removed.' };
  },
  addDocument: async ({ locals, request, params }) => {
    const user = requireUser(locals, mayEditLibrary);
    const fd = await readForm(request);
    const purpose = attachmentPurposeSchema.safeParse(fd.get('purpose'));
    if (!purpose.success) return actionFailure(400, { action: 'addDocument', error: purpose.error.issues[0].message });
    const file = await formFile(fd, 'document');
    if (!file) return actionFailure(400, { action: 'addDocument', error: 'Choose a PDF file first.' });
    const r = await tryAction({ action: 'addDocument' }, () =>
      attachments.add(user, idParam(params.id, 'No such material.'), purpose.data, file)
    );
    return typeof r === 'number' ? { action: 'addDocument', done: `${file.name} added.` } : r;
  },
  pumpBins: async ({ locals, request, params }) => {
    const user = requireUser(locals, mayEditLibrary);
    const fd = await readForm(request);
    const binValues = { basis: String(fd.get('basis') ?? ''), text: String(fd.get('bins') ?? '') };
    const version = z.coerce.number().int().min(0).safeParse(fd.get('binsVersion'));
    const basis = wavelengthBasisSchema.safeParse(binValues.basis);
    if (!version.success || !basis.success)
      return actionFailure(400, { action: 'pumpBins', binValues, error: 'Choose peak or dominant wavelength, and reload the page.' });
    const parsed = parseBinText(basis.data, binValues.text);
    if (!parsed.ok) {
      const shown = invalid(
        `Nothing was saved: ${parsed.errors.map((e) => e.message).join(' ')}`,
        parsed.errors.map((e) => lineIssue(e.line, e.message))
      );
      return actionFailure(shown, { action: 'pumpBins', binValues });
    }
    const set = parsed.set;
    const r = await tryAction({ action: 'pumpBins', binValues }, () =>
      putPumpBins(user, idParam(params.id, 'No such material.'), version.data, set)
    );
    return typeof r === 'number' ? { action: 'pumpBins', done: `${set.bins.length} bin${set.bins.length === 1 ? '' : 's'} saved.` } : r;
  },
  thermal: async ({ locals, request, params }) => {
    const user = requireUser(locals, mayEditLibrary);
    const fd = await readForm(request);
    const thermalValues = formValues(fd, THERMAL_FORM_KEYS);
    const r = await tryAction({ action: 'thermal', thermalValues }, () =>
      saveThermalForm(user, idParam(params.id, 'No such material.'), fd)
    );
    return typeof r === 'number' ? { action: 'thermal', done: 'Thermal data saved.' } : r;
  },
  removeDocument: async ({ locals, request, params }) => {
    const user = requireUser(locals, mayEditLibrary);
    const fileId = idSchema.safeParse((await readForm(request)).get('fileId'));
    if (!fileId.success) return actionFailure(400, { action: 'removeDocument', error: 'Unknown document.' });
    const r = await tryAction({ action: 'removeDocument' }, () =>
      attachments.remove(user, idParam(params.id, 'No such material.'), fileId.data)
    );
    return r ?? { action: 'removeDocument', done: 'Document removed.' };
  }
};

async function toggleArchive(locals: App.Locals, request: Request, rawId: string, archived: boolean) {
  const user = requireUser(locals, mayEditLibrary);
  const version = readVersion(await readForm(request));
  if (version === null) return actionFailure(400, { action: 'archive', error: 'The form lost its version number; reload the page.' });
  const r = await tryAction({ action: 'archive' }, () => editing.setArchived(user, idParam(rawId, 'No such material.'), version, archived));
  return typeof r === 'number'
    ? { action: 'archive', done: archived ? 'Archived: it no longer appears in pick lists.' : 'Restored to the active library.' }
    : r;
}
