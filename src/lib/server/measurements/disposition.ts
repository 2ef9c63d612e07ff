/**
 * Release or rejection of a batch with an electronic signature (same rules as revision approval):
 * quality role; the signer re-enters their password; meaning and comment are required; nobody
 * signs off their own work (who planned, mixed, weighed or completed the batch, or authored its
 * revision); the SHA-256 of the signed canonical JSON is stored with it. In one transaction the
 * batch moves to released/rejected, the disposition row and the new batch record (PDF with the
 * measurement summary) are stored; then the formulator and the technicians are told by e-mail.
 * Model: 21 CFR 11.50/11.70/11.200.
 */
import { db } from '../db/index';
import { writeTransaction } from '../db/transaction';
import { record } from '../db/audit';
import { checkSigningPassword } from '../auth/signing-password';
import { putFile } from '../storage/objects';
import { getBatch } from '../batches/read';
import { toBatchDoc } from '../batches/documents';
import { buildBatchRecord } from '../pdf/batch-record';
import { expectState, expectVersion, lockBatch } from '../batches/lock';
import { recordMeasurementSummary } from '../../measurements/index';
import type { DispositionInput } from '../../measurements/schema';
import { conflict, forbidden, notFound } from './errors';
import { canActOnMeasurements, requireQuality, type Caller } from './caller';
import { computeResults, loadContext, type BatchQualityContext } from './results';
import { signedJsonAndHash } from './signed-content';
import { notifyDisposition } from './notify';

/** People whose work the batch is: planner, mixer, completer, weighers, and the revision's author. */
export async function batchAuthors(ctx: BatchQualityContext): Promise<Set<number>> {
  const row = await db()('batches').where({ id: ctx.detail.batch.id }).first('created_by', 'mixed_by', 'completed_by');
  const ids = [row?.created_by, row?.mixed_by, row?.completed_by, ctx.revision.createdBy, ...ctx.detail.lines.map((l) => l.weighedBy)];
  return new Set(ids.filter((v): v is number => typeof v === 'number'));
}

/** Why this caller may not sign the batch now, or null. Used by the page to show or hide the form. */
export async function dispositionRefusal(caller: Caller, ctx: BatchQualityContext): Promise<string | null> {
  const b = ctx.detail.batch;
  if (!canActOnMeasurements(caller)) return 'Release and rejection are signed by quality.';
  if (b.state === 'released' || b.state === 'rejected') return `Batch ${b.batchNumber} is ${b.state}.`;
  if (b.state !== 'complete') return `Batch ${b.batchNumber} is ${b.state}: it can be released or rejected once the weigh-out is complete.`;
  if ((await batchAuthors(ctx)).has(caller.id))
    return `You worked on batch ${b.batchNumber} (or wrote its revision): someone else in quality must sign it off.`;
  return null;
}

async function verifySigner(caller: Caller, batchId: number, decision: string, password: string): Promise<void> {
  if (await checkSigningPassword(caller, password, { entityType: 'batch', entityId: batchId })) return;
  await record({
    actorId: caller.id,
    actorEmail: caller.email,
    entityType: 'batch',
    entityId: batchId,
    action: 'e-signature-refused',
    after: { decision, reason: 'password did not match' }
  });
  throw forbidden('The password is not correct, so nothing was signed. Re-enter your own password to sign.', [
    { path: 'password', message: 'password: not correct' }
  ]);
}

export interface DispositionOutcome {
  decision: 'released' | 'rejected';
  signedAt: Date;
  contentSha256: string;
  recordFileId: number;
}

