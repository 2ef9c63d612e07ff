/**
 * actionFailure, the one way a form action fails: `fail(status, data)` with the input kept and
 * secrets stripped; a domain error keeps its kind's status (RFC 9110 §15.5), message and issues.
 */
import { describe, expect, it } from 'vitest';
import { conflict, invalid } from '../../../src/lib/errors/domain-error';
import { actionFailure, tryAction, withoutSecrets } from '../../../src/lib/server/http/action-failure';

describe('actionFailure', () => {
  it('fails with the given status and the input, passwords removed at any depth of one object', () => {
    const f = actionFailure(400, { action: 'sign', values: { comment: 'ok', password: 'hunter2' }, password: 'x', error: 'Say why.' });
    expect(f.status).toBe(400);
    expect(f.data).toEqual({ action: 'sign', values: { comment: 'ok' }, error: 'Say why.' });
  });

  it('turns a domain error into its status, message, issues and conflict flag', () => {
    const stale = actionFailure(conflict('Someone changed this revision.'), { action: 'save', values: { name: 'W30' } });
    expect(stale.status).toBe(409);
    expect(stale.data).toEqual({
      action: 'save',
      values: { name: 'W30' },
      error: 'Someone changed this revision.',
      issues: [],
      conflict: true
    });
    const bad = actionFailure(invalid('Fix the marked fields.', [{ path: 'pump', message: 'choose a pump' }]), { values: {} });
    expect(bad.status).toBe(400);
    expect(bad.data).toMatchObject({ issues: [{ path: 'pump', message: 'choose a pump' }], conflict: false });
  });

  it('hands the refusal to a function for forms that show it under their own keys', () => {
    const f = actionFailure(conflict('Batch is released.'), (r) => ({ uploadError: r.error, password: 'never' }));
    expect(f.status).toBe(409);
    expect(f.data).toEqual({ uploadError: 'Batch is released.' });
  });

  it('throws on anything that is not a domain error (a 500, logged)', () => {
    const bug = new TypeError('x is undefined');
    expect(() => actionFailure(bug, {})).toThrow(bug);
  });
});

describe('tryAction', () => {
  it('returns the service result, or its refusal as a failure', async () => {
    expect(await tryAction({ action: 'addLot' }, async () => 7)).toBe(7);
    const f = await tryAction({ action: 'addLot' }, async () => {
      throw conflict('Lot LLM-7731 is already recorded.');
    });
    expect(f).toMatchObject({ status: 409, data: { action: 'addLot', error: 'Lot LLM-7731 is already recorded.' } });
  });
});

describe('withoutSecrets', () => {
  it('keeps everything that is not a secret', () => {
    expect(withoutSecrets({ name: 'a', newPassword: 'b', clientSecret: 'c', nested: { passwordConfirm: 'd', days: '3' } })).toEqual({
      name: 'a',
      nested: { days: '3' }
    });
  });
});
