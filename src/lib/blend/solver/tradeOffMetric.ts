/** The rendition metrics a trade-off front can be traced against (CIE 13.3-1995 Ra, R9; ANSI/IES TM-30-20 Rf). */
export const TRADE_OFF_METRICS = ['ra', 'r9', 'rf'] as const;
export type TradeOffMetric = (typeof TRADE_OFF_METRICS)[number];
export const TRADE_OFF_LABEL: Record<TradeOffMetric, string> = { ra: 'Ra', r9: 'R9', rf: 'Rf' };
