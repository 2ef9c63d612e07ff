import { error } from '@sveltejs/kit';
import { z } from 'zod';
import { requireUser } from '$lib/server/auth/require';
import { mayAcceptDeviation, mayWeigh } from '$lib/access/policies';
import { actionFailure } from '$lib/server/http/action-failure';
import { idParam } from '$lib/server/http/id-param';
import { getBatch } from '$lib/server/batches/read';
import { acceptDeviation, markMixed, recordLine } from '$lib/server/batches/weighing';
import { completeBatch } from '$lib/server/batches/complete';
import { scaleBatch } from '$lib/server/batches/scale';
import { loadingSummary, toleranceLabel } from '$lib/server/batches/documents';
import { completeSchema, overrideLineSchema, recordLineSchema } from '$lib/batches/schema';
import { LOADING_BASIS_LABELS } from '$lib/batches/weighout/schema';
import { WEIGHOUT_CAUTION_TITLE } from '$lib/server/pdf/cautions';
import { batchCautions } from '$lib/server/batches/cautions';
import { lotsOfMaterials } from '$lib/server/batches/lots';
import { chipBinSummary } from '$lib/batches/chip-bin-summary';
import type { Actions, PageServerLoad } from './$types';
import { readForm } from '$lib/server/forms/read-form';
import { MAX_BATCH_MASS_G, MAX_BATCH_MASS_MESSAGE, storable, STORED_G_PLACES } from '$lib/batches/weighout/limits';

export const load: PageServerLoad = async ({ locals, params }) => {
  const user = requireUser(locals);
  const d = await getBatch(idParam(params.id, 'Batch not found'));
  if (!d) error(404, 'Batch not found');
  const { input: _input, ...batch } = d.batch;
  return {
    batch,
    lines: d.lines.map((l) => ({ ...l, toleranceLabel: toleranceLabel(l.tolerance) })),
    basisLabel: LOADING_BASIS_LABELS[batch.loadingBasis],
    loadingSummary: loadingSummary(d.batch),
    chip: chipBinSummary(d.revision?.content ?? null, d.batch),
    silicone: d.silicone,
    caution: { title: WEIGHOUT_CAUTION_TITLE, lines: await batchCautions(d.lines) },
    // Registered lots per line's material, for the live lot hint (the server checks again on Record).
    lots: await lotsOfMaterials(d.lines.map((l) => l.materialId).filter((id): id is number => id !== null)),
    today: new Date().toISOString().slice(0, 10),
    canWeigh: mayWeigh(user),
    canAccept: mayAcceptDeviation(user),
    userId: user.id
  };
};

type Values = Record<string, string>;

async function run(action: string, values: Values, fn: () => Promise<unknown>) {
  try {
    await fn();
    return { action, seq: values.seq ?? null, done: true };
  } catch (err) {
    return actionFailure(err, { action, seq: values.seq ?? null, values });
  }
}

async function formValues(request: Request): Promise<Values> {
  return Object.fromEntries([...(await readForm(request))].map(([k, v]) => [k, String(v)]));
}

const invalidForm = (action: string, values: Values, e: z.ZodError) =>
  actionFailure(400, { action, seq: values.seq ?? null, values, error: e.issues.map((i) => i.message).join('; ') });

export const actions: Actions = {
  record: async ({ locals, params, request }) => {
    const user = requireUser(locals, mayWeigh);
    const v = await formValues(request);
    const parsed = recordLineSchema.safeParse({ actualG: v.actualG ?? '', lotNumber: v.lotNumber ?? '', version: Number(v.version) });
    if (!parsed.success) return invalidForm('record', v, parsed.error);
    return run('record', v, () => recordLine(user, idParam(params.id, 'Batch not found'), Number(v.seq), parsed.data));
  },
  acceptDeviation: async ({ locals, params, request }) => {
    const user = requireUser(locals, mayAcceptDeviation);
    const v = await formValues(request);
    const parsed = overrideLineSchema.safeParse({ reason: v.reason ?? '', password: v.password ?? '', version: Number(v.version) });
    if (!parsed.success) return invalidForm('acceptDeviation', v, parsed.error);
    return run('acceptDeviation', v, () => acceptDeviation(user, idParam(params.id, 'Batch not found'), Number(v.seq), parsed.data));
  },
  mix: async ({ locals, params, request }) => {
    const user = requireUser(locals, mayWeigh);
    const v = await formValues(request);
    const parsed = z
      .object({
        version: z.coerce.number().int().positive(),
        minutesAgo: z.coerce.number().int().min(0, 'minutes ago must be ≥ 0').max(600).default(0)
      })
      .safeParse({ version: v.version, minutesAgo: v.minutesAgo || undefined });
    if (!parsed.success) return invalidForm('mix', v, parsed.error);
    return run('mix', v, () =>
      markMixed(user, idParam(params.id, 'Batch not found'), {
        version: parsed.data.version,
        mixedAt: new Date(Date.now() - parsed.data.minutesAgo * 60_000)
      })
    );
  },
  complete: async ({ locals, params, request }) => {
    const user = requireUser(locals, mayWeigh);
    const v = await formValues(request);
    const parsed = completeSchema.safeParse({ version: Number(v.version) });
    if (!parsed.success) return invalidForm('complete', v, parsed.error);
    return run('complete', v, () => completeBatch(user, idParam(params.id, 'Batch not found'), parsed.data.version));
  },
  scale: async ({ locals, params, request }) => {
    const user = requireUser(locals, mayWeigh);
    const v = await formValues(request);
    const parsed = z
      .object({
        version: z.coerce.number().int().positive(),
        batchMassG: z.coerce
          .number('enter the new batch size in g')
          .finite()
          .gt(0, 'the batch size must be > 0 g')
          .max(MAX_BATCH_MASS_G, MAX_BATCH_MASS_MESSAGE)
          .refine(...storable('batch size', STORED_G_PLACES, ' g'))
      })
      .safeParse({ version: v.version, batchMassG: (v.batchMassG ?? '').replace(',', '.') });
    if (!parsed.success) return invalidForm('scale', v, parsed.error);
    return run('scale', v, () => scaleBatch(user, idParam(params.id, 'Batch not found'), parsed.data));
  }
};
