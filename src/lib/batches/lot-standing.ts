/**
 * Whether a typed lot can be recorded on a line, as the weigh-out checks it: a line of a library
 * material takes only a registered lot of that material (exact number, spaces at the ends ignored)
 * that has not passed its expiry date. The server's check and the live hint share this rule.
 */
export interface KnownLot {
  lotNumber: string;
  /** ISO date (YYYY-MM-DD) or null. */
  expiresOn: string | null;
}

export type LotStanding =
  | { kind: 'empty' }
  | { kind: 'free' }
  | { kind: 'ok'; lotNumber: string }
  | { kind: 'unknown'; message: string }
  | { kind: 'expired'; lotNumber: string; expiresOn: string; message: string };

/** `known` is null for a line without a library material (silicone parts, additives): any lot text goes. */
export function lotStanding(typed: string, code: string, known: readonly KnownLot[] | null, todayIso: string): LotStanding {
  const text = typed.trim();
  if (text === '') return { kind: 'empty' };
  if (known === null) return { kind: 'free' };
  const lot = known.find((l) => l.lotNumber === text);
  if (!lot) {
    const hint = known.length
      ? ` Known lots: ${known
          .slice(0, 5)
          .map((k) => k.lotNumber)
          .join(', ')}.`
      : ' No lot of this material is registered yet.';
    return { kind: 'unknown', message: `"${text}" is not a known lot of ${code}.${hint}` };
  }
  if (lot.expiresOn && lot.expiresOn < todayIso)
    return {
      kind: 'expired',
      lotNumber: lot.lotNumber,
      expiresOn: lot.expiresOn,
      message: `Lot ${lot.lotNumber} of ${code} expired on ${lot.expiresOn}; use a current lot or have it retested.`
    };
  return { kind: 'ok', lotNumber: lot.lotNumber };
}
