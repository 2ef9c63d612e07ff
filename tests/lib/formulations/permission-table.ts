/**
 * Who may give which command on a revision in each state, written out by hand from the product
 * rules (draft editable by its author; quality signs off others' work; nobody signs their own;
 * withdraw: the author before approval, quality to retire an approved revision; admins may act as
 * quality and withdraw). Shared by the rule test and the service test.
 */
import type { RevisionState } from '../../../src/lib/formulations/workflow-rules';
import type { RevisionCommand } from '../../../src/lib/formulations/workflow-rules';

export type Person = 'author (formulator)' | 'other formulator' | 'technician' | 'quality reviewer' | 'administrator';

export const ALLOWED: Record<Person, Partial<Record<RevisionState, RevisionCommand[]>>> = {
  'author (formulator)': { draft: ['edit', 'submit', 'withdraw'], submitted: ['withdraw'] },
  'other formulator': {},
  technician: {},
  'quality reviewer': { submitted: ['review', 'approve', 'return'], approved: ['withdraw'] },
  administrator: { draft: ['withdraw'], submitted: ['review', 'approve', 'return', 'withdraw'], approved: ['withdraw'] }
};
