/**
 * The home page's work queues: per role, the kinds of waiting work with their count and their
 * oldest items (pure types and the rules of who sees which queue; the server fills them).
 */
import type { Role } from '../roles';

export type QueueKind =
  | 'revisionsToReview'
  | 'batchesToDecide'
  | 'deviationsToAccept'
  | 'batchesToWeigh'
  | 'slurriesNearLimit'
  | 'drafts'
  | 'returnedRevisions'
  | 'correctionDrafts';

export interface QueueItem {
  label: string;
  href: string;
  /** When the work started waiting (UTC). */
  since: Date;
  /** A short fact about the item ("12 min left", "line 3 above range"). */
  note?: string;
}

export interface WorkQueue {
  kind: QueueKind;
  title: string;
  /** Where the whole queue is listed. */
  href: string;
  count: number;
  /** Oldest first, at most QUEUE_PREVIEW items. */
  oldest: QueueItem[];
  /** What an empty queue means for the user. */
  empty: string;
}

export const QUEUE_PREVIEW = 3;

/** Slurries with less than this left are shown to technicians (common practice: plan the last dispense). */
export const SLURRY_WARNING_MIN = 30;

export const QUEUES_OF_ROLE: Readonly<Record<Role, readonly QueueKind[]>> = {
  quality: ['revisionsToReview', 'batchesToDecide', 'deviationsToAccept'],
  technician: ['batchesToWeigh', 'slurriesNearLimit'],
  formulator: ['drafts', 'returnedRevisions', 'correctionDrafts'],
  admin: []
};

/** The queues a user sees, in role order, each once. */
export function queuesFor(roles: readonly Role[]): QueueKind[] {
  const kinds: QueueKind[] = [];
  for (const role of ['formulator', 'technician', 'quality'] as const)
    if (roles.includes(role)) for (const k of QUEUES_OF_ROLE[role]) if (!kinds.includes(k)) kinds.push(k);
  return kinds;
}
