/** Paper sizes the weigh-out papers are laid out for. */
export const PAPER_SIZES = ['A4', 'LETTER'] as const;
export type PaperSize = (typeof PAPER_SIZES)[number];
