/**
 * Colour fidelity index Rf (CIE 224:2017 "CIE 2017 Colour Fidelity Index for accurate scientific
 * use" [CIE224-2017]) and the gamut index Rg with the 16-bin local indices of ANSI/IES TM-30-20
 * "Method for Evaluating Light Source Color Rendition" [IES-TM30-20].
 *  1. reference at the test CCT (`reference.ts`; CCT from the CIE 1931 2° observer);
 *  2. XYZ10 of test, reference and the 99 CES (CIE 1964 10°, 380–780 nm, white Y10 = 100);
 *  3. CAM02-UCS J'a'b' of each CES under each illuminant (`cam02ucs.ts`);
 *  4. ΔE'_i, mean ΔE'; Rf = 10·ln(exp((100 − 6.73·ΔE')/10) + 1) (CIE 224 eq. 8–9);
 *  5. 16 hue bins of 22.5° by reference hue; mean a',b' per bin (TM-30-20 §4.4);
 *     Rg = 100·A_test/A_ref (polygon areas); Rf,hj from the bin mean ΔE';
 *     Rcs,hj = (C_t,j − C_r,j)/C_r,j (fraction); Rhs,hj = h_t,j − h_r,j (radians, wrapped).
 * Input: SPD on the working grid (any scale) and its CCT in K (valid about 1000–25000 K).
 * Far from white (e.g. a blue pump alone, |Duv| ≳ 0.1) CIECAM02 responses go negative and
 * Rf, Rg and some bins come out NaN: TM-30 is undefined there; callers show "—".
 */
import { cesUnder, CES_COUNT, newCesSet, tm30ReferenceSamples } from './reference';
import { cam02UcsSamples, newCam02White, setCam02White } from './cam02ucs';
import type { Tm30Bin, Tm30Result } from '../types';

export const TM30_BIN_COUNT = 16;
/** CIE 224:2017 eq. 9 scale factor. */
export const RF_SCALE = 6.73;
const BIN_WIDTH = (2 * Math.PI) / TM30_BIN_COUNT;

// Work buffers, reused by every call (the results returned are fresh objects).
const test = newCesSet();
const ref = newCesSet();
const viewT = newCam02White();
const viewR = newCam02White();
const jabT = new Float64Array(3 * CES_COUNT);
const binCount = new Float64Array(TM30_BIN_COUNT);
const binDE = new Float64Array(TM30_BIN_COUNT);
const at = new Float64Array(TM30_BIN_COUNT);
const bt = new Float64Array(TM30_BIN_COUNT);
const ar = new Float64Array(TM30_BIN_COUNT);
const br = new Float64Array(TM30_BIN_COUNT);

/** The reference side at one CCT: J'a'b' of the 99 CES and the hue bin of each (depends on the CCT alone). */
interface ReferenceJab {
  cctK: number;
  jab: Float64Array;
  bin: Int32Array;
}

// The last few reference CCTs, keyed by the exact CCT, so re-evaluating a spectrum (or a source at the
// same CCT) skips the reference illuminant; results are identical with or without a hit.
const REFERENCE_CACHE_SIZE = 4;
const referenceCache: ReferenceJab[] = Array.from({ length: REFERENCE_CACHE_SIZE }, () => ({
  cctK: NaN,
  jab: new Float64Array(3 * CES_COUNT),
  bin: new Int32Array(CES_COUNT)
}));
let nextSlot = 0;

/** CIE 224:2017 eq. 9: Rf from a mean colour difference ΔE'. */
export function rfFromDeltaE(deltaE: number): number {
  return 10 * Math.log(Math.exp((100 - RF_SCALE * deltaE) / 10) + 1);
}

function polygonArea(a: Float64Array, b: Float64Array): number {
  let s = 0;
  for (let j = 0; j < a.length; j++) {
    const k = (j + 1) % a.length;
    s += a[j] * b[k] - a[k] * b[j];
  }
  return Math.abs(s) / 2;
}

/** CIE 224 §4.3–4.4 and TM-30-20 §4.4: reference J'a'b' of the CES and their hue bins at a CCT. */
function referenceJab(cctK: number): ReferenceJab {
  for (const entry of referenceCache) if (entry.cctK === cctK) return entry;
  const entry = referenceCache[nextSlot];
  nextSlot = (nextSlot + 1) % REFERENCE_CACHE_SIZE;
  tm30ReferenceSamples(cctK, ref);
  setCam02White(ref.white, viewR);
  const { jab, bin } = entry;
  cam02UcsSamples(viewR, ref.samples, CES_COUNT, jab);
  for (let i = 0; i < CES_COUNT; i++) {
    const o = 3 * i;
    let h = Math.atan2(jab[o + 2], jab[o + 1]);
    if (h < 0) h += 2 * Math.PI;
    bin[i] = Math.min(Math.floor(h / BIN_WIDTH), TM30_BIN_COUNT - 1);
  }
  entry.cctK = cctK;
  return entry;
}

export function tm30Cie224(spd: Float64Array, cctK: number): Tm30Result {
  const { jab: jabR, bin } = referenceJab(cctK);
  cesUnder(spd, test);
  setCam02White(test.white, viewT);
  binCount.fill(0);
  binDE.fill(0);
  at.fill(0);
  bt.fill(0);
  ar.fill(0);
  br.fill(0);
  let sumDE = 0;
  cam02UcsSamples(viewT, test.samples, CES_COUNT, jabT);
  for (let i = 0; i < CES_COUNT; i++) {
    const o = 3 * i;
    const dJ = jabT[o] - jabR[o];
    const da = jabT[o + 1] - jabR[o + 1];
    const db = jabT[o + 2] - jabR[o + 2];
    const dE = Math.sqrt(dJ * dJ + da * da + db * db);
    sumDE += dE;
    const j = bin[i];
    binCount[j] += 1;
    binDE[j] += dE;
    at[j] += jabT[o + 1];
    bt[j] += jabT[o + 2];
    ar[j] += jabR[o + 1];
    br[j] += jabR[o + 2];
  }
  const bins: Tm30Bin[] = [];
  for (let j = 0; j < TM30_BIN_COUNT; j++) {
    const n = binCount[j] || 1; // every bin holds CES for real sources; avoid 0/0 otherwise
    at[j] /= n;
    bt[j] /= n;
    ar[j] /= n;
    br[j] /= n;
    const ct = Math.sqrt(at[j] * at[j] + bt[j] * bt[j]);
    const cr = Math.sqrt(ar[j] * ar[j] + br[j] * br[j]);
    let dh = Math.atan2(bt[j], at[j]) - Math.atan2(br[j], ar[j]);
    if (dh > Math.PI) dh -= 2 * Math.PI;
    if (dh <= -Math.PI) dh += 2 * Math.PI;
    bins.push({
      rf: rfFromDeltaE(binDE[j] / n),
      rcs: cr > 0 ? (ct - cr) / cr : 0,
      rhs: dh,
      testAB: [at[j], bt[j]],
      refAB: [ar[j], br[j]]
    });
  }
  return {
    rf: rfFromDeltaE(sumDE / CES_COUNT),
    rg: (100 * polygonArea(at, bt)) / polygonArea(ar, br),
    bins
  };
}
