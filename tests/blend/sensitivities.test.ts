import { describe, expect, it } from 'vitest';
import { prepareBasis } from '../../src/lib/blend/basis';
import { loadingSensitivities, opticalSensitivities } from '../../src/lib/blend/sensitivities';
import { THREE } from './fixtures';

// Source: formulators' heuristics, [common practice]: more total phosphor →
// x↑ y↑ (CCT↓); more red → x↑, y↓, Duv↓; more green/yellow → y↑ (Duv↑).
const basis = prepareBasis(THREE);
const w = [0.067, 0.19, 0.265, 0.478];

describe('sensitivity signs (per +1 %)', () => {
  const s = opticalSensitivities(basis, w);
  it('red: x up, y down, CCT down, Duv down', () => {
    const red = s[3];
    expect(red.dx).toBeGreaterThan(0);
    expect(red.dy).toBeLessThan(0);
    expect(red.dCct).toBeLessThan(0);
    expect(red.dDuv).toBeLessThan(0);
  });
  it('green: y up, Duv up', () => {
    expect(s[1].dy).toBeGreaterThan(0);
    expect(s[1].dDuv).toBeGreaterThan(0);
  });
  it('pump: CCT up', () => {
    expect(s[0].dCct).toBeGreaterThan(0);
  });
  it('loading: each phosphor +1 % moves x up (less blue leak)', () => {
    const l = loadingSensitivities(basis, [3, 6, 2], { pathLengthMm: 0.3 });
    for (const k of l) expect(k.dx).toBeGreaterThan(0);
    expect(l[0].dy + l[1].dy).toBeGreaterThan(0);
  });
});
