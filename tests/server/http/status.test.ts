/**
 * The kind → status map of domain errors against the status codes' published meanings
 * (RFC 9110, HTTP Semantics, 2022, §15.5 client errors and §15.6 server errors), and the one
 * error body `{ error, issues? }`.
 */
import { describe, expect, it } from 'vitest';
import {
  DomainError,
  ERROR_KINDS,
  conflict,
  forbidden,
  invalid,
  lineIssue,
  notFound,
  tooLarge,
  unavailable,
  unprocessable,
  unsupportedType
} from '../../../src/lib/errors/domain-error';
import { errorBody, refusalOf, statusOf } from '../../../src/lib/server/http/status';

const cases = [
  { name: 'invalid input', error: invalid('bad'), expected: 400, source: 'RFC 9110 §15.5.1 400 Bad Request' },
  { name: 'role or person not allowed', error: forbidden('no'), expected: 403, source: 'RFC 9110 §15.5.4 403 Forbidden' },
  { name: 'no such record', error: notFound('gone'), expected: 404, source: 'RFC 9110 §15.5.5 404 Not Found' },
  { name: 'stale version or locked state', error: conflict('moved on'), expected: 409, source: 'RFC 9110 §15.5.10 409 Conflict' },
  { name: 'body or file too large', error: tooLarge('big'), expected: 413, source: 'RFC 9110 §15.5.14 413 Content Too Large' },
  {
    name: 'media type not accepted',
    error: unsupportedType('pdf only'),
    expected: 415,
    source: 'RFC 9110 §15.5.16 415 Unsupported Media Type'
  },
  {
    name: 'well-formed but unusable',
    error: unprocessable('cannot'),
    expected: 422,
    source: 'RFC 9110 §15.5.21 422 Unprocessable Content'
  },
  { name: 'a service is down', error: unavailable('later'), expected: 503, source: 'RFC 9110 §15.6.4 503 Service Unavailable' }
];

describe('domain error kinds → HTTP status (RFC 9110 §15)', () => {
  it.each(cases)('$name → $expected ($source)', ({ error, expected }) => {
    expect(statusOf(error)).toBe(expected);
    expect(error.status).toBe(expected);
  });

  it('covers every kind once', () => {
    expect(cases.map((c) => c.error.kind).sort()).toEqual([...ERROR_KINDS].sort());
  });
});

describe('the error body { error, issues? }', () => {
  it('leaves issues out when there are none', () => {
    expect(errorBody('Nothing was saved.')).toEqual({ error: 'Nothing was saved.' });
    expect(refusalOf(conflict('Reload it.'))).toEqual({ status: 409, body: { error: 'Reload it.' } });
  });

  it('carries field issues as { path, message } and file lines with their line number', () => {
    const err = unprocessable('bad.csv was not saved.', [lineIssue(3, 'Line 3: not a number'), lineIssue(null, 'too few points')]);
    expect(refusalOf(err).body).toEqual({
      error: 'bad.csv was not saved.',
      issues: [
        { path: 'line 3', line: 3, message: 'Line 3: not a number' },
        { path: '(file)', line: null, message: 'too few points' }
      ]
    });
    expect(refusalOf(invalid('Fix the form.', [{ path: 'name', message: 'required' }])).body.issues).toEqual([
      { path: 'name', message: 'required' }
    ]);
  });

  it('puts a subclass title before the message', () => {
    const err = new DomainError('unprocessable', 'values must be finite', { title: 'Spectrum rejected' });
    expect(refusalOf(err)).toEqual({ status: 422, body: { error: 'Spectrum rejected: values must be finite' } });
  });
});
