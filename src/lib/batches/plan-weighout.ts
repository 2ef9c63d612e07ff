/**
 * The weigh-out input of a batch request, chip bin included: picks the chip bin (a revision with a
 * recipe matrix), refuses loadings that are not the bin's, then builds the input from that bin's
 * recipe. Pure, so the plan form's preview and the server give the same answer.
 */
import type { RevisionContent } from '../recipe/upgrade';
import { binLoadingsReason, chooseChipBin, type ChipLot, type ChosenChipBin } from './chip-lot';
import { revisionLoadings, weighoutInputFromRevision, type WeighoutRequest } from './weighout/from-revision';
import type { WeighoutInput } from './weighout/schema';
import type { WeighoutIssue } from './weighout/compute';

export type PlanInputResult = { ok: true; input: WeighoutInput; chip: ChosenChipBin } | { ok: false; errors: WeighoutIssue[] };

const capital = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

export function planInputFromRevision(content: RevisionContent, req: WeighoutRequest & { chipLot?: ChipLot | null }): PlanInputResult {
  const choice = chooseChipBin(content, req.chipLot);
  if (!choice.ok) return { ok: false, errors: [{ ...choice.issue, message: capital(choice.issue.message) }] };
  const chip = choice.chosen;
  const binCode = chip.binRecipe ? chip.binRecipe.bin.code : undefined;
  const wrongLoadings = binLoadingsReason(chip, revisionLoadings(content, req.loading.basis, binCode), req.loading);
  if (wrongLoadings) return { ok: false, errors: [{ ...wrongLoadings, message: capital(wrongLoadings.message) }] };
  const built = weighoutInputFromRevision(content, req, binCode);
  return built.ok ? { ok: true, input: built.input, chip } : built;
}
