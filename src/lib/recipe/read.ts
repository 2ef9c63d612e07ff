/**
 * Reading revision content: JSON text (or an already parsed value) of any stored version →
 * the current content, checked by the schema of every version it passes through. Used on every
 * read; the result is never written back (the stored text is what the signature hash covers).
 */
import {
  RECIPE_VERSIONS,
  upgradeContent,
  assertChain,
  type ContentIssue,
  type ContentVersionChain,
  type RevisionContent,
  type UpgradeResult
} from './upgrade';

/** Stored content that cannot be read: the message names the field and what is wrong with it. */
export class RecipeContentError extends Error {
  constructor(
    message: string,
    readonly issues: ContentIssue[],
    readonly storedVersion: number | null
  ) {
    super(message);
    this.name = 'RecipeContentError';
  }
}

export interface RecipeReader<T> {
  /** The current content; throws RecipeContentError naming what is wrong. */
  parse(json: unknown): T;
  safeParse(json: unknown): UpgradeResult<T>;
  /** A parsed value only (a request body's content): JSON text is refused like any other non-object. */
  check(value: unknown): UpgradeResult<T>;
}

/** A reader over a chain of versions (the product's chain below; tests may build a longer one). */
export function createRecipeReader<T>(chain: ContentVersionChain<T>): RecipeReader<T> {
  assertChain(chain);
  const safeParse = (json: unknown): UpgradeResult<T> => {
    if (typeof json !== 'string') return upgradeContent(chain, json);
    let raw: unknown;
    try {
      raw = JSON.parse(json);
    } catch {
      return {
        ok: false,
        storedVersion: null,
        message: 'recipe content cannot be read: it is not valid JSON',
        issues: [{ path: '(content)', message: 'not valid JSON' }]
      };
    }
    return upgradeContent(chain, raw);
  };
  return {
    safeParse,
    check: (value) => upgradeContent(chain, value),
    parse(json) {
      const result = safeParse(json);
      if (!result.ok) throw new RecipeContentError(result.message, result.issues, result.storedVersion);
      return result.content;
    }
  };
}

const reader = createRecipeReader(RECIPE_VERSIONS);

/** Revision content (JSON text as stored, or a parsed value) of any known version → the current content. */
export function parseRecipe(json: unknown): RevisionContent {
  return reader.parse(json);
}

/** As parseRecipe, with the failure returned instead of thrown (for request bodies). */
export function safeParseRecipe(json: unknown): UpgradeResult<RevisionContent> {
  return reader.safeParse(json);
}

/** Content sent in a request (a parsed value, any known version) → the current content, or what is wrong. */
export function checkRecipe(value: unknown): UpgradeResult<RevisionContent> {
  return reader.check(value);
}