export async function disposeBatch(caller: Caller, batchId: number, input: DispositionInput, origin: string): Promise<DispositionOutcome> {
  requireQuality(caller, 'Releasing or rejecting a batch');
  const ctx = await loadContext(batchId);
  if (!ctx) throw notFound(`Batch ${batchId}`);
  const refusal = await dispositionRefusal(caller, ctx);
  if (refusal) throw ctx.detail.batch.state === 'complete' ? forbidden(refusal) : conflict(refusal);
  const decision = input.decision === 'release' ? 'released' : 'rejected';
  await verifySigner(caller, batchId, decision, input.password);

  const outcome = await writeTransaction(async (trx) => {
    const row = await lockBatch(trx, batchId);
    expectVersion(row, input.version, `Batch ${row.batch_number}`);
    expectState(row, ['complete'], decision === 'released' ? 'be released' : 'be rejected');
    const { judged, view } = await computeResults(ctx);
    if (decision === 'released' && judged.summary.parts === 0)
      throw conflict(`Batch ${row.batch_number} has no measured parts: upload measurements before releasing it.`);
    const files = await trx('measurement_uploads as m')
      .join('stored_files as f', 'f.id', 'm.stored_file_id')
      .where('m.batch_id', batchId)
      .whereNull('m.withdrawn_at')
      .orderBy('m.id')
      .select('m.id as upload_id', 'm.original_name', 'f.sha256');
    const signedAt = new Date();
    const b = ctx.detail.batch;
    const signed = signedJsonAndHash({
      batch: {
        id: b.id,
        batchNumber: b.batchNumber,
        revisionId: b.revisionId,
        formulationCode: b.formulationCode,
        revisionNo: b.revisionNo
      },
      decision,
      meaning: input.meaning,
      comment: input.comment,
      signer: { id: caller.id, name: caller.name, email: caller.email },
      signedAt,
      files: files.map((f) => ({ uploadId: f.upload_id, name: f.original_name, sha256: f.sha256 })),
      judged
    });
    const [dispositionId] = await trx('batch_dispositions').insert({
      batch_id: batchId,
      decision,
      signer_id: caller.id,
      signer_name: caller.name,
      signer_email: caller.email,
      meaning: input.meaning,
      comment: input.comment,
      signed_at: signedAt,
      content_sha256: signed.sha256,
      signed_json: signed.json
    });
    const detail = (await getBatch(batchId, trx))!;
    const doc = toBatchDoc(detail);
    doc.state = decision;
    const summary = recordMeasurementSummary(
      judged.summary,
      judged.acceptance,
      judged.target.label,
      view.prediction,
      {
        decision,
        signerName: caller.name,
        meaning: input.meaning,
        comment: input.comment,
        signedAtText: `${signedAt.toISOString().slice(0, 19).replace('T', ' ')} UTC`,
        contentSha256: signed.sha256
      },
      view.predictionSource?.label ?? null,
      view.conditionChecks,
      view.lotStatistics
    );
    const pdf = await buildBatchRecord(doc, { measurementSummary: summary });
    const recordFileId = await putFile(
      {
        body: pdf,
        originalName: `${row.batch_number}-batch-record-${decision}.pdf`,
        contentType: 'application/pdf',
        purpose: 'batch-record',
        entityType: 'batch',
        entityId: batchId,
        uploadedBy: caller.id
      },
      trx
    );
    await trx('batch_dispositions').where({ id: dispositionId }).update({ record_file_id: recordFileId });
    await trx('batches')
      .where({ id: batchId, version: row.version })
      .update({ state: decision, record_file_id: recordFileId, version: row.version + 1, updated_at: signedAt });
    await record(
      {
        actorId: caller.id,
        actorEmail: caller.email,
        entityType: 'batch',
        entityId: batchId,
        action: decision === 'released' ? 'release' : 'reject',
        before: { state: row.state, version: row.version, recordFileId: row.record_file_id },
        after: {
          state: decision,
          version: row.version + 1,
          dispositionId,
          meaning: input.meaning,
          comment: input.comment,
          contentSha256: signed.sha256,
          recordFileId,
          parts: judged.summary.parts,
          passed: judged.summary.passed
        }
      },
      trx
    );
    await record(
      {
        actorId: caller.id,
        actorEmail: caller.email,
        entityType: 'batch',
        entityId: batchId,
        action: 'e-signature',
        after: { dispositionId, meaning: input.meaning, signedAt: signedAt.toISOString(), contentSha256: signed.sha256 }
      },
      trx
    );
    return {
      decision,
      signedAt,
      contentSha256: signed.sha256,
      recordFileId,
      yieldText: `${judged.summary.passed} of ${judged.summary.parts} pass`
    } as const;
  });
  await notifyDisposition(ctx, caller, { ...outcome, meaning: input.meaning, comment: input.comment }, origin);
  return {
    decision: outcome.decision,
    signedAt: outcome.signedAt,
    contentSha256: outcome.contentSha256,
    recordFileId: outcome.recordFileId
  };
}
