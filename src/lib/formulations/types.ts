/** Formulations, revisions, signatures and attachments as pages show them (read on the server). */
import type { RevisionContent } from '../recipe';
import type { RevisionState } from './workflow-rules';
import type { RevisionPrediction } from './prediction';

export interface FormulationRecord {
  id: number;
  code: string;
  name: string;
  description: string | null;
  version: number;
  createdBy: number | null;
  createdByName: string | null;
  createdAt: Date;
  updatedAt: Date;
}

export interface RevisionRecord {
  id: number;
  formulationId: number;
  formulationCode: string;
  formulationName: string;
  revisionNo: number;
  state: RevisionState;
  content: RevisionContent;
  predicted: RevisionPrediction;
  coreVersion: string;
  contentSha256: string;
  version: number;
  createdBy: number;
  createdByName: string;
  createdAt: Date;
  updatedAt: Date;
  submittedAt: Date | null;
  submittedBy: number | null;
  decidedAt: Date | null;
  decidedBy: number | null;
  decidedByName: string | null;
  supersededAt: Date | null;
  supersedesRevisionId: number | null;
  basedOnRevisionId: number | null;
  sourceBatchId: number | null;
  returnReason: string | null;
  withdrawReason: string | null;
  /** Why it was submitted although its prediction misses its aim; null when it meets it. */
  offAimReason: string | null;
}

export interface SignatureRecord {
  id: number;
  revisionId: number;
  signerId: number;
  signerName: string;
  signerEmail: string;
  meaning: string;
  comment: string | null;
  signedAt: Date;
  contentSha256: string;
}

export interface AttachmentRecord {
  id: number;
  storedFileId: number;
  label: string;
  originalName: string;
  contentType: string;
  bytes: number;
  createdAt: Date;
}
