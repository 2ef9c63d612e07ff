import { requireUser } from '$lib/server/auth/require';
import { listMaterialOptions } from '$lib/server/library/components';
import { listSiliconeSystems } from '$lib/server/formulations/silicone';
import { formulationListSchema, listFormulations } from '$lib/server/formulations/lists';
import { getRevision } from '$lib/server/formulations/read';
import { fileBlend } from '$lib/server/designer/file-blend';
import { filingFormSchema } from '$lib/designer/filing';
import { mayDesign } from '$lib/access/policies';
import { DomainError } from '$lib/errors/domain-error';
import { actionFailure } from '$lib/server/http/action-failure';
import { parseId } from '$lib/server/http/id-param';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/forms/read-form';
import { packageModelChoices } from '$lib/server/package-models/choices';

/** A revision opened in the designer (`?from=<revision id>`) to start the next revision from it. */
async function openedRevision(param: string | null) {
  const id = parseId(param);
  if (id === null) return null;
  const rev = await getRevision(id);
  if (!rev) return null;
  return {
    id: rev.id,
    formulationId: rev.formulationId,
    code: rev.formulationCode,
    name: rev.formulationName,
    revisionNo: rev.revisionNo,
    state: rev.state,
    content: rev.content
  };
}

export const load: PageServerLoad = async ({ locals, url }) => {
  requireUser(locals, mayDesign);
  const [pumps, phosphors, silicones, formulations, opened, packageModels] = await Promise.all([
    listMaterialOptions('pump'),
    listMaterialOptions('phosphor'),
    listSiliconeSystems(),
    listFormulations(formulationListSchema.parse({ pageSize: 100, sort: 'code' })),
    openedRevision(url.searchParams.get('from')),
    packageModelChoices()
  ]);
  return {
    pumps,
    phosphors,
    silicones: silicones.map((s) => ({
      id: s.id,
      name: s.name,
      ratioA: s.ratioA,
      ratioB: s.ratioB,
      potLifeMin: s.potLifeMin,
      safetyNote: s.safetyNote
    })),
    formulations: formulations.rows.map((f) => ({ id: f.id, code: f.code, name: f.name })),
    opened,
    packageModels
  };
};

export const actions: Actions = {
  file: async ({ locals, request }) => {
    const user = requireUser(locals, mayDesign);
    const raw = Object.fromEntries(await readForm(request));
    const parsed = filingFormSchema.safeParse(raw);
    if (!parsed.success) {
      return actionFailure(400, { error: `Nothing was filed: ${parsed.error.issues.map((i) => i.message).join('; ')}.` });
    }
    try {
      return { filed: await fileBlend(user, parsed.data) };
    } catch (err) {
      const invalidInput = err instanceof DomainError && err.kind === 'invalid';
      return actionFailure(err, (r) => ({ error: invalidInput ? `Nothing was filed: ${r.error}` : r.error }));
    }
  }
};
