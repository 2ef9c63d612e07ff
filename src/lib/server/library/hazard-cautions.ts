/** The hazards and cautions of the library materials a recipe or a batch uses (../../library/hazards.ts). */
import { db } from '../db/index';
import { materialCautions } from '../../library/hazards';

/** Code and stored hazard codes of each material, by code. */
export async function materialHazards(materialIds: readonly number[]): Promise<{ code: string; hazards: string }[]> {
  const ids = [...new Set(materialIds)];
  if (!ids.length) return [];
  return (await db()('materials').whereIn('id', ids).orderBy('code').select('code', 'hazards')) as { code: string; hazards: string }[];
}

export async function hazardCautionsOf(materialIds: readonly number[]): Promise<string[]> {
  return materialCautions(await materialHazards(materialIds));
}
