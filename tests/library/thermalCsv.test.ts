/**
 * Thermal CSV: a small table per material; a file with any problem is refused whole and the problem
 * names its line. Values: a nitride red keeping ~87 % at 150 °C [from memory].
 */
import { describe, expect, it } from 'vitest';
import { parseThermalCsv } from '../../src/lib/library/thermal-csv';

const RED = [
  '# RD-625 quench curve',
  'temperature_c,relative_emission,peak_shift_nm',
  '25,1,0',
  '85,0.96,-0.8',
  '125,0.91,-1.4',
  '150,0.87,-1.8'
].join('\n');

describe('thermal CSV', () => {
  it('reads a phosphor curve with its peak shift', () => {
    const r = parseThermalCsv('phosphor', RED);
    expect(r.ok).toBe(true);
    if (!r.ok || r.thermal.kind !== 'phosphor') return;
    expect(r.thermal.relativeEmission.map((p) => p.value)).toEqual([1, 0.96, 0.91, 0.87]);
    expect(r.thermal.peakShiftNm).toEqual({
      points: [0, -0.8, -1.4, -1.8].map((value, i) => ({ temperatureC: [25, 85, 125, 150][i], value }))
    });
    expect(r.thermal.widthFactor).toBeNull();
  });

  it('reads a pump curve with the drift given alongside, semicolon and decimal comma', () => {
    const text = 'temperature_c;relative_output\n25;1\n85;0,93\n150;0,85';
    const r = parseThermalCsv('pump', text, { peakDriftNmPerK: 0.04, peakDriftNmPerMa: 0.005, referenceCurrentMa: 350 });
    expect(r.ok && r.thermal.kind === 'pump' && r.thermal.relativeOutput.map((p) => p.value)).toEqual([1, 0.93, 0.85]);
  });

  it('names the line of a bad value', () => {
    const r = parseThermalCsv('phosphor', RED.replace('0.91', '0.9x'));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors).toEqual([{ line: 5, message: 'Line 5: relative_emission "0.9x" is not a number' }]);
  });

  it('names the line of a temperature out of order and refuses a missing 25 °C anchor', () => {
    const r = parseThermalCsv('phosphor', 'temperature_c,relative_emission\n25,1\n125,0.9\n85,0.95');
    expect(!r.ok && r.errors[0]).toEqual({ line: 4, message: 'Line 4: relative curve: temperatures must rise strictly (85 °C)' });
    const s = parseThermalCsv('phosphor', 'temperature_c,relative_emission\n30,1\n85,0.95');
    expect(!s.ok && s.errors[0].message).toBe('relative curve: must include 25 °C with the value 1');
  });

  it('refuses unknown or missing columns on the header line', () => {
    const r = parseThermalCsv('pump', 'temperature_c,relative_emission\n25,1\n85,0.9', {
      peakDriftNmPerK: 0.04,
      peakDriftNmPerMa: null,
      referenceCurrentMa: null
    });
    expect(!r.ok && r.errors.map((e) => e.message)).toEqual([
      'Line 1: unknown column relative_emission (expected temperature_c, relative_output)',
      'Line 1: the header lacks relative_output'
    ]);
    const short = parseThermalCsv('phosphor', 'temperature_c,relative_emission\n25,1\n85');
    expect(!short.ok && short.errors[0]).toEqual({ line: 3, message: 'Line 3: expected 2 fields, found 1' });
  });
});
