import { frame } from '../layout';
import type { Message } from '../index';

export interface CorrectionNotice {
  to: string[];
  batchNumber: string;
  formulation: string;
  draftRevisionNo: number;
  requestedBy: string;
  offsetText: string;
  link: string;
}

/** Tells the formulator that a correction draft was made from a measured batch. */
export function correctionDraftMessage(n: CorrectionNotice): Message {
  const body = frame(
    `Correction draft from batch ${n.batchNumber}`,
    [
      `${n.requestedBy} made draft revision ${n.draftRevisionNo} of ${n.formulation} from the measurements of batch ${n.batchNumber}.`,
      `Measured mean against target: ${n.offsetText}.`,
      'The corrected ratios are a proposal: review them, check the prediction and submit the draft when it is right.'
    ],
    { href: n.link, label: 'Review the draft' }
  );
  return { to: n.to, subject: `Correction draft for ${n.formulation} from batch ${n.batchNumber}`, ...body };
}
