/**
 * Pump wavelength bins (pure): the bin set of a pump material (schema), which bin a chip lot's
 * wavelength falls in, and the pump moved to a bin's wavelength. The recipe matrix (a recipe per
 * bin, `src/lib/recipe` version 3) and the production-spread simulation build on it.
 */
export * from './schema';
export * from './lookup';
export * from './shift';
export * from './text';
