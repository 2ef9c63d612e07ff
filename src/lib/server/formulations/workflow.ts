/**
 * State changes of a revision: submit, withdraw, and quality's signed decisions (review, approve,
 * return). Each runs in one transaction with the revision row locked, checks the state machine,
 * the caller and the optimistic-lock version, leaves audit rows, then sends its notices.
 */
import type { Knex } from 'knex';
import { aimMiss, OFF_AIM_REASON_MIN } from '../../formulations/aim-miss';
import type { RevisionPrediction } from '../../formulations/prediction';
import { z } from 'zod';
import { db } from '../db/index';
import { writeTransaction } from '../db/transaction';
import { record } from '../db/audit';
import type { RevisionCommand } from '../../formulations/workflow-rules';
import { ConflictError, NotFoundError, ValidationError } from './errors';
import { checkVersion, enforce, type Caller } from './guard';
import { storedContentSha256 } from './hash';
import { getRevision } from './read';
import { notifyApproved, notifyReturned, notifySubmitted, notifySuperseded } from './notify';
import { verifySignaturePassword } from './signature';

export const signatureInputSchema = z.object({
  password: z.string().min(1, 'password: re-enter your password to sign').max(200),
  comment: z.string().trim().max(2000, 'comment: at most 2000 characters').default('')
});
export const returnInputSchema = z.object({
  password: z.string().min(1, 'password: re-enter your password to sign').max(200),
  reason: z.string().trim().min(3, 'reason: say why the revision is returned').max(2000, 'reason: at most 2000 characters')
});
export const withdrawInputSchema = z.object({
  reason: z.string().trim().min(3, 'reason: say why the revision is withdrawn').max(2000, 'reason: at most 2000 characters')
});

export type SignatureInput = z.infer<typeof signatureInputSchema>;

interface Locked {
  id: number;
  formulation_id: number;
  revision_no: number;
  state: 'draft' | 'submitted' | 'approved' | 'returned' | 'superseded' | 'withdrawn';
  created_by: number;
  version: number;
  content_json: string;
  content_sha256: string;
  predicted_json: string;
}

async function lockRevision(trx: Knex.Transaction, revisionId: number): Promise<Locked> {
  const head = await trx('formulation_revisions').where({ id: revisionId }).first('formulation_id');
  if (!head) throw new NotFoundError(`Revision ${revisionId} does not exist.`);
  // Lock the formulation first so approvals of one formulation run one at a time.
  await trx('formulations').where({ id: head.formulation_id }).forUpdate().first('id');
  const row = await trx('formulation_revisions').where({ id: revisionId }).forUpdate().first();
  if (!row) throw new NotFoundError(`Revision ${revisionId} does not exist.`);
  return row;
}

async function precheck(command: RevisionCommand, caller: Caller, revisionId: number): Promise<void> {
  const row = await db()('formulation_revisions').where({ id: revisionId }).first('state', 'created_by', 'version');
  if (!row) throw new NotFoundError(`Revision ${revisionId} does not exist.`);
  enforce(command, caller, { state: row.state, createdBy: row.created_by, version: row.version });
}

/** The stored hash must still match the stored content before anyone submits or signs it. */
function checkIntegrity(row: Locked): void {
  if (storedContentSha256(row.content_json) !== row.content_sha256) {
    throw new ConflictError(
      `Revision ${row.revision_no}: its content no longer matches its recorded ` +
        `SHA-256; it cannot be submitted or signed. Tell an administrator.`
    );
  }
}

function audit(trx: Knex.Transaction, caller: Caller, row: Locked, action: string, after: Record<string, unknown>) {
  return record(
    {
      actorId: caller.id,
      actorEmail: caller.email,
      entityType: 'formulation_revision',
      entityId: row.id,
      action,
      before: { state: row.state, version: row.version },
      after
    },
    trx
  );
}

async function reload(revisionId: number) {
  const r = await getRevision(revisionId);
  if (!r) throw new NotFoundError(`Revision ${revisionId} does not exist.`);
  return r;
}

/**
 * Draft → submitted. A revision whose prediction misses its aim (outside the tolerance, or a floor
 * missed) is submitted only with a stated reason, which the review mail and the record carry.
 */
export async function submit(caller: Caller, revisionId: number, version?: number, offAimReason?: string) {
  let miss: string[] = [];
  await writeTransaction(async (trx) => {
    const row = await lockRevision(trx, revisionId);
    enforce('submit', caller, { state: row.state, createdBy: row.created_by, version: row.version });
    checkVersion(version, row.version, row.state);
    checkIntegrity(row);
    miss = aimMiss(JSON.parse(row.predicted_json) as RevisionPrediction);
    const reason = offAimReason?.trim() ?? '';
    if (miss.length && reason.length < OFF_AIM_REASON_MIN)
      throw new ValidationError(`This revision misses its aim (${miss.join('; ')}): say why it should be reviewed anyway.`, [
        { path: 'offAimReason', message: `give a reason of at least ${OFF_AIM_REASON_MIN} characters` }
      ]);
    const now = new Date();
    await trx('formulation_revisions')
      .where({ id: row.id })
      .update({
        state: 'submitted',
        submitted_at: now,
        submitted_by: caller.id,
        version: row.version + 1,
        updated_at: now,
        off_aim_reason: miss.length ? reason : null
      });
    await audit(trx, caller, row, 'submit', {
      state: 'submitted',
      version: row.version + 1,
      contentSha256: row.content_sha256,
      ...(miss.length ? { offAim: miss, offAimReason: reason } : {})
    });
  });
  const rev = await reload(revisionId);
  await notifySubmitted(rev, caller, miss);
  return rev;
}

