import { z } from 'zod';
import { requireUser } from '$lib/server/auth/require';
import * as records from '$lib/server/library/records';
import { mayEditLibrary, mayRead } from '$lib/access/policies';
import type { PageServerLoad } from './$types';

const querySchema = z.object({
  q: z.string().max(100).catch(''),
  kind: z.enum(['pump', 'phosphor']).optional().catch(undefined),
  sort: z.enum(records.SORT_KEYS).catch('code'),
  dir: z.enum(['asc', 'desc']).catch('asc'),
  archived: z.enum(['1']).optional().catch(undefined)
});

export const load: PageServerLoad = async ({ locals, url }) => {
  const user = requireUser(locals, mayRead);
  const query = querySchema.parse(Object.fromEntries(url.searchParams));
  const materials = await records.list({
    kind: query.kind,
    search: query.q,
    sort: query.sort,
    dir: query.dir,
    includeArchived: query.archived === '1'
  });
  return {
    query,
    canEdit: mayEditLibrary(user),
    materials: materials.map((m) => ({
      id: m.id,
      kind: m.kind,
      code: m.code,
      name: m.name,
      family: m.family,
      supplier: m.supplier,
      peakNm: m.peakNm,
      fwhmNm: m.fwhmNm,
      iqe: m.iqe,
      costPerKg: m.costPerKg,
      updatedAt: m.updatedAt,
      archived: m.archivedAt !== null
    }))
  };
};
