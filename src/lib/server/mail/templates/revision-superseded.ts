import { frame } from '../layout';
import type { Message } from '../index';
import type { RevisionNotice } from './revision-notice';

/** To line technicians: the revision in production was replaced by a newly approved one. */
export function revisionSupersededMessage(to: string[], n: RevisionNotice, oldRevisionNo: number): Message {
  const body = frame(
    `${n.code}: build from revision ${n.revisionNo} from now on`,
    [
      `Revision ${n.revisionNo} of ${n.code} "${n.name}" was approved and supersedes revision ${oldRevisionNo}.`,
      `New batches must be weighed out from revision ${n.revisionNo}. Batches already ` +
        `planned from revision ${oldRevisionNo} should be checked with quality before ` +
        `weighing.`,
      `Predicted: ${n.summary}.`
    ],
    { href: n.link, label: 'Open the current revision' }
  );
  return { to, subject: `Superseded: ${n.code} rev ${oldRevisionNo} → rev ${n.revisionNo}`, ...body };
}
