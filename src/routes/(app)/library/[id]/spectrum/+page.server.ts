import { error, redirect } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { mayEditLibrary } from '$lib/access/policies';
import * as detail from '$lib/server/library/detail';
import { formFile, readVersion } from '$lib/server/library/form';
import { actionFailure, tryAction } from '$lib/server/http/action-failure';
import { idParam } from '$lib/server/http/id-param';
import { previewSpectrumFile, uploadSpectrum } from '$lib/server/library/spectrum-upload';
import { spectrumKindSchema } from '$lib/library/schema';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/forms/read-form';

export const load: PageServerLoad = async ({ locals, params }) => {
  requireUser(locals, mayEditLibrary);
  const d = await detail.load(idParam(params.id, 'No such material.'));
  if (!d) error(404, 'No such material.');
  const m = d.material;
  const current = (s: typeof d.emission) => (s ? { wavelengths: s.wavelengths, values: s.values } : null);
  return {
    material: {
      id: m.id,
      code: m.code,
      name: m.name,
      kind: m.kind,
      version: m.version,
      archived: m.archivedAt !== null,
      safetyNote: m.safetyNote
    },
    current: { emission: current(d.emission), excitation: current(d.excitation) }
  };
};

async function readUpload(request: Request) {
  const fd = await readForm(request);
  const kind = spectrumKindSchema.safeParse(fd.get('kind') ?? 'emission');
  const file = await formFile(fd, 'file');
  return { fd, kind: kind.success ? kind.data : null, file };
}

export const actions: Actions = {
  preview: async ({ locals, request }) => {
    requireUser(locals, mayEditLibrary);
    const { kind, file } = await readUpload(request);
    if (!kind) return actionFailure(400, { error: 'Choose emission or excitation.' });
    if (!file) return actionFailure(400, { error: 'Choose a spectrum file (CSV or TXT) first.' });
    const p = await tryAction({ kind }, async () => previewSpectrumFile(file, kind));
    if ('status' in p) return p;
    return { preview: { kind, fileName: p.fileName, spd: p.spd, summary: p.summary, warnings: p.warnings } };
  },
  save: async ({ locals, request, params }) => {
    const user = requireUser(locals, mayEditLibrary);
    const { fd, kind, file } = await readUpload(request);
    if (!kind) return actionFailure(400, { error: 'Choose emission or excitation.' });
    if (!file) return actionFailure(400, { error: 'Choose a spectrum file (CSV or TXT) first.' });
    const version = readVersion(fd) ?? undefined;
    const id = idParam(params.id, 'No such material.');
    const saved = await tryAction({ kind }, () => uploadSpectrum(user, id, kind, file, version));
    if ('status' in saved) return saved;
    redirect(303, `/library/${id}?uploaded=${kind}`);
  }
};
