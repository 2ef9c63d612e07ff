import { frame } from '../layout';
import type { Message } from '../index';
import type { RevisionNotice } from './revision-notice';

/** To the formulator: their revision was returned with a reason. */
export function revisionReturnedMessage(to: string[], n: RevisionNotice, signer: string, reason: string): Message {
  const body = frame(
    `${n.code} revision ${n.revisionNo} was returned`,
    [
      `${signer} returned revision ${n.revisionNo} of ${n.code} "${n.name}".`,
      `Reason: ${reason}`,
      'The returned revision stays on record unchanged. Start a new draft from it to make the changes.'
    ],
    { href: n.link, label: 'Open the revision' }
  );
  return { to, subject: `Returned: ${n.code} rev ${n.revisionNo}`, ...body };
}
