import { requireUser } from '$lib/server/auth/require';
import { parseId } from '$lib/server/http/id-param';
import { getRevision } from '$lib/server/formulations/read';
import { listRevisions, revisionListSchema } from '$lib/server/formulations/lists';
import { compareMetrics, compareRatios, compareSettings } from '$lib/formulations/compare';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals, url }) => {
  requireUser(locals);
  const a = parseId(url.searchParams.get('a'));
  let b = parseId(url.searchParams.get('b'));
  const revA = a ? await getRevision(a) : null;
  // With only A chosen, compare it with the revision it was started from (or the one before it).
  if (revA && !b) {
    const siblings = await listRevisions(revisionListSchema.parse({ formulationId: revA.formulationId, sort: 'revision', pageSize: 100 }));
    b = revA.basedOnRevisionId ?? siblings.rows.find((r) => r.revisionNo === revA.revisionNo - 1)?.id ?? null;
  }
  const revB = b ? await getRevision(b) : null;
  const choices = (await listRevisions(revisionListSchema.parse({ sort: 'code', dir: 'asc', pageSize: 100 }))).rows;
  const both = revA && revB;
  return {
    a: revA,
    b: revB,
    choices,
    notFound: (a !== null && !revA) || (b !== null && !revB),
    ratios: both ? compareRatios(revA.content, revB.content) : [],
    metrics: both ? compareMetrics(revA.predicted, revB.predicted) : [],
    settings: both ? compareSettings(revA.content, revB.content) : []
  };
};
