import { error, fail, redirect } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { FORMULATION_EDITORS } from '$lib/access/routes/shared';
import * as detail from '$lib/server/materials/detail';
import { formFile, readVersion } from '$lib/server/materials/form';
import { formGuard, pageId } from '$lib/server/materials/page-errors';
import { previewSpectrumFile, uploadSpectrum } from '$lib/server/materials/spectrum-upload';
import { spectrumKindSchema } from '$lib/schemas/materials';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/forms/read-form';

export const load: PageServerLoad = async ({ locals, params }) => {
  requireUser(locals, FORMULATION_EDITORS);
  const d = await detail.load(pageId(params.id));
  if (!d) error(404, 'No such material.');
  const m = d.material;
  const current = (s: typeof d.emission) => (s ? { wavelengths: s.wavelengths, values: s.values } : null);
  return {
    material: { id: m.id, code: m.code, name: m.name, kind: m.kind, version: m.version, archived: m.archivedAt !== null, safetyNote: m.safetyNote },
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
    requireUser(locals, FORMULATION_EDITORS);
    const { kind, file } = await readUpload(request);
    if (!kind) return fail(400, { error: 'Choose emission or excitation.' });
    if (!file) return fail(400, { error: 'Choose a spectrum file (CSV or TXT) first.' });
    const p = await formGuard({ kind }, async () => previewSpectrumFile(file));
    if ('status' in p) return p;
    return { preview: { kind, fileName: p.fileName, spd: p.spd, summary: p.summary, warnings: p.warnings } };
  },
  save: async ({ locals, request, params }) => {
    const user = requireUser(locals, FORMULATION_EDITORS);
    const { fd, kind, file } = await readUpload(request);
    if (!kind) return fail(400, { error: 'Choose emission or excitation.' });
    if (!file) return fail(400, { error: 'Choose a spectrum file (CSV or TXT) first.' });
    const version = readVersion(fd) ?? undefined;
    const id = pageId(params.id);
    const saved = await formGuard({ kind }, () => uploadSpectrum(user, id, kind, file, version));
    if ('status' in saved) return saved;
    redirect(303, `/library/${id}?uploaded=${kind}`);
  }
};
