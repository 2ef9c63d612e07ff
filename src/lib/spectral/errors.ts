/**
 * Typed input error of the spectral core. Every validation failure of a caller-supplied
 * spectrum throws this class (never a plain Error or TypeError); it is a domain error of kind
 * `unprocessable`, answered 422 with "Spectrum rejected: " before the message.
 */
import { DomainError } from '../errors/domain-error';

export class SpectrumInputError extends DomainError {
  override name = 'SpectrumInputError';

  constructor(message: string) {
    super('unprocessable', message, { title: 'Spectrum rejected' });
  }
}
