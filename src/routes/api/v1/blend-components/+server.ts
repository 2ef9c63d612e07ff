import { requireUser } from '$lib/server/auth/require';
import { ApiError, describeIssues, finiteJson, handleApi } from '$lib/server/api/body';
import { loadBlendComponents } from '$lib/server/materials/components';
import { MaterialError } from '$lib/server/materials/errors';
import { componentQuerySchema } from '$lib/designer/component-query';
import type { RequestHandler } from './$types';

/** Library pump + phosphors as blend-model specs (spectra included), for the designer's live loop. */
export const GET: RequestHandler = ({ locals, url }) =>
  handleApi(async () => {
    requireUser(locals);
    const parsed = componentQuerySchema.safeParse(Object.fromEntries(url.searchParams));
    if (!parsed.success) {
      const issues = describeIssues(parsed.error);
      throw new ApiError(400, `Invalid query: ${issues.map((i) => `${i.path}: ${i.message}`).join('; ')}`, issues);
    }
    try {
      return finiteJson(await loadBlendComponents(parsed.data.pump, parsed.data.phosphors));
    } catch (err) {
      if (err instanceof MaterialError) throw new ApiError(err.status, err.message);
      throw err;
    }
  });
