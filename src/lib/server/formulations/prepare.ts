/**
 * Validates a revision's content and computes what is stored with it: the refreshed content,
 * the spectral core's prediction, the core's version and the content hash. Saves nothing.
 */
import type { Knex } from 'knex';
import { BlendInputError } from '../../blend/errors';
import { SpectrumInputError } from '../../spectral/errors';
import { checkRecipe, fractionsWithLeak, type RevisionContent } from '../../recipe';
import { PREDICTION_CORE_VERSION, predictRevision, type RevisionPrediction } from '../../formulations/prediction';
import { loadRevisionComponents } from './components';
import { ValidationError } from './errors';
import { readableSummary } from '../../errors/readable-issues';
import { contentSha256 } from './hash';
import { citedPackageModel } from '../package-models/choices';
import { DomainError } from '../../errors/domain-error';

/** Pump leak + phosphor fractions must add up to 1 within this (rounding of four-decimal inputs). */
export const FRACTION_SUM_TOLERANCE = 0.001;

export interface PreparedRevision {
  content: RevisionContent;
  predicted: RevisionPrediction;
  coreVersion: string;
  sha256: string;
}

export function parseContent(raw: unknown): RevisionContent {
  const parsed = checkRecipe(raw);
  if (!parsed.ok) {
    const issues = parsed.issues;
    throw new ValidationError(`The revision cannot be saved: ${readableSummary(issues)}`, issues);
  }
  const c = parsed.content;
  const sum = fractionsWithLeak(c).reduce((s, f) => s + f, 0);
  if (Math.abs(sum - 1) > FRACTION_SUM_TOLERANCE) {
    const message = `pump leak and phosphor optical fractions must add up to 1 (they add up to ${sum.toFixed(4)})`;
    throw new ValidationError(message, [{ path: 'phosphors', message }]);
  }
  return c;
}

/** A cited package model must exist at the cited version (versions are immutable, never deleted). */
async function checkPackageModelRef(knex: Knex, content: RevisionContent): Promise<void> {
  const ref = content.packageModelRef;
  if (!ref || (await citedPackageModel(ref, knex))) return;
  const message = `package model ${ref.id} version ${ref.version} does not exist; choose a package model from the library`;
  // Well-formed content citing something that is not there: 422, as the package-model API refuses a fit it cannot make.
  throw new DomainError('unprocessable', `Invalid revision content: packageModelRef: ${message}`, {
    issues: [{ path: 'packageModelRef', message }]
  });
}

export async function prepareRevision(knex: Knex, raw: unknown): Promise<PreparedRevision> {
  const content = parseContent(raw);
  await checkPackageModelRef(knex, content);
  const loaded = await loadRevisionComponents(knex, content);
  let predicted: RevisionPrediction;
  try {
    predicted = predictRevision(loaded.content, loaded.components);
  } catch (err) {
    if (err instanceof BlendInputError || err instanceof SpectrumInputError)
      throw new ValidationError(`The spectral core cannot evaluate this blend: ${err.message}`);
    throw err;
  }
  return { content: loaded.content, predicted, coreVersion: PREDICTION_CORE_VERSION, sha256: contentSha256(loaded.content) };
}
