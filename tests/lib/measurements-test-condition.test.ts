/**
 * Judging a measurement at the condition it was taken at: bench parts of a hot-aimed revision
 * against its cold check, parts at the revision's condition against the target (85 °C junction:
 * common practice for hot binning; points invented; ANSI C78.377 3000 K bin as the target).
 */
import { describe, expect, it } from 'vitest';
import { judgingBasis } from '../../src/lib/measurements/test-condition';

const TARGET = { kind: 'ansiBin' as const, nominalCct: 3000 };
const HOT = { reference: 'junction' as const, temperatureC: 85, driveCurrentMa: 350 };
const BENCH = { reference: 'junction' as const, temperatureC: 25, driveCurrentMa: null };
const COLD = { x: 0.4372, y: 0.4021, cct: 2990, duv: 0.0006, ra: 82, r9: 10, steps: 2.2, condition: BENCH };
const PREDICTED = { x: 0.434, y: 0.403 };

describe('judging basis by test condition', () => {
  it('a bench revision judges bench parts against its target, and refuses hot parts', () => {
    const content = { target: TARGET, condition: null, coldCheck: null };
    expect(judgingBasis(content, PREDICTED, null)).toMatchObject({
      status: 'ok',
      target: TARGET,
      predicted: PREDICTED,
      dropBinRule: false
    });
    expect(judgingBasis(content, PREDICTED, HOT)).toEqual({
      status: 'refused',
      reason: 'The revision is aimed at the bench; it has no prediction at Tj 85 °C, 350 mA.'
    });
  });

  it('a hot-aimed revision judges bench parts against the cold check (no bin rule) and hot parts against the target', () => {
    const content = { target: TARGET, condition: HOT, coldCheck: COLD };
    expect(judgingBasis(content, PREDICTED, BENCH)).toEqual({
      status: 'ok',
      target: { kind: 'xy', x: 0.4372, y: 0.4021 },
      predicted: { x: 0.4372, y: 0.4021 },
      dropBinRule: true,
      label: 'the cold check target (revision aimed at Tj 85 °C, 350 mA)'
    });
    expect(judgingBasis(content, PREDICTED, { ...HOT, driveCurrentMa: null })).toMatchObject({ status: 'ok', target: TARGET });
    expect(judgingBasis(content, PREDICTED, { ...HOT, temperatureC: 105 })).toMatchObject({ status: 'refused' });
    expect(judgingBasis({ ...content, coldCheck: null }, PREDICTED, null)).toMatchObject({
      status: 'refused',
      reason: 'The revision is aimed at Tj 85 °C, 350 mA and has no cold check target for bench measurements.'
    });
  });
});
