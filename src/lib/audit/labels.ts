/**
 * Words for the audit trail: one table of what each kind of record and each event is called, used
 * by every page, CSV and PDF that shows events. The stored codes stay as they are (they are the
 * record); only what people read changes. An event not in the table reads as its code in words.
 */

export const ENTITY_LABELS: Readonly<Record<string, string>> = {
  api_token: 'API token',
  audit_trail: 'Audit trail',
  batch: 'Batch',
  batch_line: 'Batch line',
  formulation: 'Formulation',
  formulation_revision: 'Formulation revision',
  invite: 'Invitation',
  material: 'Material',
  'material-lot': 'Material lot',
  'package-model': 'Package model',
  session: 'Sign-in',
  'tester-profile': 'Tester profile',
  user: 'User account',
  'yield-prediction': 'Yield forecast'
};

export const ACTION_LABELS: Readonly<Record<string, string>> = {
  accept_deviation: 'Deviation accepted',
  'acceptance-set': 'Acceptance criteria set',
  approve: 'Approved',
  archive: 'Archived',
  'attachment-add': 'Document added',
  'attachment-remove': 'Document removed',
  complete: 'Weighing completed',
  'correction-draft': 'Correction draft written',
  create: 'Created',
  'create-by-fit': 'Fitted and created',
  deactivated: 'Deactivated',
  delete: 'Deleted',
  'e-signature': 'Signed',
  'e-signature-refused': 'Signature refused (wrong password)',
  'emission-spectrum-upload': 'Emission spectrum uploaded',
  'excitation-spectrum-upload': 'Excitation spectrum uploaded',
  export: 'Exported',
  invite: 'Invited',
  'invite-accepted': 'Invitation accepted',
  'lot-add': 'Lot added',
  'lot-remove': 'Lot removed',
  'measurements-upload': 'Measurements uploaded',
  'pump-bins': 'Chip bins set',
  thermal: 'Thermal data set',
  'measurements-withdraw': 'Measurements withdrawn',
  mixed: 'Part B mixed in',
  reactivated: 'Reactivated',
  record_reading: 'Weight recorded',
  reject: 'Rejected',
  release: 'Released',
  restore: 'Restored',
  return: 'Returned for changes',
  revoke: 'Revoked',
  'roles-changed': 'Roles changed',
  scale: 'Batch rescaled',
  'sign-in': 'Signed in',
  'sign-in-address-blocked': 'Sign-in refused (address blocked)',
  'sign-in-failed': 'Sign-in failed',
  'sign-in-throttled': 'Sign-in refused (too many tries)',
  'sign-out': 'Signed out',
  signature_locked: 'Signing locked (too many wrong passwords)',
  start_weighing: 'Weighing started',
  submit: 'Submitted for review',
  supersede: 'Superseded',
  update: 'Edited',
  'variation-model': 'Variation model set',
  'variation-model-fit': 'Variation model fitted to a batch',
  'update-draft': 'Draft edited',
  withdraw: 'Withdrawn'
};

/** "roles-changed" → "Roles changed": the fallback for a code the table lacks. */
export function codeInWords(code: string): string {
  const words = code.replace(/[_-]+/g, ' ').trim();
  return words ? words[0].toUpperCase() + words.slice(1) : code;
}

export function actionLabel(action: string): string {
  return ACTION_LABELS[action] ?? codeInWords(action);
}

export function entityLabel(entityType: string): string {
  return ENTITY_LABELS[entityType] ?? codeInWords(entityType);
}
