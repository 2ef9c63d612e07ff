import { describe, expect, it } from 'vitest';
import { ANSI_NOMINAL_CCTS, DEFAULT_AIM, aimFrom, floorsOf, resolveAim, type AimState } from '../../../src/lib/designer/aim';

const aim = (patch: Partial<AimState>): AimState => ({ ...structuredClone(DEFAULT_AIM), ...patch });

describe('designer aim → target, tolerance, floors', () => {
  it('resolves 3000 K, Duv 0 to a point on the Planckian locus', () => {
    const r = resolveAim(aim({}));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    // Planckian 3000 K: x ≈ 0.4369, y ≈ 0.4041 (CIE 15 Planck locus, from memory).
    expect(r.resolved.x).toBeCloseTo(0.4369, 3);
    expect(r.resolved.y).toBeCloseTo(0.4041, 3);
    expect(r.tolerance).toEqual({ kind: 'sdcm', steps: 3 });
    expect(r.floors).toEqual({ raMin: 90, r9Min: 50 });
  });

  it('resolves an ANSI bin to its centre (ANSI C78.377-2017 Table 1, 3000 K: 0.4339, 0.4033)', () => {
    const r = resolveAim(aim({ kind: 'ansiBin', nominalCct: 3000 }));
    expect(r.ok && r.resolved.x).toBeCloseTo(0.4339, 3);
    expect(r.ok && r.resolved.y).toBeCloseTo(0.4033, 3);
    expect(ANSI_NOMINAL_CCTS).toEqual([2200, 2500, 2700, 3000, 3500, 4000, 4500, 5000, 5700, 6500]);
  });

  it('says what is wrong with a bad target, tolerance or floor', () => {
    const r = resolveAim(aim({ cct: 500, toleranceSdcm: 0, floors: { raMin: 120, r9Min: null, rfMin: null, lerMin: null, intent: null } }));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors.target).toContain('CCT must be 1000–20000 K');
    expect(r.errors.tolerance).toContain('SDCM');
    expect(r.errors.floors).toBe('Ra floor: must be at most 100');
    const missing = resolveAim(aim({ kind: 'xy', x: null }));
    expect(!missing.ok && missing.errors.target).toContain('Chromaticity x is required');
  });

  it('leaves empty floors out', () => {
    expect(floorsOf({ raMin: null, r9Min: 50, rfMin: Number.NaN, lerMin: 300, intent: null })).toEqual({ r9Min: 50, lerMin: 300 });
  });

  it('fills the form back from a stored target', () => {
    const a = aimFrom({ kind: 'ansiBin', nominalCct: 4000 }, { kind: 'sdcm', steps: 5 }, { raMin: 80 });
    expect(a.kind).toBe('ansiBin');
    expect(a.nominalCct).toBe(4000);
    expect(a.toleranceSdcm).toBe(5);
    expect(a.floors).toEqual({ raMin: 80, r9Min: null, rfMin: null, lerMin: null, melDerMin: null, melDerMax: null, intent: null });
  });

  it('carries a melanopic DER floor and ceiling both ways and refuses a floor above the ceiling', () => {
    // common practice: what the form shows is what is stored, and contradictory limits are refused
    const a = aimFrom({ kind: 'cctDuv', cct: 3000, duv: 0 }, { kind: 'sdcm', steps: 3 }, { raMin: 80, melDerMin: 0.3, melDerMax: 0.45 });
    expect(floorsOf(a.floors)).toEqual({ raMin: 80, melDerMin: 0.3, melDerMax: 0.45 });
    const r = resolveAim({ ...a, floors: { ...a.floors, melDerMin: 0.6 } });
    expect(!r.ok && r.errors.floors).toContain('ceiling');
  });
});
