/**
 * Notices of revision events by e-mail (sent after the transaction commits; a failed send is
 * logged and never undoes the event): quality on submission, the author on approval or return,
 * line technicians when an approved revision in production is superseded.
 */
import { config } from '../config';
import { send } from '../mail/index';
import * as users from '../accounts/users';
import { revisionSubmittedMessage } from '../mail/templates/revision-submitted';
import { revisionApprovedMessage } from '../mail/templates/revision-approved';
import { revisionReturnedMessage } from '../mail/templates/revision-returned';
import { revisionSupersededMessage } from '../mail/templates/revision-superseded';
import type { RevisionNotice } from '../mail/templates/revision-notice';
import type { RevisionRecord } from './records';

function summary(r: RevisionRecord): string {
  const p = r.predicted;
  const fmt = (v: number | null, d = 0) => (v === null ? 'n/a' : v.toFixed(d));
  return `${Math.round(p.cct)} K, Duv ${p.duv.toFixed(4)}, Ra ${fmt(p.ra)}, R9 ${fmt(p.r9)}, ${p.sdcm.toFixed(1)} SDCM from target`;
}

export function revisionPath(r: { formulationId: number; id: number }): string {
  return `/formulations/${r.formulationId}/revisions/${r.id}`;
}

function notice(r: RevisionRecord): RevisionNotice {
  const origin = config().origin ?? 'http://127.0.0.1:5180';
  return {
    code: r.formulationCode,
    name: r.formulationName,
    revisionNo: r.revisionNo,
    summary: summary(r),
    link: origin + revisionPath(r)
  };
}

async function emailsOf(role: 'quality' | 'technician', except: number[] = []): Promise<string[]> {
  return (await users.byRole(role)).filter((u) => !except.includes(u.id)).map((u) => u.email);
}

export async function notifySubmitted(r: RevisionRecord, submitter: { id: number; name: string }, miss: string[] = []): Promise<boolean> {
  const offAim = miss.length ? { miss, reason: r.offAimReason ?? '' } : null;
  return send(revisionSubmittedMessage(await emailsOf('quality', [submitter.id]), notice(r), submitter.name, offAim));
}

async function authorEmail(r: RevisionRecord): Promise<string[]> {
  const author = await users.get(r.createdBy);
  return author?.active ? [author.email] : [];
}

export async function notifyApproved(r: RevisionRecord, signer: string, signedAt: Date, comment: string | null): Promise<boolean> {
  return send(
    revisionApprovedMessage(await authorEmail(r), notice(r), signer, signedAt.toISOString().slice(0, 19).replace('T', ' '), comment)
  );
}

export async function notifyReturned(r: RevisionRecord, signer: string, reason: string): Promise<boolean> {
  return send(revisionReturnedMessage(await authorEmail(r), notice(r), signer, reason));
}

export async function notifySuperseded(current: RevisionRecord, oldRevisionNo: number): Promise<boolean> {
  return send(revisionSupersededMessage(await emailsOf('technician'), notice(current), oldRevisionNo));
}
