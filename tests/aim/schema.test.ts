import { describe, expect, it } from 'vitest';
import { floorsSchema, targetSchema, toleranceSchema } from '../../src/lib/aim/index';

// Ranges of the product: CCT 1000–20000 K, |Duv| ≤ 0.05, ANSI nominal 2200–6500 K (ANSI C78.377-2017
// flexible-CCT range), tolerance > 0, Rg window ordered.
const message = (r: { success: boolean; error?: { issues: { message: string }[] } }) => r.error?.issues.map((i) => i.message).join('; ');

describe('zod schemas of the aim', () => {
  it('accepts the three target kinds', () => {
    expect(targetSchema.safeParse({ kind: 'cctDuv', cct: 3000, duv: 0 }).success).toBe(true);
    expect(targetSchema.safeParse({ kind: 'xy', x: 0.4339, y: 0.4033 }).success).toBe(true);
    expect(targetSchema.safeParse({ kind: 'ansiBin', nominalCct: 3500 }).success).toBe(true);
  });
  it('refuses out-of-range targets with readable messages', () => {
    expect(message(targetSchema.safeParse({ kind: 'cctDuv', cct: 900, duv: 0 }))).toBe('CCT must be 1000–20000 K');
    expect(message(targetSchema.safeParse({ kind: 'cctDuv', cct: 3000, duv: 0.06 }))).toBe('Duv must be within ±0.05');
    expect(message(targetSchema.safeParse({ kind: 'ansiBin', nominalCct: 2100 }))).toBe('ANSI nominal CCT 2200–6500 K');
  });
  it('tolerance must be positive', () => {
    expect(toleranceSchema.safeParse({ kind: 'sdcm', steps: 3 }).success).toBe(true);
    expect(toleranceSchema.safeParse({ kind: 'sdcm', steps: 0 }).success).toBe(false);
    expect(toleranceSchema.safeParse({ kind: 'deltaUvPrime', value: 0.004 }).success).toBe(true);
  });
  it('an Rg window must be ordered', () => {
    expect(message(floorsSchema.safeParse({ rgMin: 110, rgMax: 92 }))).toBe('rgMin must not exceed rgMax');
    expect(floorsSchema.safeParse({ raMin: 90, r9Min: 50, rgMin: 92, rgMax: 110 }).success).toBe(true);
  });
});
