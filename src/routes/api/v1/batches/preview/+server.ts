import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/auth/require';
import { readJson } from '$lib/server/api/body';
import { prepareBatch } from '$lib/server/batches/create';
import { createBatchSchema } from '$lib/batches/schema';
import { apiHandler } from '$lib/server/http/api-handler';
import type { RequestHandler } from './$types';

/** The weigh-out plan a create request would give, without saving anything. */
export const POST: RequestHandler = (event) =>
  apiHandler(async () => {
    requireUser(event.locals);
    const { plan, input, chip } = await prepareBatch(await readJson(event, createBatchSchema));
    const chipLot = { lotNumber: chip.lotNumber, binCode: chip.binCode, wavelengthNm: chip.wavelengthNm, bin: chip.binRecipe?.bin ?? null };
    return json({ plan, weighoutInput: input, chipLot, predicted: chip.binRecipe?.predicted ?? null });
  });
