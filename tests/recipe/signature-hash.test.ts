import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { parseRecipe, safeParseRecipe } from '../../src/lib/recipe';
import { canonicalJson } from '../../src/lib/formulations/canonical-json';
import { contentSha256, storedContentSha256 } from '../../src/lib/server/formulations/hash';
import { LEGACY_ROW } from './fixtures';

// FIPS 180-4 SHA-256 of the canonical JSON (keys sorted, no whitespace) binds an e-signature to the
// content (model: 21 CFR 11.70). Independent reference: node's OpenSSL digest of the text.
const sha256 = (text: string) => createHash('sha256').update(text, 'utf8').digest('hex');

describe('the signature hash is taken over the stored text, whatever its content version', () => {
  it('a row written before the version tag still verifies with the hash its writer recorded', () => {
    // What the writer of that time recorded: SHA-256 of the canonical form of the content it stored.
    const recorded = sha256(canonicalJson(JSON.parse(LEGACY_ROW)));
    expect(storedContentSha256(LEGACY_ROW)).toBe(recorded);
    // Reading adds the tag, so hashing what the reader returns would not verify: never do that.
    expect(contentSha256(parseRecipe(LEGACY_ROW))).not.toBe(recorded);
  });

  it('new content carries the tag in the stored text and in its hash, so it verifies too', () => {
    const parsed = safeParseRecipe(JSON.parse(LEGACY_ROW));
    if (!parsed.ok) throw new Error(parsed.message);
    const stored = JSON.stringify(parsed.content);
    expect(JSON.parse(stored).contentVersion).toBe(3);
    expect(JSON.parse(stored).packageModelRef).toBeNull();
    expect(storedContentSha256(stored)).toBe(contentSha256(parsed.content));
    expect(canonicalJson(JSON.parse(stored))).toMatch(
      /^\{"binRecipes":\[\],"coldCheck":null,"condition":null,"contentVersion":3,"floors":/
    );
  });

  it('does not depend on the key order or spacing of the stored text', () => {
    const reordered = JSON.stringify(Object.fromEntries(Object.entries(JSON.parse(LEGACY_ROW)).reverse()), null, 2);
    expect(storedContentSha256(reordered)).toBe(storedContentSha256(LEGACY_ROW));
  });
});
