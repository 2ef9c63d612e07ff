/**
 * An invitation is one transaction with its audit event, whatever the length of the address (the
 * audit column that held it took 40 characters), and the mail leaves only after the commit: a
 * failure at the audit event leaves no invitation and sends nothing.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import { invite } from '../../../src/lib/server/accounts/service';
import { cast, type Cast } from '../formulations/support';
import { waitForMail } from '../../support/mail';
import { INJECTED, dropLeftoverFaults, failureOf, snapshot, withFailingWrite } from '../../support/faults';

let c: Cast;
const longAddress = (tag: string) => {
  const local = `${tag}-${'x'.repeat(63 - tag.length)}`; // 64 characters, the longest local part (RFC 5321 §4.5.3.1.1)
  return `${local}@${'a'.repeat(40)}.kestrelhollow.example`;
};

describe('invitations', () => {
  beforeAll(async () => {
    await dropLeftoverFaults();
    c = await cast();
  });
  afterAll(async () => {
    await dropLeftoverFaults();
    await closeDb();
  });

  it('take an address far longer than 40 characters, audited under the invitation id', async () => {
    const email = longAddress(`l${Date.now().toString(36)}`);
    expect(email.length).toBeGreaterThan(120);
    const { mailed } = await invite(c.admin, email, ['technician'], 'http://127.0.0.1:5180');
    expect(mailed).toBe(true);
    const row = (await db()('invites').where({ email }).first('id'))!;
    const event = (await db()('audit_events')
      .where({ entity_type: 'invite', entity_id: String(row.id), action: 'invite' })
      .first())!;
    expect(JSON.parse(event.after_json!)).toEqual({ email, roles: ['technician'] });
  });

  it('leave nothing behind and send nothing when the audit event fails', async () => {
    const email = `fail-${Date.now().toString(36)}@kh.example`;
    const before = await snapshot(['invites', 'audit_events']);
    const fault = { label: 'invite audit', table: 'audit_events', event: 'INSERT' as const, when: "NEW.action = 'invite'" };
    const err = await withFailingWrite(fault, () => failureOf(invite(c.admin, email, ['quality'], 'http://127.0.0.1:5180')));
    expect(err.message).toContain(INJECTED);
    expect(await snapshot(['invites', 'audit_events'])).toEqual(before);
    expect(await waitForMail((m) => m.to.some((t) => t.address === email), 1, 1000)).toEqual([]);
  });
});
