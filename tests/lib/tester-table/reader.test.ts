/**
 * A tester table read piece by piece gives what the whole text gives: cut at every position, across a CRLF
 * line end (RFC 4180 §2.1) and inside a quoted field holding a line break (RFC 4180 §2.6), with header lines
 * before the header; a refusal still names its line. Part values are invented.
 */
import { describe, expect, it } from 'vitest';
import { testerProfileSchema } from '../../../src/lib/tester-table/profile';
import { parseTesterTable, TesterTableReader } from '../../../src/lib/tester-table/parse';

const profile = testerProfileSchema.parse({
  name: 'Line 4 tester',
  headerLines: 2,
  delimiter: 'auto',
  decimalMark: '.',
  chromaticity: 'xy',
  columns: { label: 'Serial', x: 'x', y: 'y', ra: 'Ra', bin: 'Bin' }
});
const text = [
  'Tester export',
  'Lot K-17',
  'Serial;x;y;Ra;Bin',
  'K1;0.4338;0.4030;91;"3A"',
  'K2;0.4340;0.4031;92.5;"bin\r\nnote"',
  'K3;0.4336;0.4029;90;3B',
  ''
].join('\r\n');

function inPieces(t: string, cuts: number[]) {
  const reader = new TesterTableReader(profile);
  let from = 0;
  for (const at of [...cuts, t.length]) {
    reader.write(t.slice(from, at));
    from = at;
  }
  return reader.end();
}

describe('a tester table read piece by piece', () => {
  it('gives the same rows as the whole text, wherever the text is cut', () => {
    const whole = parseTesterTable(text, profile);
    expect(whole.ok).toBe(true);
    if (!whole.ok) return;
    // Lines counted from the top of the file, header lines included (common practice for line numbers).
    expect(whole.rows.map((r) => [r.label, r.line])).toEqual([
      ['K1', 4],
      ['K2', 5],
      ['K3', 6]
    ]);
    expect(whole.rows[1].bin).toBe('bin\nnote');
    for (let at = 0; at <= text.length; at++) expect(inPieces(text, [at]), `cut at ${at}`).toEqual(whole);
    expect(
      inPieces(
        text,
        Array.from({ length: text.length }, (_, i) => i)
      )
    ).toEqual(whole);
  });

  it('names the line of a bad cell and of a repeated part when read in pieces', () => {
    const bad = text.replace('0.4029', 'x9').replace('K3;', 'K1;');
    const r = inPieces(bad, [30, 61, 90]);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors.map((e) => e.line)).toEqual([6, 6]);
    expect(r.errors[1].message).toContain('part "K1" is already on line 4');
  });

  it('refuses an empty text and a missing column on the header line', () => {
    expect(inPieces('', [])).toEqual({ ok: false, errors: [{ line: 3, message: 'line 3: no header row' }] });
    const r = inPieces(text.replace('Ra;', 'CRI;'), [50]);
    expect(r.ok ? null : r.errors[0].line).toBe(3);
  });
});