export async function withdraw(caller: Caller, revisionId: number, reason: string, version?: number) {
  await writeTransaction(async (trx) => {
    const row = await lockRevision(trx, revisionId);
    enforce('withdraw', caller, { state: row.state, createdBy: row.created_by, version: row.version });
    checkVersion(version, row.version, row.state);
    const now = new Date();
    await trx('formulation_revisions')
      .where({ id: row.id })
      .update({
        state: 'withdrawn',
        withdraw_reason: reason,
        decided_at: now,
        decided_by: caller.id,
        version: row.version + 1,
        updated_at: now
      });
    await audit(trx, caller, row, 'withdraw', { state: 'withdrawn', version: row.version + 1, reason });
  });
  return reload(revisionId);
}

async function insertSignature(
  trx: Knex.Transaction,
  caller: Caller,
  row: Locked,
  meaning: 'reviewed' | 'approved' | 'returned',
  comment: string,
  signedAt: Date
): Promise<number> {
  const [id] = await trx('revision_signatures').insert({
    revision_id: row.id,
    signer_id: caller.id,
    signer_name: caller.name,
    signer_email: caller.email,
    meaning,
    comment: comment || null,
    signed_at: signedAt,
    content_sha256: row.content_sha256
  });
  await record(
    {
      actorId: caller.id,
      actorEmail: caller.email,
      entityType: 'formulation_revision',
      entityId: row.id,
      action: 'e-signature',
      after: { signatureId: id, meaning, signedAt: signedAt.toISOString(), contentSha256: row.content_sha256, comment: comment || null }
    },
    trx
  );
  return id;
}

/** Signs a submitted revision: `reviewed` records the review only; `approved` also makes it current. */
export async function sign(caller: Caller, revisionId: number, meaning: 'reviewed' | 'approved', input: SignatureInput, version?: number) {
  const command = meaning === 'approved' ? 'approve' : 'review';
  await precheck(command, caller, revisionId);
  await verifySignaturePassword(caller, revisionId, meaning, input.password);
  const signedAt = new Date();
  let superseded: number | null = null;
  await writeTransaction(async (trx) => {
    const row = await lockRevision(trx, revisionId);
    enforce(command, caller, { state: row.state, createdBy: row.created_by, version: row.version });
    checkVersion(version, row.version, row.state);
    checkIntegrity(row);
    await insertSignature(trx, caller, row, meaning, input.comment, signedAt);
    if (meaning === 'reviewed') return;
    const current: Locked | undefined = await trx('formulation_revisions')
      .where({ formulation_id: row.formulation_id, state: 'approved' })
      .forUpdate()
      .first();
    if (current && current.revision_no > row.revision_no) {
      throw new ConflictError(`Revision ${current.revision_no} is already approved and newer; an older revision cannot replace it.`);
    }
    if (current) {
      await trx('formulation_revisions')
        .where({ id: current.id })
        .update({ state: 'superseded', superseded_at: signedAt, version: current.version + 1, updated_at: signedAt });
      await audit(trx, caller, current, 'supersede', { state: 'superseded', version: current.version + 1, supersededByRevisionId: row.id });
      superseded = current.revision_no;
    }
    await trx('formulation_revisions')
      .where({ id: row.id })
      .update({
        state: 'approved',
        decided_at: signedAt,
        decided_by: caller.id,
        supersedes_revision_id: current?.id ?? null,
        version: row.version + 1,
        updated_at: signedAt
      });
    await audit(trx, caller, row, 'approve', {
      state: 'approved',
      version: row.version + 1,
      supersedesRevisionId: current?.id ?? null,
      contentSha256: row.content_sha256
    });
  });
  const rev = await reload(revisionId);
  if (meaning === 'approved') {
    await notifyApproved(rev, caller.name, signedAt, input.comment || null);
    if (superseded !== null) await notifySuperseded(rev, superseded);
  }
  return rev;
}

export async function returnRevision(caller: Caller, revisionId: number, input: z.infer<typeof returnInputSchema>, version?: number) {
  await precheck('return', caller, revisionId);
  await verifySignaturePassword(caller, revisionId, 'returned', input.password);
  const signedAt = new Date();
  await writeTransaction(async (trx) => {
    const row = await lockRevision(trx, revisionId);
    enforce('return', caller, { state: row.state, createdBy: row.created_by, version: row.version });
    checkVersion(version, row.version, row.state);
    await insertSignature(trx, caller, row, 'returned', input.reason, signedAt);
    await trx('formulation_revisions')
      .where({ id: row.id })
      .update({
        state: 'returned',
        return_reason: input.reason,
        decided_at: signedAt,
        decided_by: caller.id,
        version: row.version + 1,
        updated_at: signedAt
      });
    await audit(trx, caller, row, 'return', { state: 'returned', version: row.version + 1, reason: input.reason });
  });
  const rev = await reload(revisionId);
  await notifyReturned(rev, caller.name, input.reason);
  return rev;
}
