/**
 * Tester tables read with a profile: columns found by header name, units and decimal mark applied,
 * u′v′ turned into x,y by CIE 15:2004 eq. 8.10–8.12 (checked on D65: x 0.31272, y 0.32903 ↔
 * u′ 0.19783, v′ 0.46832, CIE 15:2004 Table T.3), and every refusal naming its line and column.
 * Part values are invented.
 */
import { describe, expect, it } from 'vitest';
import { testerProfileSchema, type TesterProfileInput } from '../../../src/lib/tester-table/profile';
import { parseTesterTable } from '../../../src/lib/tester-table/parse';
import { testerPartMetrics } from '../../../src/lib/tester-table/part-metrics';
import { uvPrimeToXy, xyToUvPrime } from '../../../src/lib/spectral/colorimetry/chromaticity';

const profile = (over: Partial<TesterProfileInput> = {}, columns: Record<string, string> = {}) =>
  testerProfileSchema.parse({
    name: 'Line 2 tester',
    headerLines: 0,
    delimiter: 'auto',
    decimalMark: '.',
    chromaticity: 'xy',
    columns: { label: 'Serial', x: 'CIE x', y: 'CIE y', cct: 'CCT', ra: 'Ra', flux: 'Flux', forwardVoltage: 'Vf', bin: 'Bin', ...columns },
    fluxUnit: 'lm',
    voltageUnit: 'V',
    ...over
  });

const ok = (r: ReturnType<typeof parseTesterTable>) => {
  if (!r.ok) throw new Error(r.errors.map((e) => e.message).join('; '));
  return r;
};

describe('tester table', () => {
  it('reads a comma table by header name, in any column order, case and spaces ignored', () => {
    const text =
      'serial, Vf ,CIE x,CIE y,CCT,Ra,Flux,Bin\nP-001,2.91,0.4338,0.4030,3003,91.2,118.5,A3\nP-002,2.93,0.4341,0.4027,2994,,119.0,A3\n';
    const r = ok(parseTesterTable(text, profile()));
    expect(r.rows).toHaveLength(2);
    expect(r.rows[0]).toMatchObject({
      label: 'P-001',
      line: 2,
      chromaticity: [0.4338, 0.403],
      cct: 3003,
      ra: 91.2,
      fluxLm: 118.5,
      forwardVoltageV: 2.91,
      bin: 'A3'
    });
    expect(r.rows[1].ra).toBeNull();
  });

  it('skips lines before the header, reads a decimal comma with semicolons, and converts mlm and mV', () => {
    const text = 'Tester T-7 export\nLot KH-2612\nSerial;CIE x;CIE y;Flux;Vf\nQ1;0,4338;0,4030;118500;2910\n';
    const p = profile(
      { headerLines: 2, delimiter: ';', decimalMark: ',', fluxUnit: 'mlm', voltageUnit: 'mV' },
      { cct: '', ra: '', bin: '' }
    );
    const r = ok(parseTesterTable(text, p));
    expect(r.rows[0]).toMatchObject({ label: 'Q1', line: 4, chromaticity: [0.4338, 0.403], fluxLm: 118.5, forwardVoltageV: 2.91 });
  });

  it('turns u′v′ into x,y by CIE 15 (D65 round trip to 4 decimals)', () => {
    const [x, y] = uvPrimeToXy(0.19783, 0.46832);
    expect(x).toBeCloseTo(0.31272, 4); // CIE 15:2004 Table T.3
    expect(y).toBeCloseTo(0.32903, 4);
    const [u, v] = xyToUvPrime(0.31272, 0.32903);
    expect(u).toBeCloseTo(0.19783, 4);
    expect(v).toBeCloseTo(0.46832, 4);
    const p = profile(
      { chromaticity: 'uvPrime' },
      { x: '', y: '', uPrime: "u'", vPrime: "v'", cct: '', ra: '', flux: '', forwardVoltage: '', bin: '' }
    );
    const r = ok(parseTesterTable("Serial,u',v'\nD65,0.19783,0.46832\n", p));
    const m = testerPartMetrics(r.rows[0], 'uvPrime');
    expect(m.x).toBeCloseTo(0.31272, 4);
    // CCT from the chromaticity when the table has none: D65 is 6504 K (CIE 15:2004 Table T.3, common practice).
    expect(m.cct).toBeGreaterThan(6450);
    expect(m.cct).toBeLessThan(6560);
    expect(m).toMatchObject({ source: 'table', ler: null, rf: null, ra: null, fwhmNm: null });
  });

  it('refuses a wrong mapping, naming the header line and the missing column', () => {
    const r = parseTesterTable('Serial,x,y\nP1,0.43,0.40\n', profile());
    expect(r.ok).toBe(false);
    if (!r.ok)
      expect(r.errors[0].message).toBe(
        'line 1: column "CIE x" (CIE x), "CIE y" (CIE y), "CCT" (CCT (K)), "Ra" (Ra), "Flux" (Luminous flux), "Vf" (Forward voltage), ' +
          `"Bin" (Tester's bin label) not found; the header has "Serial", "x", "y"`
      );
  });

  it('refuses a bad cell naming its line and column, and values outside what a tester reports', () => {
    const p = profile({}, { cct: '', ra: '', flux: '', forwardVoltage: '', bin: '' });
    const bad = parseTesterTable('Serial,CIE x,CIE y\nP1,0.43,0.40\nP2,0.43,abc\nP3,3003,0.40\n', p);
    expect(bad.ok).toBe(false);
    if (!bad.ok) {
      expect(bad.errors[0]).toEqual({ line: 3, message: 'line 3, column "CIE y": "abc" is not a number' });
      expect(bad.errors[1].message).toBe('line 4, column "CIE x": 3003 is outside 0–1 for CIE x (is the column mapping right?)');
    }
  });

  it('refuses a part label given twice and a table with no parts', () => {
    const p = profile({}, { cct: '', ra: '', flux: '', forwardVoltage: '', bin: '' });
    const twice = parseTesterTable('Serial,CIE x,CIE y\nP1,0.43,0.40\nP1,0.43,0.40\n', p);
    expect(!twice.ok && twice.errors[0].message).toBe('line 3: part "P1" is already on line 2');
    const empty = parseTesterTable('Serial,CIE x,CIE y\n', p);
    expect(!empty.ok && empty.errors[0].message).toBe('no parts below the header on line 1');
  });

  it('refuses a profile with a decimal comma and a comma delimiter, or without its chromaticity columns', () => {
    const base = { name: 'T', headerLines: 0, delimiter: ',', decimalMark: ',', chromaticity: 'xy', columns: { x: 'x', y: 'y' } };
    expect(testerProfileSchema.safeParse(base).error?.issues[0].message).toBe('a decimal comma needs another delimiter (semicolon or tab)');
    const noY = testerProfileSchema.safeParse({ ...base, delimiter: ';', columns: { x: 'x' } });
    expect(noY.error?.issues[0].message).toBe('CIE y: name its column (the chromaticity is required)');
  });
});
