/**
 * Per-part results as CSV: RFC 4180 quoting, formula cells escaped (a label starting with "=" is written
 * with a leading apostrophe, the usual guard against spreadsheet formula injection: OWASP "CSV Injection"),
 * "not measured" for what a tester table lacks. Parts invented.
 */
import { describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { partsCsv } from '../../../src/lib/measurements/parts-csv';
import type { PartView } from '../../../src/lib/measurements/view';

const base = (label: string, source?: 'table'): PartView =>
  ({
    id: 1,
    uploadId: 1,
    label,
    conditionLabel: 'bench (25 °C)',
    stepsFromPrediction: null,
    metrics: {
      x: 0.4338,
      y: 0.403,
      uPrime: 0.2471,
      vPrime: 0.5165,
      cct: 3001.4,
      duv: 0.00012,
      ra: source ? null : 91.23,
      r9: source ? 52 : 51.9,
      ri: [],
      criValid: true,
      rf: source ? null : 90.1,
      rg: source ? null : 101.2,
      ler: source ? null : 320.44,
      peakNm: null,
      fwhmNm: null,
      centroidNm: null,
      ...(source ? { source, fluxLm: 118.2, forwardVoltageV: 2.91, testerBin: 'A3' } : {})
    },
    verdict: {
      pass: true,
      failures: [],
      ansiBin: 3000,
      inTargetBin: true,
      offset: { dx: 0, dy: 0, deltaUvPrime: 0, deltaUv: 0, steps: 0.42 }
    }
  }) as unknown as PartView;

describe('partsCsv', () => {
  it('writes one row per part with its metrics, and "not measured" where a tester table lacks a metric', () => {
    const rows = Papa.parse<string[]>(partsCsv([base('P-1'), base('T-1', 'table')])).data;
    expect(rows[0].slice(0, 4)).toEqual(['part', 'condition', 'source', 'x']);
    const col = (name: string) => rows[0].indexOf(name);
    expect(rows[1][col('ra')]).toBe('91.23');
    expect(rows[1][col('source')]).toBe('spectrum');
    expect(rows[2][col('ra')]).toBe('not measured');
    expect(rows[2][col('ler_lm_per_w')]).toBe('not measured');
    expect(rows[2][col('flux_lm')]).toBe('118.2');
    expect(rows[2][col('tester_bin')]).toBe('A3');
    expect(rows[1][col('verdict')]).toBe('pass');
  });

  it('escapes a cell that a spreadsheet would run as a formula', () => {
    const text = partsCsv([base('=HYPERLINK("x")')]);
    expect(text).toContain(`"'=HYPERLINK(""x"")"`);
  });
});
