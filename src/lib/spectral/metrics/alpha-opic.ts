/**
 * α-opic metrology, CIE S 026/E:2018 "CIE System for Metrology of Optical Radiation for
 * ipRGC-Influenced Responses to Light" [CIE-S026-2018]:
 *   α-opic efficacy of luminous radiation  K_α,v = Σ s_α(λ) S(λ) Δλ / (K_m Σ V(λ) S(λ) Δλ)   (W/lm; shown in mW/lm)
 *   α-opic daylight efficacy ratio (DER)   γ_α,v^D65 = K_α,v / K_α,v^D65
 *   melanopic EDI of 1,000 lx              E_v,mel^D65 = 1000 lx × γ_mel,v^D65
 * with s_α(λ) the action spectra of Table 2 (s-cone, m-cone, l-cone, rhodopic, melanopic; 380–780 nm,
 * zero outside), V(λ) = ȳ(λ) of the CIE 1931 2° observer and K_m = 683.002 lm/W (as `ler.ts`).
 * K_α,v^D65 are the constants CIE S 026 publishes for D65 (mW/lm), so the DER follows the standard's
 * own definition. Sums over the working grid (360–830 nm, 1 nm). Dimensionless ratios; EDI in lx.
 */
import { CMF_1931_2DEG } from '../colorimetry/cmf';
import { CIE_S026_ACTION_SPECTRA } from '../data/cie-s026-alpha-opic';
import { tableToGrid } from '../grid';
import type { AlphaOpicResult, AlphaOpicValues } from '../types';
import { KM_LM_PER_W } from './ler';

/** The five α-opic quantities in the order of CIE S 026 Table 2. */
export const ALPHA_OPIC_KEYS = ['sCone', 'mCone', 'lCone', 'rhodopic', 'melanopic'] as const;
export type AlphaOpicKey = (typeof ALPHA_OPIC_KEYS)[number];

/** K_α,v of CIE standard illuminant D65, mW/lm (CIE S 026/E:2018) [CIE-S026-2018]. */
export const ALPHA_OPIC_D65_MW_PER_LM: AlphaOpicValues = {
  sCone: 0.8173,
  mCone: 1.4558,
  lCone: 1.6289,
  rhodopic: 1.4497,
  melanopic: 1.3262
};

const t = CIE_S026_ACTION_SPECTRA;
const S_SC = tableToGrid(t.sCone, t.startNm, t.stepNm);
const S_MC = tableToGrid(t.mCone, t.startNm, t.stepNm);
const S_LC = tableToGrid(t.lCone, t.startNm, t.stepNm);
const S_RH = tableToGrid(t.rhodopic, t.startNm, t.stepNm);
const S_MEL = tableToGrid(t.melanopic, t.startNm, t.stepNm);

// α-opic efficacy of luminous radiation and daylight efficacy ratio, CIE S 026/E:2018 [CIE-S026-2018].
export function alphaOpicCieS026(spd: Float64Array): AlphaOpicResult {
  const v = CMF_1931_2DEG.yBar;
  let sc = 0;
  let mc = 0;
  let lc = 0;
  let rh = 0;
  let mel = 0;
  let lum = 0;
  for (let i = 0; i < spd.length; i++) {
    const p = spd[i];
    sc += p * S_SC[i];
    mc += p * S_MC[i];
    lc += p * S_LC[i];
    rh += p * S_RH[i];
    mel += p * S_MEL[i];
    lum += p * v[i];
  }
  // W/lm → mW/lm
  const k = 1000 / (KM_LM_PER_W * lum);
  const efficacy: AlphaOpicValues = { sCone: sc * k, mCone: mc * k, lCone: lc * k, rhodopic: rh * k, melanopic: mel * k };
  const d65 = ALPHA_OPIC_D65_MW_PER_LM;
  const der: AlphaOpicValues = {
    sCone: efficacy.sCone / d65.sCone,
    mCone: efficacy.mCone / d65.mCone,
    lCone: efficacy.lCone / d65.lCone,
    rhodopic: efficacy.rhodopic / d65.rhodopic,
    melanopic: efficacy.melanopic / d65.melanopic
  };
  return { efficacyMwPerLm: efficacy, der, melanopicEdiPer1000Lx: 1000 * der.melanopic };
}
