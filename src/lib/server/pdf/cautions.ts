/**
 * Handling cautions printed on weigh-out papers (common practice for phosphor powders and two-part
 * silicones; they point to the safety data sheets and local rules, which always take precedence).
 */
export const WEIGHOUT_CAUTION_TITLE = 'Caution: phosphor powders and silicone chemicals';

export const WEIGHOUT_CAUTIONS: string[] = [
  'Phosphor powders are fine, respirable dusts. Weigh in a ventilated enclosure or ' +
    'under local exhaust, avoid raising dust, wear gloves and eye protection, and a ' +
    'respirator (e.g. FFP2/N95) where dust is possible.',
  'Fluoride phosphors (e.g. K2SiF6:Mn) can release hydrogen fluoride with moisture or acids: keep them dry and away from acids.',
  'Uncured silicone parts irritate skin and eyes. The crosslinker can release ' +
    'hydrogen: do not seal mixed slurry or waste in closed containers. Vacuum ' +
    'degassing: check the vessel and use a shield.',
  "Follow the safety data sheet of every material and your site's safety rules and local regulations; they take precedence over this paper."
];
