import { describe, expect, it } from 'vitest';
import { parseSpectrumFile } from '../../../src/lib/spectrum-file/parse';
import { file, INTENSITIES, rows, WAVELENGTHS } from './fixtures';

// Dialects of instrument exports accepted by the upload (common practice: CSV with point decimals,
// European exports with semicolon separator and decimal comma, tab- and space-separated TXT).
describe('spectrum files: accepted dialects', () => {
  const cases = [
    {
      name: 'comma-separated, decimal point, with header',
      text: file('Wavelength (nm),Intensity (a.u.)', ...rows(',')),
      delimiter: 'comma',
      decimal: 'point',
      headerLine: 1,
      column: 'Intensity (a.u.)'
    },
    {
      name: 'semicolon-separated, decimal comma, with header',
      text: file('nm;Counts', ...rows(';', true)),
      delimiter: 'semicolon',
      decimal: 'comma',
      headerLine: 1,
      column: 'Counts'
    },
    {
      name: 'tab-separated, decimal point, no header',
      text: file(...rows('\t')),
      delimiter: 'tab',
      decimal: 'point',
      headerLine: null,
      column: 'intensity'
    },
    {
      name: 'tab-separated, decimal comma',
      text: file(...rows('\t', true)),
      delimiter: 'tab',
      decimal: 'comma',
      headerLine: null,
      column: 'intensity'
    },
    {
      name: 'space-aligned columns, decimal point',
      text: file(...rows('    ')),
      delimiter: 'whitespace',
      decimal: 'point',
      headerLine: null,
      column: 'intensity'
    },
    {
      name: 'space-aligned columns, decimal comma',
      text: file(...rows('  ', true)),
      delimiter: 'whitespace',
      decimal: 'comma',
      headerLine: null,
      column: 'intensity'
    },
    {
      name: 'quoted CSV fields with decimal commas',
      text: file(...rows('","', true).map((l) => `"${l}"`)),
      delimiter: 'comma',
      decimal: 'comma',
      headerLine: null,
      column: 'intensity'
    }
  ] as const;

  it.each(cases)('$name', ({ text, delimiter, decimal, headerLine, column }) => {
    const r = parseSpectrumFile(text);
    if (!r.ok) throw new Error(JSON.stringify(r.errors));
    expect(r.wavelengths).toEqual(WAVELENGTHS);
    expect(r.columns).toHaveLength(1);
    expect(r.columns[0].name).toBe(column);
    expect(r.columns[0].values).toEqual(INTENSITIES);
    expect(r.dialect).toEqual({ delimiter, decimal, headerLine });
  });

  it('skips comment lines, blank lines, a byte-order mark and CRLF endings, and keeps line numbers', () => {
    const text =
      '\uFEFF# exported by a spectrometer\r\n// integration 100 ms\r\n\r\nwavelength,intensity\r\n' + rows(',').join('\r\n') + '\r\n';
    const r = parseSpectrumFile(text);
    if (!r.ok) throw new Error(JSON.stringify(r.errors));
    expect(r.wavelengths).toHaveLength(30);
    expect(r.dialect.headerLine).toBe(4); // line 4, counted by hand: two comments, one blank line, then the header
    expect(r.warnings.join(' ')).toContain('2 comment lines skipped');
  });

  it('reads exponent notation and a trailing separator', () => {
    const r = parseSpectrumFile(file(...WAVELENGTHS.map((w, i) => `${w},${(INTENSITIES[i] * 1000).toExponential(3)},`)));
    if (!r.ok) throw new Error(JSON.stringify(r.errors));
    expect(r.columns[0].values[15]).toBeCloseTo(1000, 6); // 550 nm is the band centre: exp(0) × 1000
  });

  it('sets small negative values (noise within 1 % of the maximum) to zero with a warning', () => {
    const data = WAVELENGTHS.map((w, i) => [w, i === 0 ? -0.005 : INTENSITIES[i]]);
    const r = parseSpectrumFile(file(...rows(',', false, data)));
    if (!r.ok) throw new Error(JSON.stringify(r.errors));
    expect(r.columns[0].values[0]).toBe(0);
    expect(r.warnings.join(' ')).toMatch(/1 small negative value/);
  });

  it('reads several intensity columns with multiColumn, named from the header', () => {
    const data = WAVELENGTHS.map((w, i) => [w, INTENSITIES[i], 2 * INTENSITIES[i], 0.5]);
    const r = parseSpectrumFile(file('nm;part A;part B;part C', ...rows(';', true, data)), { multiColumn: true });
    if (!r.ok) throw new Error(JSON.stringify(r.errors));
    expect(r.columns.map((c) => c.name)).toEqual(['part A', 'part B', 'part C']);
    expect(r.columns[1].values[15]).toBe(2);
    expect(r.columns[2].values.every((v) => v === 0.5)).toBe(true);
  });

  it('names multi-column data without a header "column 2", "column 3"…', () => {
    const data = WAVELENGTHS.map((w, i) => [w, INTENSITIES[i], INTENSITIES[i]]);
    const r = parseSpectrumFile(file(...rows('\t', false, data)), { multiColumn: true });
    if (!r.ok) throw new Error(JSON.stringify(r.errors));
    expect(r.columns.map((c) => c.name)).toEqual(['column 2', 'column 3']);
  });
});
