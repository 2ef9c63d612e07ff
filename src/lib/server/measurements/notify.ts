/** E-mail after a disposition: the revision's formulator and the technicians who made the batch. */
import { db } from '../db/index';
import * as users from '../accounts/users';
import { send } from '../mail/index';
import { batchDispositionMessage } from '../mail/templates/batch-disposition';
import type { Caller } from './caller';
import type { BatchQualityContext } from './results';

export async function dispositionRecipients(ctx: BatchQualityContext): Promise<string[]> {
  const row = await db()('batches').where({ id: ctx.detail.batch.id }).first('created_by', 'mixed_by', 'completed_by');
  const technicianIds = new Set(
    [row?.created_by, row?.mixed_by, row?.completed_by, ...ctx.detail.lines.map((l) => l.weighedBy)].filter(
      (v): v is number => typeof v === 'number'
    )
  );
  const people = await Promise.all([ctx.revision.createdBy, ...technicianIds].map((id) => users.get(id)));
  const emails = people
    .filter((u) => u?.active && (u.id === ctx.revision.createdBy || u.roles.includes('technician')))
    .map((u) => u!.email);
  return [...new Set(emails)];
}

export async function notifyDisposition(
  ctx: BatchQualityContext,
  signer: Caller,
  d: { decision: 'released' | 'rejected'; signedAt: Date; meaning: string; comment: string; yieldText: string },
  origin: string
): Promise<boolean> {
  const b = ctx.detail.batch;
  return send(
    batchDispositionMessage({
      to: await dispositionRecipients(ctx),
      batchNumber: b.batchNumber,
      formulation: `${b.formulationCode} ${b.formulationName} revision ${b.revisionNo}`,
      decision: d.decision,
      signerName: signer.name,
      signedAtUtc: d.signedAt,
      meaning: d.meaning,
      comment: d.comment,
      yieldText: d.yieldText,
      link: `${origin}/measurements/${b.id}`
    })
  );
}
