import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import * as users from '../../../src/lib/server/accounts/users';
import { hashPassword } from '../../../src/lib/server/auth/passwords';
import { createFormulationWithDraft } from '../../../src/lib/server/formulations/save';
import { sign, submit } from '../../../src/lib/server/formulations/workflow';
import { cast, uniqueCode, warmWhite } from './support';

// Requirement of the product: approving a revision re-checks the signer's password (model: 21 CFR 11.200(a)), and
// wrong passwords are throttled like sign-in: 5 per account per 15 minutes, then even the right one is refused.
const email = `approver.${Date.now()}@kestrelhollow.example`;
const PASSWORD = 'approver-own-password';

describe('approval e-signature: wrong passwords lock signing', () => {
  let approver: NonNullable<Awaited<ReturnType<typeof users.get>>>;
  beforeAll(async () => {
    const id = await users.create({ email, name: 'Test Approver', passwordHash: await hashPassword(PASSWORD), roles: ['quality'] });
    approver = (await users.get(id))!;
  });
  afterAll(async () => {
    await db()('sign_in_attempts').where({ email }).delete();
    await closeDb();
  });

  it('refuses the right password after 5 wrong ones, saying when to retry; nothing is signed', async () => {
    const { rhea } = await cast();
    const code = uniqueCode();
    const d = await createFormulationWithDraft(rhea, { code, name: `Test ${code}`, content: await warmWhite() });
    await submit(rhea, d.revisionId);
    for (let i = 0; i < 4; i++) {
      await expect(sign(approver, d.revisionId, 'approved', { password: `guess-${i}`, comment: '' })).rejects.toThrow(/not correct/);
    }
    await expect(sign(approver, d.revisionId, 'approved', { password: 'guess-5', comment: '' })).rejects.toThrow(/Try again after/);
    await expect(sign(approver, d.revisionId, 'approved', { password: PASSWORD, comment: '' })).rejects.toThrow(/Signing is locked/);
    const row = await db()('formulation_revisions').where({ id: d.revisionId }).first('state');
    expect(row?.state).toBe('submitted');
    const locked = await db()('audit_events').where({ actor_id: approver.id, action: 'signature_locked' }).first('entity_id');
    expect(locked?.entity_id).toBe(String(d.revisionId));
  });
});
