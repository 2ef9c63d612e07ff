/**
 * The metrics a trade-off front can be traced against: CIE 13.3-1995 Ra and R9, ANSI/IES TM-30-20 Rf,
 * and the melanopic DER of CIE S 026/E:2018 — higher for daytime spaces, or lower for the evening.
 */
export const TRADE_OFF_METRICS = ['ra', 'r9', 'rf', 'melDerHigh', 'melDerLow'] as const;
export type TradeOffMetric = (typeof TRADE_OFF_METRICS)[number];
export const TRADE_OFF_LABEL: Record<TradeOffMetric, string> = {
  ra: 'Ra',
  r9: 'R9',
  rf: 'Rf',
  melDerHigh: 'Melanopic DER (higher)',
  melDerLow: 'Melanopic DER (lower)'
};
