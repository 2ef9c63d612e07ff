/**
 * The revision state machine: which command moves a revision from which state to which, and who
 * may give it. One table, read by the server services (enforcement), the pages (which buttons to
 * show) and the tests. Practice (common practice): draft → in review → approved /
 * returned; an approval supersedes the previous approved revision; nobody signs off their own work.
 */
import { QUALITY, REVISION_ACTORS, type Role } from '../roles';

/** Revision states (plain words of the trade). */
export const REVISION_STATES = ['draft', 'submitted', 'approved', 'returned', 'superseded', 'withdrawn'] as const;
export type RevisionState = (typeof REVISION_STATES)[number];

export type RevisionCommand = 'edit' | 'submit' | 'review' | 'approve' | 'return' | 'withdraw';

/** Who may give a command: roles, and whether the revision's author must (or must not) be the caller. */
interface CommandRule {
  from: readonly RevisionState[];
  to: RevisionState | null;
  roles: readonly Role[];
  author: 'must' | 'mustNot' | 'any';
  label: string;
}

export const COMMAND_RULES: Record<RevisionCommand, CommandRule> = {
  edit: { from: ['draft'], to: null, roles: REVISION_ACTORS, author: 'must', label: 'Edit draft' },
  submit: { from: ['draft'], to: 'submitted', roles: REVISION_ACTORS, author: 'must', label: 'Submit for review' },
  review: { from: ['submitted'], to: null, roles: QUALITY, author: 'mustNot', label: 'Sign as reviewed' },
  approve: { from: ['submitted'], to: 'approved', roles: QUALITY, author: 'mustNot', label: 'Sign and approve' },
  return: { from: ['submitted'], to: 'returned', roles: QUALITY, author: 'mustNot', label: 'Sign and return' },
  withdraw: { from: ['draft', 'submitted', 'approved'], to: 'withdrawn', roles: REVISION_ACTORS, author: 'any', label: 'Withdraw' }
};

/** The only state changes a revision can make (mirrored by the database trigger). */
export const STATE_TRANSITIONS: readonly (readonly [RevisionState, RevisionState])[] = [
  ['draft', 'submitted'],
  ['draft', 'withdrawn'],
  ['submitted', 'approved'],
  ['submitted', 'returned'],
  ['submitted', 'withdrawn'],
  ['approved', 'superseded'],
  ['approved', 'withdrawn']
];

export interface Actor {
  id: number;
  roles: readonly Role[];
}

export interface RevisionFacts {
  state: RevisionState;
  createdBy: number;
}

/**
 * Why `actor` may not give `command` on this revision, or null when allowed. Withdrawing a draft
 * or a submitted revision is for its author (or an administrator); retiring an approved one is
 * for quality (or an administrator).
 */
export function refusal(command: RevisionCommand, actor: Actor, rev: RevisionFacts): string | null {
  const rule = COMMAND_RULES[command];
  if (!rule.from.includes(rev.state)) {
    return `This revision is ${rev.state}; "${rule.label}" needs it to be ${rule.from.join(' or ')}.`;
  }
  if (!rule.roles.some((r) => actor.roles.includes(r))) return `"${rule.label}" needs one of the roles: ${rule.roles.join(', ')}.`;
  const isAuthor = actor.id === rev.createdBy;
  if (rule.author === 'must' && !isAuthor) return `Only the revision's author can ${rule.label.toLowerCase()}.`;
  if (rule.author === 'mustNot' && isAuthor) return 'Nobody signs off their own revision: ask another quality reviewer.';
  if (command === 'withdraw') {
    const admin = actor.roles.includes('admin');
    if (rev.state === 'approved' && !admin && !actor.roles.includes('quality')) return 'Only quality can retire an approved revision.';
    if (rev.state !== 'approved' && !admin && !isAuthor) return "Only the revision's author can withdraw it.";
  }
  return null;
}

/** Commands this actor may give on this revision now (for the pages). */
export function allowedCommands(actor: Actor, rev: RevisionFacts): RevisionCommand[] {
  return (Object.keys(COMMAND_RULES) as RevisionCommand[]).filter((c) => refusal(c, actor, rev) === null);
}

export const STATE_LABELS: Record<RevisionState, string> = {
  draft: 'Draft',
  submitted: 'In review',
  approved: 'Approved',
  returned: 'Returned',
  superseded: 'Superseded',
  withdrawn: 'Withdrawn'
};
