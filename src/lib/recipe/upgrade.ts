/**
 * The upgrader chain of revision content: each stored version is parsed with its own schema, then
 * lifted one version at a time (each step's output checked by the next schema) to the current one.
 * Stored text is never rewritten: a signed row keeps its bytes and its SHA-256, and newer code reads
 * it through this chain. Generic over the list of versions, so a new version is one entry here.
 */
import type { z } from 'zod';
import { revisionContentV1Schema, type RevisionContentV1 } from './schema';
import { revisionContentV2Schema, type RevisionContentV2 } from './schemaV2';
import { revisionContentV3Schema, type RevisionContentV3 } from './schemaV3';

/** Content without a `contentVersion` tag was written before the tag existed: version 1. */
export const LEGACY_CONTENT_VERSION = 1;

export interface ContentVersion<T = unknown> {
  version: number;
  schema: z.ZodType<T>;
  /** Previous version's parsed content → this version's content (checked by `schema`); absent on the first. */
  upgrade?: (previous: never) => unknown;
}

/** Versions oldest first, consecutive; the last one is what readers get. */
export type ContentVersionChain<T> = readonly [...ContentVersion[], ContentVersion<T>];

export interface ContentIssue {
  path: string;
  message: string;
}

export type UpgradeResult<T> =
  { ok: true; content: T; storedVersion: number } | { ok: false; storedVersion: number | null; message: string; issues: ContentIssue[] };

/** Throws when the chain itself is malformed (a programming error, caught by the module's tests). */
export function assertChain(chain: readonly ContentVersion[]): void {
  if (chain.length === 0) throw new Error('recipe: the version chain is empty');
  chain.forEach((step, i) => {
    if (i > 0 && step.version !== chain[i - 1].version + 1)
      throw new Error(`recipe: version ${step.version} does not follow ${chain[i - 1].version}`);
    if (i > 0 && !step.upgrade) throw new Error(`recipe: version ${step.version} has no upgrader from ${chain[i - 1].version}`);
  });
}

function failure(storedVersion: number | null, intro: string, issues: ContentIssue[]): UpgradeResult<never> {
  return { ok: false, storedVersion, message: `${intro}: ${issues.map((i) => `${i.path}: ${i.message}`).join('; ')}`, issues };
}

const issuesOf = (error: z.ZodError): ContentIssue[] =>
  error.issues.map((i) => ({ path: i.path.map(String).join('.') || '(content)', message: i.message }));

/** Parses raw content of any version in the chain and lifts it to the chain's last version. */
export function upgradeContent<T>(chain: ContentVersionChain<T>, raw: unknown): UpgradeResult<T> {
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) {
    return failure(null, 'recipe content cannot be read', [{ path: '(content)', message: 'expected a JSON object' }]);
  }
  const tag = (raw as Record<string, unknown>).contentVersion ?? LEGACY_CONTENT_VERSION;
  const start = chain.findIndex((step) => step.version === tag);
  if (start < 0) {
    const newest = chain[chain.length - 1].version;
    const known =
      typeof tag === 'number' && Number.isInteger(tag) && tag > newest
        ? `version ${tag} is newer than this software reads (up to ${newest})`
        : `${JSON.stringify(tag)} is not a known version (1 to ${newest})`;
    return failure(null, 'recipe content cannot be read', [{ path: 'contentVersion', message: known }]);
  }
  const storedVersion = chain[start].version;
  let value: unknown = raw;
  for (let i = start; i < chain.length; i++) {
    const step = chain[i];
    const input = i === start ? value : step.upgrade!(value as never);
    const parsed = step.schema.safeParse(input);
    if (!parsed.success) {
      const intro =
        i === start
          ? `recipe content (version ${storedVersion}) is invalid`
          : `recipe content upgraded from version ${storedVersion} to ${step.version} is invalid`;
      return failure(storedVersion, intro, issuesOf(parsed.error));
    }
    value = parsed.data;
  }
  return { ok: true, content: value as T, storedVersion };
}

/** The versions this software reads, oldest first. A new version adds its schema and its upgrader here. */
export const RECIPE_VERSIONS = [
  { version: 1, schema: revisionContentV1Schema },
  {
    version: 2,
    schema: revisionContentV2Schema,
    // Version 1 content was designed without a package model.
    upgrade: (previous: RevisionContentV1): RevisionContentV2 => ({ ...previous, contentVersion: 2, packageModelRef: null })
  },
  {
    version: 3,
    schema: revisionContentV3Schema,
    // Version 2 content aimed at the bench condition with one recipe for every pump bin.
    upgrade: (previous: RevisionContentV2): RevisionContentV3 => ({
      ...previous,
      contentVersion: 3,
      condition: null,
      coldCheck: null,
      binRecipes: []
    })
  }
] as const satisfies ContentVersionChain<RevisionContentV3>;

/** The version new content is written with. */
export const CONTENT_VERSION = RECIPE_VERSIONS[RECIPE_VERSIONS.length - 1].version;

/** The schema of the current version (what new content is checked against and written as). */
export const revisionContentSchema = revisionContentV3Schema;

/**
 * The current content as features read it. The tag is a plain number: features never branch on it
 * (the reader has already upgraded), so content of a later version that only adds fields still fits.
 */
export type RevisionContent = Omit<RevisionContentV3, 'contentVersion' | 'packageModelRef' | 'condition' | 'coldCheck' | 'binRecipes'> & {
  contentVersion: number;
  /** The reader always fills the fields below; content built in code may leave them out. */
  /** The package model the recipe was designed for (null: the library's loading values). */
  packageModelRef?: RevisionContentV3['packageModelRef'];
  /** The operating condition the target holds at (null: bench). */
  condition?: RevisionContentV3['condition'];
  /** The bench colour point to check a hot-aimed recipe against (null: the target itself). */
  coldCheck?: RevisionContentV3['coldCheck'];
  /** The recipe matrix, one recipe per pump bin (empty: one recipe for every bin). */
  binRecipes?: RevisionContentV3['binRecipes'];
};
