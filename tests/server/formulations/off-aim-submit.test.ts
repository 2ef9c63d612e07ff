/** Submitting a revision whose prediction misses its aim needs a stated reason, carried by the mail and the record. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, db } from '../../../src/lib/server/db/index';
import { createFormulationWithDraft } from '../../../src/lib/server/formulations/save';
import { submit } from '../../../src/lib/server/formulations/workflow';
import { ValidationError } from '../../../src/lib/server/formulations/errors';
import { auditOf, cast, caughtMail, uniqueCode, warmWhite, type Cast } from './support';

let c: Cast;

describe('submitting outside the aim', () => {
  beforeAll(async () => {
    c = await cast();
  });
  afterAll(closeDb);

  it('is refused without a reason, naming the miss, and leaves the draft as it was', async () => {
    // The 3000 K recipe aimed at 5000 K: far outside a 3-step tolerance.
    const code = uniqueCode('OA');
    const made = await createFormulationWithDraft(c.rhea, {
      code,
      name: `Off aim ${code}`,
      content: await warmWhite({ target: { kind: 'cctDuv', cct: 5000, duv: 0 } })
    });
    const refused = submit(c.rhea, made.revisionId, undefined, 'ok');
    await expect(refused).rejects.toBeInstanceOf(ValidationError);
    await expect(submit(c.rhea, made.revisionId)).rejects.toThrow(/misses its aim \(.*steps .* from the target 5000 K.*\): say why/);
    expect((await db()('formulation_revisions').where({ id: made.revisionId }).first('state'))!.state).toBe('draft');

    const reason = 'Trial of the 3000 K recipe under a 5000 K aim, for the cool-white comparison';
    const rev = await submit(c.rhea, made.revisionId, undefined, reason);
    expect(rev.state).toBe('submitted');
    expect(rev.offAimReason).toBe(reason);
    const submitted = (await auditOf('formulation_revision', made.revisionId)).find((e) => e.action === 'submit')!;
    expect(JSON.parse(submitted.after_json!)).toMatchObject({
      offAimReason: reason,
      offAim: [expect.stringMatching(/outside the tolerance/)]
    });
    const [mail] = await caughtMail(`Review requested: ${code} rev 1 (outside its aim)`);
    expect(mail.text).toContain(`Reason given: ${reason}`);
  });

  it('needs no reason for a revision that meets its aim', async () => {
    const code = uniqueCode('OK');
    const made = await createFormulationWithDraft(c.rhea, { code, name: `On aim ${code}`, content: await warmWhite({ floors: {} }) });
    const rev = await submit(c.rhea, made.revisionId);
    expect(rev.offAimReason).toBeNull();
  });
});
