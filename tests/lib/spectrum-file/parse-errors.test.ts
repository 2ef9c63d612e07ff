import { describe, expect, it } from 'vitest';
import { parseSpectrumFile } from '../../../src/lib/spectrum-file/parse';
import { file, rows, WAVELENGTHS } from './fixtures';

const header = 'wavelength,intensity';
/** The good file with data row `i` (0-based) replaced; with the header on line 1, row i is on line i + 2. */
function withRow(i: number, replacement: string): string {
  const body = rows(',');
  body[i] = replacement;
  return file(header, ...body);
}

function errorsOf(text: string, options = {}) {
  const r = parseSpectrumFile(text, options);
  if (r.ok) throw new Error('expected the file to be refused');
  return r.errors;
}

describe('spectrum files: refused files name the line', () => {
  it('a non-numeric intensity', () => {
    const errors = errorsOf(withRow(5, '450,n/a'));
    expect(errors).toEqual([{ line: 7, message: 'Line 7: column 2 (intensity): "n/a" is not a number.' }]);
  });

  it('a non-numeric wavelength after the data started', () => {
    const errors = errorsOf(withRow(10, 'abc,0.5'));
    expect(errors[0].line).toBe(12);
    expect(errors[0].message).toMatch(/column 1 \(wavelength\): "abc" is not a number/);
  });

  it('a missing intensity and an extra column', () => {
    expect(errorsOf(withRow(3, '430'))[0]).toMatchObject({ line: 5, message: expect.stringMatching(/has 1 value; 2 are expected/) });
    expect(errorsOf(withRow(3, '430,0.1,0.2'))[0]).toMatchObject({
      line: 5,
      message: expect.stringMatching(/has 3 values; 2 are expected/)
    });
  });

  it('decreasing wavelengths', () => {
    // row 8 is 480 nm; writing 465 there puts it below row 7 (470 nm, line 9)
    const errors = errorsOf(withRow(8, '465,0.2'));
    expect(errors).toEqual([
      { line: 10, message: 'Line 10: wavelength 465 nm is lower than 470 nm on line 9; wavelengths must increase.' }
    ]);
  });

  it('a duplicate wavelength', () => {
    const errors = errorsOf(withRow(8, '470,0.2'));
    expect(errors).toEqual([{ line: 10, message: 'Line 10: wavelength 470 nm repeats line 9 (duplicate point).' }]);
  });

  it('negative intensity beyond noise (more than 1 % of the maximum, the spectral core rule)', () => {
    const errors = errorsOf(withRow(0, '400,-0.05'));
    expect(errors[0].line).toBe(2);
    expect(errors[0].message).toMatch(/negative beyond noise/);
  });

  it('too few points', () => {
    const errors = errorsOf(file(header, ...rows(',').slice(0, 12)));
    expect(errors).toEqual([{ line: null, message: 'The file holds 12 data points; at least 20 are needed.' }]);
  });

  it('a wavelength outside 300–900 nm', () => {
    const body = rows(',');
    body.push('950,0.001');
    const errors = errorsOf(file(header, ...body));
    expect(errors).toEqual([{ line: 32, message: 'Line 32: wavelength 950 nm is outside 300–900 nm.' }]);
  });

  it('a file above the size limit (2 MB by default)', () => {
    const big = 'x'.repeat(2 * 1024 * 1024 + 1);
    expect(errorsOf(big)).toEqual([{ line: null, message: 'The file is 2.0 MB; the limit is 2.0 MB.' }]);
    expect(errorsOf(file(header, ...rows(',')), { maxBytes: 100 })[0].message).toMatch(/limit is 1 kB/);
  });

  it('a binary file and a file with only text', () => {
    expect(errorsOf('%PDF-1.7\u0000\u0001binary')[0].message).toMatch(/not a text file/);
    expect(errorsOf('name,value\nfoo,bar\n')[0]).toMatchObject({ line: 1, message: expect.stringMatching(/no numeric data/) });
    expect(errorsOf('# only a comment\n\n')[0].message).toMatch(/no data rows/);
  });

  it('more than three header lines', () => {
    const errors = errorsOf(file('title', 'operator', 'date', 'wavelength,intensity', ...rows(',')));
    expect(errors[0].line).toBe(4);
  });

  it('a spectrum with no positive intensity', () => {
    const errors = errorsOf(file(...WAVELENGTHS.map((w) => `${w},0`)));
    expect(errors[0].message).toMatch(/no positive intensity/);
  });

  // Found by the parser fuzz: a quote opened on one line and closed on a later one joined the lines
  // into one row, so the file could pass with a point missing, and every later error named the line above its own.
  it('a quote left open on a line, closed on a later line', () => {
    const errors = errorsOf(withRow(4, '440,"0.2').replace('\n450,', '\n450",').replace('\n500,', '\nbad,'));
    expect(errors).toEqual([
      { line: 6, message: 'Line 6: a quoted field opens here and is not closed on the same line (a field may not span lines).' }
    ]);
    const unclosed = errorsOf(withRow(4, '440,"0.2'));
    expect(unclosed.map((e) => e.line)).toEqual([6]);
  });

  it('a huge field is quoted shortened in the message', () => {
    const errors = errorsOf(file('a', 'b', 'c', 'x'.repeat(100_000), ...rows(',')));
    expect(errors[0].line).toBe(4);
    expect(errors[0].message.length).toBeLessThan(200);
  });

  it('lists every bad line, capped with a summary', () => {
    const body = WAVELENGTHS.map((w) => `${w},bad`);
    const errors = errorsOf(file(...body));
    expect(errors).toHaveLength(26);
    expect(errors[24].line).toBe(25);
    expect(errors[25]).toEqual({ line: null, message: '…and 5 more problems.' });
  });
});
