/**
 * Hazards a material carries beyond those of every phosphor powder, as the safety data sheet states
 * them: each with its caution for weigh-out papers and pages. Cautions are common practice; the
 * safety data sheet and local rules always take precedence. Stored as a comma-separated list of codes.
 */
export const HAZARD_CODES = ['hydrogenFluoride', 'hydrogenSulfide', 'moistureSensitive'] as const;
export type HazardCode = (typeof HAZARD_CODES)[number];

export const HAZARDS: Readonly<Record<HazardCode, { label: string; caution: string }>> = {
  hydrogenFluoride: {
    label: 'Releases hydrogen fluoride with moisture or acids (fluoride phosphors)',
    caution: 'can release hydrogen fluoride with moisture or acids: keep dry and away from acids, and follow its fluoride handling rules.'
  },
  hydrogenSulfide: {
    label: 'Releases hydrogen sulfide with moisture or acids (sulfide phosphors)',
    caution: 'can release hydrogen sulfide with moisture or acids: keep sealed and dry, away from acids, and weigh under exhaust.'
  },
  moistureSensitive: {
    label: 'Moisture-sensitive',
    caution: 'degrades in humid air: keep the container closed and dry, and weigh without delay.'
  }
};

export function isHazardCode(v: string): v is HazardCode {
  return (HAZARD_CODES as readonly string[]).includes(v);
}

/** "hydrogenFluoride,moistureSensitive" → codes in catalogue order; unknown codes are dropped. */
export function hazardList(stored: string | null | undefined): HazardCode[] {
  const given = new Set((stored ?? '').split(',').map((s) => s.trim()));
  return HAZARD_CODES.filter((c) => given.has(c));
}

/** The cautions of the materials that carry a hazard: "NR-631: can release hydrogen fluoride …". */
export function materialCautions(materials: readonly { code: string; hazards: string | null }[]): string[] {
  return HAZARD_CODES.flatMap((code) => {
    const carriers = materials.filter((m) => hazardList(m.hazards).includes(code)).map((m) => m.code);
    return carriers.length ? [`${[...new Set(carriers)].join(', ')}: ${HAZARDS[code].caution}`] : [];
  });
}
