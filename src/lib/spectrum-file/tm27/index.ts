/** IES TM-27-14 spectral data documents: read, write and the document model. */
export * from './document';
export { looksLikeTm27, parseTm27, type Tm27FileOk, type Tm27FileResult } from './read';
export { writeTm27 } from './write';
