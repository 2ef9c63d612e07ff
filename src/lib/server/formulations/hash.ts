/** SHA-256 of a revision's canonical content JSON: the value an e-signature binds to. */
import { createHash } from 'node:crypto';
import { canonicalJson } from '../../formulations/canonical-json';
import type { RevisionContent } from '../../formulations/content';

export function contentSha256(content: RevisionContent): string {
  return createHash('sha256').update(canonicalJson(content), 'utf8').digest('hex');
}
