/**
 * CCT/Duv methods: a method map and one dispatcher (Ohno 2014 is the default).
 * See `ohno2014.ts` [Ohno2014] and `robertson1968.ts` [Robertson1968].
 */
import { uvToCctOhno2014, type CctDuv } from './ohno2014';
import { uvToCctRobertson1968 } from './robertson1968';

export type CctMethod = 'ohno2014' | 'robertson1968';

export const CCT_METHODS: Record<CctMethod, (u: number, v: number) => CctDuv> = {
  ohno2014: uvToCctOhno2014,
  // Robertson gives no Duv; report NaN rather than a made-up number.
  robertson1968: (u, v) => ({ cct: uvToCctRobertson1968(u, v), duv: Number.NaN })
};

/** CCT (K) and Duv of a CIE 1960 u,v point by the chosen method. */
export function uvToCct(u: number, v: number, method: CctMethod = 'ohno2014'): CctDuv {
  return CCT_METHODS[method](u, v);
}

export { uvToCctOhno2014, uvToCctRobertson1968, type CctDuv };
export { cctDuvToUv, cctDuvToXy } from './inverse';
export { planckianUv } from './planckian-locus';
