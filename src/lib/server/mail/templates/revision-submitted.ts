import { frame } from '../layout';
import type { Message } from '../index';
import type { RevisionNotice } from './revision-notice';

/** To quality: a revision waits for review and sign-off. */
export function revisionSubmittedMessage(
  to: string[],
  n: RevisionNotice,
  submittedBy: string,
  offAim: { miss: string[]; reason: string } | null = null
): Message {
  const body = frame(
    `${n.code} revision ${n.revisionNo} is ready for review`,
    [
      `${submittedBy} submitted revision ${n.revisionNo} of ${n.code} "${n.name}" for review.`,
      `Predicted: ${n.summary}.`,
      ...(offAim ? [`Submitted outside its aim: ${offAim.miss.join('; ')}.`, `Reason given: ${offAim.reason}`] : []),
      'Review the content and the prediction, then approve it with your e-signature or ' +
        'return it with a reason. Nobody signs off their own revision.'
    ],
    { href: n.link, label: 'Open the revision' }
  );
  const subject = `Review requested: ${n.code} rev ${n.revisionNo}${offAim ? ' (outside its aim)' : ''}`;
  return { to, subject, ...body };
}
