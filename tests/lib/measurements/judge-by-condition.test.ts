/**
 * Parts judged by the condition their files were measured at (85 °C junction: common practice for
 * hot binning; points invented; ANSI C78.377 3000 K bin as the target), and the test-condition fields
 * of an upload.
 */
import { describe, expect, it } from 'vitest';
import { judgeByCondition } from '../../../src/lib/measurements/judge-by-condition';
import { groupByCondition } from '../../../src/lib/measurements/condition-groups';
import { testConditionFieldsSchema } from '../../../src/lib/measurements/schema';
import { qualityTarget, type Acceptance } from '../../../src/lib/measurements/index';
import { colourDistance } from '../../../src/lib/aim/index';
import { metricsAt } from './support';

const TARGET = { kind: 'ansiBin' as const, nominalCct: 3000 };
const HOT = { reference: 'junction' as const, temperatureC: 85, driveCurrentMa: 350 };
const BENCH = { reference: 'junction' as const, temperatureC: 25, driveCurrentMa: null };
const COLD = { x: 0.4372, y: 0.4021, cct: 2990, duv: 0.0006, ra: 82, r9: 10, steps: 2.2, condition: BENCH };
const PREDICTED_HOT = { x: 0.434, y: 0.403 };
const acceptance: Acceptance = { tolerance: { kind: 'sdcm', steps: 5 }, floors: {}, requireTargetBin: true };
const centre = qualityTarget(TARGET);
const part = (label: string, x: number, y: number, condition: typeof HOT | null) => ({ label, metrics: metricsAt(x, y), condition });

describe('parts judged by the condition they were measured at', () => {
  it('groups bench files first and the same hot condition together', () => {
    const groups = groupByCondition([part('h1', 0.43, 0.4, HOT), part('b1', 0.43, 0.4, null), part('h2', 0.43, 0.4, HOT)]);
    expect(groups.map((g) => [g.label, g.indices])).toEqual([
      ['bench (25 °C)', [1]],
      ['Tj 85 °C, 350 mA', [0, 2]]
    ]);
  });

  it('a hot-aimed revision: bench parts against the cold check, hot parts against the target; each mean against its prediction', () => {
    const content = { target: TARGET, condition: HOT, coldCheck: COLD };
    const parts = [
      part('B-1', COLD.x, COLD.y, null),
      part('B-2', COLD.x, COLD.y, null),
      part('H-1', centre.x, centre.y, HOT),
      part('H-2', centre.x, centre.y, HOT)
    ];
    const { groups, checks } = judgeByCondition(content, PREDICTED_HOT, parts, acceptance);
    expect(groups.map((g) => g.acceptance.requireTargetBin)).toEqual([false, true]); // no bin rule for the cold point
    expect(checks.map((c) => [c.label, c.passed, c.parts])).toEqual([
      ['bench (25 °C)', 2, 2],
      ['Tj 85 °C, 350 mA', 2, 2]
    ]);
    expect(checks[0].judgedAgainst).toBe('the cold check target (revision aimed at Tj 85 °C, 350 mA)');
    expect(checks[0].predicted).toEqual({ x: COLD.x, y: COLD.y });
    expect(checks[0].steps).toBeCloseTo(0, 6); // measured cold = predicted cold
    // Measured hot (the bin centre) against predicted hot: the same distance the aim module gives.
    const expected = colourDistance(centre.x, centre.y, { ...centre, x: PREDICTED_HOT.x, y: PREDICTED_HOT.y });
    expect(checks[1].steps).toBeGreaterThan(0);
    expect(checks[1].deltaUvPrime).toBeCloseTo(expected.deltaUvPrime, 6);
  });

  it('a bench revision names why hot parts have nothing to be compared with', () => {
    const { checks } = judgeByCondition(
      { target: TARGET, condition: null, coldCheck: null },
      PREDICTED_HOT,
      [part('H-1', 0.43, 0.4, HOT)],
      acceptance
    );
    expect(checks[0].judgedAgainst).toBe('The revision is aimed at the bench; it has no prediction at Tj 85 °C, 350 mA.');
    expect(checks[0].predicted).toBeNull();
  });
});

describe('test condition of an upload', () => {
  const read = (f: Record<string, string>) => testConditionFieldsSchema.safeParse(f);
  it('no temperature is the bench; 25 °C without a current is the bench too', () => {
    expect(read({})).toMatchObject({ success: true, data: null });
    expect(read({ testTemperatureC: '25' })).toMatchObject({ success: true, data: null });
  });
  it('reads a hot condition with a decimal comma', () => {
    expect(read({ testTemperatureC: '85', testReference: 'solderPoint', testCurrentMa: '350,0' })).toEqual({
      success: true,
      data: { reference: 'solderPoint', temperatureC: 85, driveCurrentMa: 350 }
    });
  });
  it('names what is wrong', () => {
    const bad = read({ testTemperatureC: 'hot' });
    expect(bad.success).toBe(false);
    expect(bad.error?.issues[0].message).toBe('test temperature "hot" is not a number');
    expect(read({ testCurrentMa: '350' }).error?.issues[0].message).toBe('give the test temperature with the current');
    expect(read({ testTemperatureC: '400' }).error?.issues[0].message).toBe('temperature must be −40 to 200 °C');
  });
});
