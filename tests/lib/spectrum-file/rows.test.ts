/**
 * Spectra one part per row: read the same as the column layout (the same spectra transposed give the
 * same wavelengths, names and values), with line-named refusals. Spectra invented (Gaussian bands).
 */
import { describe, expect, it } from 'vitest';
import { parseSpectrumUpload } from '../../../src/lib/spectrum-file/read-upload';
import { looksLikeRowSpectra, parseRowSpectra } from '../../../src/lib/spectrum-file/rows';

const wl = Array.from({ length: 81 }, (_, i) => 380 + 5 * i);
const band = (peak: number, k: number) => wl.map((w) => Number((Math.exp(-0.5 * ((w - peak) / 20) ** 2) + 0.01 * k).toFixed(5)));
const parts = [
  { name: 'KH-1', values: band(450, 1) },
  { name: 'KH-2', values: band(560, 2) },
  { name: 'KH-3', values: band(610, 3) }
];
const rowText = ['Part,' + wl.join(','), ...parts.map((p) => `${p.name},${p.values.join(',')}`)].join('\n');
const columnText = [
  'nm,' + parts.map((p) => p.name).join(','),
  ...wl.map((w, i) => `${w},${parts.map((p) => p.values[i]).join(',')}`)
].join('\n');
const options = { multiColumn: true, maxBytes: 1_000_000 };

describe('one part per row', () => {
  it('reads the same spectra as the column layout', () => {
    expect(looksLikeRowSpectra(rowText)).toBe(true);
    expect(looksLikeRowSpectra(columnText)).toBe(false);
    // Column layout whose parts are numbered like wavelengths (1001, 1002, …): still the column layout.
    const numbered = ['nm,' + wl.map((_, k) => 1001 + k).join(','), ...wl.map((w) => `${w},${wl.map(() => 1).join(',')}`)].join('\n');
    expect(looksLikeRowSpectra(numbered)).toBe(false);
    const rows = parseSpectrumUpload(rowText, options);
    const cols = parseSpectrumUpload(columnText, options);
    if (!rows.ok || !cols.ok) throw new Error('both layouts should read');
    expect(rows.wavelengths).toEqual(cols.wavelengths);
    expect(rows.columns).toEqual(cols.columns);
    expect(rows.warnings[0]).toMatch(/^Read as one part per row \(3 parts, 81 wavelengths\)/);
  });

  it('reads semicolons with decimal commas', () => {
    const text = rowText.replace(/,/g, ';').replace(/(\d)\.(\d)/g, '$1,$2');
    const r = parseRowSpectra(text, options);
    expect(r.ok && r.columns[1].values).toEqual(parts[1].values);
  });

  it('names the line of a short row, a bad value and a repeated part', () => {
    const short = parseRowSpectra(rowText + '\nKH-4,1,2,3', options);
    expect(!short.ok && short.errors[0].message).toBe('Line 5: part "KH-4" has 3 values for 81 wavelengths.');
    const bad = parseRowSpectra(rowText.replace('KH-2,' + parts[1].values[0], 'KH-2,abc'), options);
    expect(!bad.ok && bad.errors[0].message).toBe('Line 3, 380 nm: "abc" is not a number.');
    const twice = parseRowSpectra(rowText + `\nKH-1,${parts[0].values.join(',')}`, options);
    expect(!twice.ok && twice.errors[0].message).toBe('Line 5: part "KH-1" is already on line 2.');
  });
});
