/** Typed input error of the blend model: the caller's components or ratios cannot be used (kind `unprocessable`, API → 422). */
import { DomainError } from '../errors/domain-error';

export class BlendInputError extends DomainError {
  override name = 'BlendInputError';

  constructor(message: string) {
    super('unprocessable', message, { title: 'Blend rejected' });
  }
}
