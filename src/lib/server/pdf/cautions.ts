/**
 * Handling cautions printed on weigh-out papers and shown on the batch page (common practice for
 * phosphor powders and two-part silicones; they point to the safety data sheets and local rules,
 * which always take precedence). A material's own hazards (../../library/hazards.ts) add their
 * caution only where a batch uses that material.
 */
import { materialCautions } from '../../library/hazards';

export const WEIGHOUT_CAUTION_TITLE = 'Caution: phosphor powders and silicone chemicals';

const POWDER =
  'Phosphor powders are fine, respirable dusts. Weigh in a ventilated enclosure or ' +
  'under local exhaust, avoid raising dust, wear gloves and eye protection, and a ' +
  'respirator (e.g. FFP2/N95) where dust is possible.';
const SILICONE =
  'Uncured silicone parts irritate skin and eyes. The crosslinker can release ' +
  'hydrogen: do not seal mixed slurry or waste in closed containers. Vacuum ' +
  'degassing: check the vessel and use a shield.';
const DEFER =
  "Follow the safety data sheet of every material and your site's safety rules and local regulations; " +
  'they take precedence over this paper.';

/** The cautions for a batch whose lines use these materials (code + stored hazard codes). */
export function weighoutCautions(materials: readonly { code: string; hazards: string | null }[]): string[] {
  return [POWDER, ...materialCautions(materials), SILICONE, DEFER];
}
