/**
 * SHA-256 of a revision's canonical content JSON: the value an e-signature binds to. New content is
 * hashed as it will be stored; a stored row is checked over its stored text (never over what the
 * recipe reader makes of it), so rows of older content versions still verify.
 */
import { createHash } from 'node:crypto';
import { canonicalJson } from '../../formulations/canonical-json';
import type { RevisionContent } from '../../recipe';

const sha256Hex = (text: string) => createHash('sha256').update(text, 'utf8').digest('hex');

export function contentSha256(content: RevisionContent): string {
  return sha256Hex(canonicalJson(content));
}

/** The hash of content_json as stored: the canonical form of the stored JSON, whatever its version. */
export function storedContentSha256(contentJson: string): string {
  return sha256Hex(canonicalJson(JSON.parse(contentJson)));
}
