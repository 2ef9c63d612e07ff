/**
 * Which errors the app answers with 503 "the database is not reachable": the driver's connection
 * failures yes, a client dropping its own request no (it also ends in ECONNRESET, without the
 * driver's fatal mark).
 */
import { describe, expect, it } from 'vitest';
import { isDbUnavailable } from '../../../src/lib/server/db/index';

const err = (message: string, props: Record<string, unknown>) => Object.assign(new Error(message), props);

describe('isDbUnavailable', () => {
  it('counts connection failures of the database driver and of the pool', () => {
    expect(isDbUnavailable(err('connect ECONNREFUSED 127.0.0.1:33306', { code: 'ECONNREFUSED', fatal: true }))).toBe(true);
    expect(
      isDbUnavailable(err('Connection lost: The server closed the connection.', { code: 'PROTOCOL_CONNECTION_LOST', fatal: true }))
    ).toBe(true);
    expect(isDbUnavailable(err('read ECONNRESET', { code: 'ECONNRESET', fatal: true }))).toBe(true);
    expect(isDbUnavailable(err('connect ETIMEDOUT', { code: 'ETIMEDOUT', fatal: true }))).toBe(true);
    expect(isDbUnavailable(err('Too many connections', { code: 'ER_CON_COUNT_ERROR' }))).toBe(true);
    expect(isDbUnavailable(err('Knex: Timeout acquiring a connection. The pool is probably full.', {}))).toBe(true);
  });

  it('counts a server shutting down or killing the connection under a running query (MariaDB errors 1053, 1927)', () => {
    expect(isDbUnavailable(err('Server shutdown in progress', { code: 'ER_SERVER_SHUTDOWN', errno: 1053 }))).toBe(true);
    expect(isDbUnavailable(err('Connection was killed', { code: 'ER_CONNECTION_KILLED', errno: 1927 }))).toBe(true);
    expect(isDbUnavailable(err("Can't add new command when connection is in closed state", {}))).toBe(true);
  });

  it('does not count a client that dropped its request, or ordinary errors', () => {
    expect(isDbUnavailable(err('aborted', { code: 'ECONNRESET' }))).toBe(false);
    expect(isDbUnavailable(err('write EPIPE', { code: 'EPIPE' }))).toBe(false);
    expect(isDbUnavailable(err("Duplicate entry 'KH-W30-90' for key 'code'", { code: 'ER_DUP_ENTRY', errno: 1062 }))).toBe(false);
    expect(isDbUnavailable(new TypeError('x is undefined'))).toBe(false);
    expect(isDbUnavailable(null)).toBe(false);
  });
});
