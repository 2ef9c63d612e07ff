/**
 * Route ids: a positive integer in plain digits, or the route's 404 — never NaN or -1 passed on
 * to a service (the old parsers let "-1", "1e3" and " 7 " through as numbers, or returned -1).
 */
import { isHttpError } from '@sveltejs/kit';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { idParam, parseId } from '../../../src/lib/server/http/id-param';

// Expected values: the definition of a positive integer id (common practice for database keys).
const cases: { raw: string | null | undefined; expected: number | null }[] = [
  { raw: '1', expected: 1 },
  { raw: '42', expected: 42 },
  { raw: '999999', expected: 999999 },
  { raw: '9007199254740991', expected: 9007199254740991 },
  { raw: '9007199254740992', expected: null },
  { raw: '-1', expected: null },
  { raw: '0', expected: null },
  { raw: '007', expected: null },
  { raw: '1.5', expected: null },
  { raw: '1e3', expected: null },
  { raw: ' 7 ', expected: null },
  { raw: '0x10', expected: null },
  { raw: 'NaN', expected: null },
  { raw: 'abc', expected: null },
  { raw: '', expected: null },
  { raw: null, expected: null },
  { raw: undefined, expected: null }
];

describe('parseId', () => {
  it.each(cases)('$raw → $expected', ({ raw, expected }) => {
    expect(parseId(raw)).toBe(expected);
  });

  it('reads back every positive safe integer it is given', () => {
    fc.assert(fc.property(fc.integer({ min: 1, max: Number.MAX_SAFE_INTEGER }), (n) => parseId(String(n)) === n));
  });

  it('never returns NaN, zero or a negative number for any text', () => {
    fc.assert(
      fc.property(fc.string(), (s) => {
        const id = parseId(s);
        return id === null || (Number.isSafeInteger(id) && id > 0);
      })
    );
  });
});

describe('idParam', () => {
  it('returns the id of a good parameter', () => {
    expect(idParam('12', 'Batch 12 was not found.')).toBe(12);
  });

  it.each(['-1', 'NaN', '0', 'x', undefined])('answers 404 with the route message for %s', (raw) => {
    let thrown: unknown;
    try {
      idParam(raw, `Batch ${raw} was not found.`);
    } catch (err) {
      thrown = err;
    }
    expect(isHttpError(thrown, 404)).toBe(true);
    expect((thrown as { body: { message: string } }).body.message).toBe(`Batch ${raw} was not found.`);
  });
});
