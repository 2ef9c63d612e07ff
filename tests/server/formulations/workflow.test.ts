import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import { createFormulationWithDraft, createRevision, createCorrectionDraft, updateDraft } from '../../../src/lib/server/formulations/save';
import { returnRevision, sign, submit, withdraw } from '../../../src/lib/server/formulations/workflow';
import { currentApprovedRevision, getRevision, listSignatures } from '../../../src/lib/server/formulations/read';
import { ConflictError, PermissionError, SignatureError, ValidationError } from '../../../src/lib/server/formulations/errors';
import { contentSha256 } from '../../../src/lib/server/formulations/hash';
import { DEMO_PASSWORD, auditOf, cast, caughtMail, recipients, uniqueCode, warmWhite, type Cast } from './support';

let c: Cast;
const sig = { password: DEMO_PASSWORD, comment: 'checked against trial builds' };

async function draft(author: Cast['rhea'], code = uniqueCode()) {
  return createFormulationWithDraft(author, { code, name: `Test ${code}`, content: await warmWhite() });
}

async function submitted(author: Cast['rhea']) {
  const d = await draft(author);
  await submit(author, d.revisionId);
  return d;
}

async function rowOf(id: number) {
  return (await db()('formulation_revisions').where({ id }).first())!;
}

describe('formulation revisions: life cycle through the services', () => {
  beforeAll(async () => {
    c = await cast();
  });
  afterAll(closeDb);

  it('creates a formulation with a first draft whose prediction the core computed and whose hash is the content SHA-256', async () => {
    const d = await draft(c.rhea);
    const rev = (await getRevision(d.revisionId))!;
    expect(rev).toMatchObject({ revisionNo: 1, state: 'draft', version: 1, createdBy: c.rhea.id, formulationCode: d.code });
    // The target is 3000 K on the Planckian locus; the solver's fractions land within 1 SDCM of it (fixture in support.ts).
    expect(Math.abs(rev.predicted.cct - 3000)).toBeLessThan(30);
    expect(rev.predicted.sdcm).toBeLessThan(1);
    expect(rev.predicted.ra).toBeGreaterThan(90);
    expect(rev.coreVersion).toMatch(/phosforge-core/);
    expect(rev.contentSha256).toBe(contentSha256(rev.content));
    // Codes and names are refreshed from the library, whatever the caller sent.
    expect(rev.content.phosphors[0].name).toMatch(/^GL-530 /);
    const trail = await auditOf('formulation_revision', d.revisionId);
    expect(trail.map((a) => a.action)).toEqual(['create']);
    expect((await auditOf('formulation', d.formulationId)).map((a) => a.action)).toEqual(['create']);
  });

  it('walks draft → submitted → approved with an e-signature, supersedes the previous approval and mails everyone concerned', async () => {
    const d = await submitted(c.rhea);
    const submitMail = await caughtMail(`Review requested: ${d.code} rev 1`);
    expect(recipients(submitMail)).toContain(c.ines.email);
    expect(recipients(submitMail)).not.toContain(c.rhea.email);
    expect(submitMail[0].text).toContain(d.code);
    expect(submitMail[0].html).toContain('<a href=');

    const approved = await sign(c.ines, d.revisionId, 'approved', sig);
    expect(approved).toMatchObject({ state: 'approved', decidedBy: c.ines.id, supersedesRevisionId: null });
    const [signature] = await listSignatures(d.revisionId);
    expect(signature).toMatchObject({
      signerId: c.ines.id,
      signerName: c.ines.name,
      meaning: 'approved',
      comment: sig.comment,
      contentSha256: approved.contentSha256
    });
    expect(Math.abs(signature.signedAt.getTime() - Date.now())).toBeLessThan(60_000);
    expect(recipients(await caughtMail(`Approved: ${d.code} rev 1`))).toEqual([c.rhea.email]);

    const second = await createRevision(c.rhea, d.formulationId, await warmWhite({ notes: 'more red' }), d.revisionId);
    expect(second.revisionNo).toBe(2);
    await submit(c.rhea, second.revisionId);
    await sign(c.ines, second.revisionId, 'approved', sig);
    expect((await getRevision(d.revisionId))!.state).toBe('superseded');
    expect((await currentApprovedRevision(d.formulationId))!.id).toBe(second.revisionId);
    const superseded = await caughtMail(`Superseded: ${d.code} rev 1 → rev 2`);
    expect(recipients(superseded)).toEqual(expect.arrayContaining([c.tomas.email]));
    expect(recipients(superseded)).not.toContain(c.rhea.email);

    const actions = (await auditOf('formulation_revision', d.revisionId)).map((a) => a.action);
    expect(actions).toEqual(['create', 'submit', 'e-signature', 'approve', 'supersede']);
  });

  it('returns a revision with a signed reason, mails the author, and keeps it unchanged on record', async () => {
    const d = await submitted(c.jonah);
    const returned = await returnRevision(c.ines, d.revisionId, { password: DEMO_PASSWORD, reason: 'R9 floor not shown on the ticket' });
    expect(returned).toMatchObject({ state: 'returned', returnReason: 'R9 floor not shown on the ticket' });
    expect((await listSignatures(d.revisionId)).map((s) => s.meaning)).toEqual(['returned']);
    const mail = await caughtMail(`Returned: ${d.code} rev 1`);
    expect(recipients(mail)).toEqual([c.jonah.email]);
    expect(mail[0].text).toContain('R9 floor not shown on the ticket');
    await expect(updateDraft(c.jonah, d.revisionId, returned.version, await warmWhite())).rejects.toBeInstanceOf(ConflictError);
  });

  it('records a "reviewed" signature without changing the state', async () => {
    const d = await submitted(c.rhea);
    const rev = await sign(c.ines, d.revisionId, 'reviewed', sig);
    expect(rev.state).toBe('submitted');
    expect((await listSignatures(d.revisionId)).map((s) => s.meaning)).toEqual(['reviewed']);
  });

  it('refuses self-approval, even by an administrator who wrote the draft', async () => {
    const d = await submitted(c.admin);
    await expect(sign(c.admin, d.revisionId, 'approved', { password: DEMO_PASSWORD, comment: '' })).rejects.toBeInstanceOf(PermissionError);
    await expect(returnRevision(c.admin, d.revisionId, { password: DEMO_PASSWORD, reason: 'own work' })).rejects.toBeInstanceOf(
      PermissionError
    );
    expect((await rowOf(d.revisionId)).state).toBe('submitted');
    expect(await listSignatures(d.revisionId)).toEqual([]);
  });

  it('refuses a wrong password: nothing is signed, the state stays, the refusal is audited', async () => {
    const d = await submitted(c.rhea);
    const before = await rowOf(d.revisionId);
    await expect(sign(c.ines, d.revisionId, 'approved', { password: 'not-my-password', comment: '' })).rejects.toBeInstanceOf(
      SignatureError
    );
    expect(await rowOf(d.revisionId)).toEqual(before);
    expect(await listSignatures(d.revisionId)).toEqual([]);
    expect((await auditOf('formulation_revision', d.revisionId)).at(-1)).toMatchObject({
      action: 'e-signature-refused',
      actor_id: c.ines.id
    });
  });

  it('refuses a stale draft edit with the current version and saves nothing', async () => {
    const d = await draft(c.rhea);
    const saved = await updateDraft(c.rhea, d.revisionId, 1, await warmWhite({ notes: 'first edit' }));
    expect(saved.version).toBe(2);
    const before = await rowOf(d.revisionId);
    const stale = updateDraft(c.rhea, d.revisionId, 1, await warmWhite({ notes: 'edit from an old screen' }));
    await expect(stale).rejects.toBeInstanceOf(ConflictError);
    await expect(stale).rejects.toMatchObject({ current: { version: 2, state: 'draft' } });
    expect(await rowOf(d.revisionId)).toEqual(before);
    expect(JSON.parse(before.content_json).notes).toBe('first edit');
  });

  it('lets only the author edit or submit a draft', async () => {
    const d = await draft(c.rhea);
    await expect(updateDraft(c.jonah, d.revisionId, 1, await warmWhite())).rejects.toBeInstanceOf(PermissionError);
    await expect(submit(c.jonah, d.revisionId)).rejects.toBeInstanceOf(PermissionError);
    await expect(submit(c.ines, d.revisionId)).rejects.toBeInstanceOf(PermissionError);
    expect((await rowOf(d.revisionId)).state).toBe('draft');
  });

  it('rejects content whose fractions do not add up to 1, or that names a phosphor as the pump, saving nothing', async () => {
    const count = async () => Number((await db()('formulations').count({ n: '*' }))[0].n);
    const before = await count();
    const bad = await warmWhite({ pumpLeakFraction: 0.2 });
    await expect(createFormulationWithDraft(c.rhea, { name: 'bad', content: bad })).rejects.toThrow(
      /add up to 1 \(they add up to 1\.1300\)/
    );
    const good = await warmWhite();
    const wrongPump = { ...good, pump: { ...good.pump, materialId: good.phosphors[0].materialId } };
    await expect(createFormulationWithDraft(c.rhea, { name: 'bad', content: wrongPump })).rejects.toBeInstanceOf(ValidationError);
    expect(await count()).toBe(before);
  });

  it('withdraws: a draft by its author, an approved revision only by quality', async () => {
    const d = await draft(c.rhea);
    await expect(withdraw(c.jonah, d.revisionId, 'not mine')).rejects.toBeInstanceOf(PermissionError);
    expect((await withdraw(c.rhea, d.revisionId, 'duplicate of another draft')).state).toBe('withdrawn');
    const a = await submitted(c.rhea);
    await sign(c.ines, a.revisionId, 'approved', sig);
    await expect(withdraw(c.rhea, a.revisionId, 'retire')).rejects.toBeInstanceOf(PermissionError);
    expect((await withdraw(c.ines, a.revisionId, 'product discontinued')).withdrawReason).toBe('product discontinued');
  });

  it('creates a correction draft from a batch, based on the revision the batch used', async () => {
    const d = await submitted(c.rhea);
    await sign(c.ines, d.revisionId, 'approved', sig);
    const corr = await createCorrectionDraft(
      c.ines,
      d.revisionId,
      await warmWhite({ notes: 'trim after batch' }),
      4242,
      async () => undefined
    );
    const rev = (await getRevision(corr.revisionId))!;
    expect(rev).toMatchObject({
      revisionNo: 2,
      state: 'draft',
      basedOnRevisionId: d.revisionId,
      sourceBatchId: 4242,
      createdBy: c.ines.id
    });
    await expect(createCorrectionDraft(c.tomas, d.revisionId, await warmWhite(), 4242, async () => undefined)).rejects.toBeInstanceOf(
      PermissionError
    );
  });

  it('refuses approving an older revision once a newer one is approved', async () => {
    const d = await submitted(c.rhea);
    const second = await createRevision(c.rhea, d.formulationId, await warmWhite());
    await submit(c.rhea, second.revisionId);
    await sign(c.ines, second.revisionId, 'approved', sig);
    await expect(sign(c.ines, d.revisionId, 'approved', sig)).rejects.toThrow(/already approved and newer/);
    expect((await rowOf(d.revisionId)).state).toBe('submitted');
  });
});
