import { frame } from '../layout';
import type { Message } from '../index';
import type { RevisionNotice } from './revision-notice';

/** To the formulator: their revision was approved and is now current. */
export function revisionApprovedMessage(
  to: string[],
  n: RevisionNotice,
  signer: string,
  signedAtUtc: string,
  comment: string | null
): Message {
  const body = frame(
    `${n.code} revision ${n.revisionNo} is approved`,
    [
      `${signer} approved revision ${n.revisionNo} of ${n.code} "${n.name}" with an e-signature at ${signedAtUtc} UTC.`,
      ...(comment ? [`Comment: ${comment}`] : []),
      'It is now the current revision the line builds from.'
    ],
    { href: n.link, label: 'Open the revision' }
  );
  return { to, subject: `Approved: ${n.code} rev ${n.revisionNo}`, ...body };
}
