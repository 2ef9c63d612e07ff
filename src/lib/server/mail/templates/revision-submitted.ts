import { frame } from '../layout';
import type { Message } from '../index';
import type { RevisionNotice } from './revision-notice';

/** To quality: a revision waits for review and sign-off. */
export function revisionSubmittedMessage(to: string[], n: RevisionNotice, submittedBy: string): Message {
  const body = frame(
    `${n.code} revision ${n.revisionNo} is ready for review`,
    [
      `${submittedBy} submitted revision ${n.revisionNo} of ${n.code} "${n.name}" for review.`,
      `Predicted: ${n.summary}.`,
      'Review the content and the prediction, then approve it with your e-signature or ' +
        'return it with a reason. Nobody signs off their own revision.'
    ],
    { href: n.link, label: 'Open the revision' }
  );
  return { to, subject: `Review requested: ${n.code} rev ${n.revisionNo}`, ...body };
}
