import { describe, expect, it } from 'vitest';
import { evaluateSpectrum } from '../../src/lib/spectral/index';
import { CIE_D65 } from '../../src/lib/spectral/data/cie-d65';
import { CIE_ILLUMINANTS_F, CIE_ILLUMINANT_A } from '../../src/lib/spectral/data/cie-illuminants';
import { bandsSpd, tableSpd } from './helpers';

const d65 = () => evaluateSpectrum(tableSpd(CIE_D65.values, CIE_D65.startNm, CIE_D65.stepNm)).alphaOpic;

describe('α-opic metrics (CIE S 026/E:2018)', () => {
  it('gives the published α-opic efficacies of luminous radiation of D65', () => {
    const e = d65().efficacyMwPerLm;
    // CIE S 026/E:2018, K_α,v of D65 in mW/lm (s-cone 0.8173, m-cone 1.4558, l-cone 1.6289, rhodopic 1.4497, melanopic 1.3262)
    expect(e.sCone).toBeCloseTo(0.8173, 4);
    expect(e.mCone).toBeCloseTo(1.4558, 4);
    expect(e.lCone).toBeCloseTo(1.6289, 4);
    expect(e.rhodopic).toBeCloseTo(1.4497, 4);
    expect(e.melanopic).toBeCloseTo(1.3262, 4);
  });

  it('gives a daylight efficacy ratio of 1 for D65 and 1,000 lx melanopic EDI per 1,000 lx', () => {
    const a = d65();
    // CIE S 026/E:2018: the α-opic DER is the ratio to D65, so D65 has DER 1 by definition
    for (const v of Object.values(a.der)) expect(v).toBeCloseTo(1, 3);
    // CIE S 026/E:2018: E_v,mel^D65 = E_v × DER_mel
    expect(a.melanopicEdiPer1000Lx).toBeCloseTo(1000, 0);
  });

  it('gives the melanopic DER of illuminant A', () => {
    const a = evaluateSpectrum(tableSpd(CIE_ILLUMINANT_A.values, CIE_ILLUMINANT_A.startNm, CIE_ILLUMINANT_A.stepNm)).alphaOpic;
    // Published CIE S 026 worked example: illuminant A at 100 lx has melanopic EDI 49.581 lx (DER 0.4958)
    expect(a.der.melanopic).toBeCloseTo(0.4958, 3);
    expect(a.melanopicEdiPer1000Lx).toBeGreaterThan(490);
    expect(a.melanopicEdiPer1000Lx).toBeLessThan(501);
  });

  it('gives the five α-opic DERs of fluorescent illuminant F12', () => {
    const f12 = CIE_ILLUMINANTS_F.series.F12;
    const a = evaluateSpectrum(tableSpd(f12, CIE_ILLUMINANTS_F.startNm, CIE_ILLUMINANTS_F.stepNm)).alphaOpic;
    // Published CIE S 026 worked example: F12 at 100 lx has α-opic EDIs 35.929, 79.904, 100.440, 50.848, 40.420 lx
    expect(a.der.sCone).toBeCloseTo(0.35929, 3);
    expect(a.der.mCone).toBeCloseTo(0.79904, 3);
    expect(a.der.lCone).toBeCloseTo(1.0044, 3);
    expect(a.der.rhodopic).toBeCloseTo(0.50848, 3);
    expect(a.der.melanopic).toBeCloseTo(0.4042, 3);
  });

  it('rates a blue-rich white above a warm white (melanopic peak near 490 nm)', () => {
    // common practice: cool, blue/cyan-rich whites stimulate melanopsin more per lumen than warm whites
    const cool = evaluateSpectrum(
      bandsSpd([
        [450, 20, 1],
        [490, 40, 0.6],
        [560, 100, 1.2]
      ])
    ).alphaOpic;
    const warm = evaluateSpectrum(
      bandsSpd([
        [450, 20, 0.3],
        [610, 80, 1.5],
        [550, 80, 0.8]
      ])
    ).alphaOpic;
    expect(cool.der.melanopic).toBeGreaterThan(warm.der.melanopic);
  });
});
