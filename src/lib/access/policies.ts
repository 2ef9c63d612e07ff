/**
 * Who may do what, named once. Each policy is a function (`mayPlanBatch(user)`) carrying the
 * roles it admits (`mayPlanBatch.roles`): the route tables (./routes/*) list those roles per
 * method, handlers assert the same policy (`requireUser(locals, mayPlanBatch)`), and pages ask it
 * which buttons to show. Revision commands read the state machine's table (COMMAND_RULES).
 */
import { ADMIN, ALL, FORMULATION_EDITORS, LINE, QUALITY, REVISION_ACTORS, type Role } from '../roles';
import { COMMAND_RULES, refusal, type RevisionFacts } from '../formulations/workflow-rules';

/** Anyone the policies judge: a signed-in user (or nobody). */
export interface Who {
  id: number;
  roles: readonly Role[];
}

export interface RolePolicy {
  (who: Pick<Who, 'roles'> | null | undefined): boolean;
  readonly roles: readonly Role[];
}

function rolePolicy(roles: readonly Role[]): RolePolicy {
  return Object.assign((who: Pick<Who, 'roles'> | null | undefined) => !!who && roles.some((r) => who.roles.includes(r)), { roles });
}

/** Read anything in the app (every role). */
export const mayRead = rolePolicy(ALL);
/** Add, edit, archive materials, their lots, documents and spectra. */
export const mayEditLibrary = rolePolicy(FORMULATION_EDITORS);
/** Design blends and file them as a new formulation. */
export const mayDesign = rolePolicy(FORMULATION_EDITORS);
/** Create a formulation, or start a new draft revision of one. */
export const mayAuthorFormulations = rolePolicy(FORMULATION_EDITORS);
/** Edit, submit or withdraw revisions (the state machine then checks authorship and state). */
export const mayActOnRevisions = rolePolicy(COMMAND_RULES.edit.roles);
/** Review, approve or return submitted revisions with an e-signature. */
export const maySignRevisions = rolePolicy(COMMAND_RULES.approve.roles);
/** Plan a batch from an approved revision. */
export const mayPlanBatch = rolePolicy(LINE);
/** Weigh, mix, rescale and complete a batch at the line. */
export const mayWeigh = rolePolicy(LINE);
/** Accept a reading outside its range (signed). */
export const mayAcceptDeviation = rolePolicy(QUALITY);
/** Upload measurements, set acceptance, draft corrections, release or reject batches. */
export const mayJudgeBatches = rolePolicy(QUALITY);
/** Read and export the audit trail. */
export const mayReadAudit = rolePolicy(QUALITY);
/** Invite people and manage roles. */
export const mayAdminister = rolePolicy(ADMIN);
/** Set a revision's variation model for yield forecasts, by hand or fitted to a batch (authors and quality). */
export const maySetVariationModel = rolePolicy(REVISION_ACTORS);
/** Roles that may draft a correction revision (authors and quality). */
export const mayDraftCorrection = rolePolicy(REVISION_ACTORS);

/** May `user` approve this revision now (role, state, and nobody approves their own)? */
export function mayApprove(user: Who | null | undefined, revision: RevisionFacts): boolean {
  return !!user && refusal('approve', user, revision) === null;
}
mayApprove.roles = COMMAND_RULES.approve.roles;
