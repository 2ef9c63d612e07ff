/**
 * The recipe: the versioned content of a formulation revision, the one definition that the designer
 * (filing), formulations (review, compare, signatures), weigh-out, quality (targets, correction) and
 * the seeds share. Pure: zod and relative imports only.
 *
 * - `schema.ts`: version 1 of the content (`contentVersion: 1`; stored rows without the tag are version 1).
 * - `schemaV2.ts`: version 2 = version 1 + `packageModelRef` (the package model the recipe was designed for).
 * - `schemaV3.ts`: version 3 = version 2 + `condition`, `coldCheck` and `binRecipes` (the recipe matrix).
 * - `upgrade.ts`: the chain of versions and their upgraders; `RevisionContent` is the current content.
 * - `read.ts`: `parseRecipe` (stored JSON text or a parsed value → current content), on every read;
 *   `checkRecipe` for content sent in a request (a value, never text).
 * - `accessors.ts`: the recipe lines (`fractionsWithLeak`, `phosphorLines`, `loadingOf`, …), each with
 *   an optional pump-bin key.
 *
 * Signed rows are never rewritten: the SHA-256 an e-signature binds is taken over the stored text
 * (its canonical JSON), never over what the reader returns, so old rows still verify after an upgrade.
 *
 * Version 2 (`schemaV2.ts`) adds `packageModelRef`; its upgrader sets it to null for older rows.
 * Version 3 (`schemaV3.ts`) adds `condition` (the operating condition the target holds at; null =
 * bench), `coldCheck` (the bench point a hot-aimed recipe should measure) and `binRecipes` (the recipe
 * matrix, one recipe per pump wavelength bin); the accessors pick a bin's recipe when given its key.
 * A later version: write the next schema (the previous one extended), an upgrader from the previous
 * version, append `{ version, schema, upgrade }` to RECIPE_VERSIONS; old rows read unchanged.
 */
export * from './schema';
export * from './schemaV2';
export * from './schemaV3';
export * from './upgrade';
export * from './read';
export * from './accessors';
