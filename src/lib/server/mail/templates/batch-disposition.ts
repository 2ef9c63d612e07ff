import { frame } from '../layout';
import type { Message } from '../index';

export interface DispositionNotice {
  to: string[];
  batchNumber: string;
  formulation: string;
  decision: 'released' | 'rejected';
  signerName: string;
  signedAtUtc: Date;
  meaning: string;
  comment: string;
  yieldText: string;
  link: string;
}

/** Tells the formulator and the technicians that quality released or rejected a batch. */
export function batchDispositionMessage(n: DispositionNotice): Message {
  const verb = n.decision === 'released' ? 'released' : 'rejected';
  const body = frame(
    `Batch ${n.batchNumber} ${verb}`,
    [
      `${n.signerName} ${verb} batch ${n.batchNumber} (${n.formulation}) on ` +
        `${n.signedAtUtc.toISOString().slice(0, 16).replace('T', ' ')} UTC.`,
      `Meaning of the signature: ${n.meaning}.`,
      `Comment: ${n.comment}`,
      `Measured parts: ${n.yieldText}.`
    ],
    { href: n.link, label: 'Open the measurements' }
  );
  return { to: n.to, subject: `Batch ${n.batchNumber} ${verb} by quality`, ...body };
}
