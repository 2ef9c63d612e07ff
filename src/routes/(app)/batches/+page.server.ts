import { redirect } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { mayPlanBatch } from '$lib/access/policies';
import { getBatchIdByNumber, listBatches } from '$lib/server/batches/read';
import { listQuerySchema } from '$lib/batches/schema';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals, url }) => {
  const user = requireUser(locals);
  const raw = Object.fromEntries([...url.searchParams].filter(([, v]) => v !== ''));
  const parsed = listQuerySchema.safeParse(raw);
  const filter = parsed.success ? parsed.data : listQuerySchema.parse({});
  // A scanned batch barcode lands straight on its batch.
  if (filter.q && /^BT-\d{6}-\d{3,}$/i.test(filter.q)) {
    const id = await getBatchIdByNumber(filter.q.toUpperCase());
    if (id) redirect(303, `/batches/${id}`);
  }
  const { items, total } = await listBatches(filter);
  return {
    items,
    total,
    filter: { state: filter.state ?? '', q: filter.q ?? '', offset: filter.offset, limit: filter.limit },
    invalid: !parsed.success,
    canPlan: mayPlanBatch(user)
  };
};
