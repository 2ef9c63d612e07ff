/**
 * Typed input error of the spectral core. Every validation failure of a caller-supplied
 * spectrum throws this class (never a plain Error or TypeError), so API handlers can map
 * it to HTTP 422 with the message as the detail.
 */
export class SpectrumInputError extends Error {
  override readonly name = 'SpectrumInputError';

  constructor(message: string) {
    super(message);
  }
}
