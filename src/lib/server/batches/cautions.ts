/** The weigh-out cautions of one batch: the general ones and those of the materials its lines use. */
import { materialHazards } from '../library/hazard-cautions';
import { weighoutCautions } from '../pdf/cautions';

export async function batchCautions(lines: readonly { materialId: number | null }[]): Promise<string[]> {
  return weighoutCautions(await materialHazards(lines.map((l) => l.materialId).filter((id): id is number => id !== null)));
}
