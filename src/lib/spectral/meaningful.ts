/**
 * Which figures mean something for a colour point, as one rule for every page:
 * - CCT and Duv only near the Planckian locus, |Duv| ≤ 0.05, and within 1000–20 000 K (CIE 15:2004
 *   §9.5 notes CCT is not meaningful far from the locus; the 0.05 limit is common practice);
 * - colour rendering, CIE 13.3 (Ra, R1–R14) and IES TM-30 (Rf, Rg) together, only where CIE 13.3 holds
 *   (DC < 5.4e-3, CIE 13.3-1995 §5.3) and CCT means something: a page never shows one set and hides the other.
 */
export const CCT_DUV_LIMIT = 0.05;
export const CCT_RANGE_K: readonly [number, number] = [1000, 20_000];

export function cctMeaningful(cct: number, duv: number): boolean {
  return Number.isFinite(cct) && Number.isFinite(duv) && Math.abs(duv) <= CCT_DUV_LIMIT && cct >= CCT_RANGE_K[0] && cct <= CCT_RANGE_K[1];
}

export interface PointMetrics {
  cct: number;
  duv: number;
  /** CIE 13.3 validity (DC < 5.4e-3). */
  criValid: boolean;
  ra: number | null;
  r9: number | null;
  rf: number | null;
  rg: number | null;
}

export interface ShownMetrics {
  cct: number | null;
  duv: number | null;
  ra: number | null;
  r9: number | null;
  rf: number | null;
  rg: number | null;
  /** Why CCT/Duv are hidden, or null. */
  colourNote: string | null;
  /** Why the rendering figures are hidden, or null. */
  renderingNote: string | null;
}

const finiteOrNull = (v: number | null) => (v !== null && Number.isFinite(v) ? v : null);

export function shownMetrics(m: PointMetrics): ShownMetrics {
  const colour = cctMeaningful(m.cct, m.duv);
  const rendering = colour && m.criValid;
  return {
    cct: colour ? m.cct : null,
    duv: colour ? m.duv : null,
    ra: rendering ? finiteOrNull(m.ra) : null,
    r9: rendering ? finiteOrNull(m.r9) : null,
    rf: rendering ? finiteOrNull(m.rf) : null,
    rg: rendering ? finiteOrNull(m.rg) : null,
    colourNote: colour ? null : 'CCT and Duv are not meaningful this far from the Planckian locus (|Duv| > 0.05 or outside 1000–20 000 K).',
    renderingNote: rendering
      ? null
      : 'Colour rendering (Ra, R1–R14, Rf, Rg) is not meaningful this far from white (CIE 13.3 §5.3: DC ≥ 5.4e-3).'
  };
}
