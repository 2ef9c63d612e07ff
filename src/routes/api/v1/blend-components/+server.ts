import { requireUser } from '$lib/server/auth/require';
import { finiteJson, readQuery } from '$lib/server/api/body';
import { apiHandler } from '$lib/server/http/api-handler';
import { loadBlendComponents } from '$lib/server/library/components';
import { thermalByMaterialIds } from '$lib/server/library/thermal';
import { componentQuerySchema } from '$lib/designer/component-query';
import type { RequestHandler } from './$types';

/**
 * Library pump + phosphors as blend-model specs (spectra included) and their thermal data by id
 * (absent = not characterised), for the designer's live loop.
 */
export const GET: RequestHandler = ({ locals, url }) =>
  apiHandler(async () => {
    requireUser(locals);
    const query = readQuery(url.searchParams, componentQuerySchema);
    const components = await loadBlendComponents(query.pump, query.phosphors);
    return finiteJson({ ...components, thermal: await thermalByMaterialIds([query.pump, ...query.phosphors]) });
  });
