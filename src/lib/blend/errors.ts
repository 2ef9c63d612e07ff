/** Typed input error of the blend model: the caller's components or ratios cannot be used (API → 422). */
export class BlendInputError extends Error {
  override readonly name = 'BlendInputError';
}
