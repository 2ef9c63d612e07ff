/**
 * Slurry age: once part B is mixed in, the addition-cure reaction runs and the slurry must be
 * dispensed before its pot life ends (the silicone maker's figure at 25 °C). A plant often sets a
 * shorter slurry-age limit because phosphor settles in the syringe (common practice; settling
 * follows Stokes' law, see docs/references.md). The earlier of the two limits applies.
 */
export interface SlurryLimit {
  mixedAt: Date;
  expiresAt: Date;
  limitMin: number;
  limitedBy: 'potLife' | 'plantLimit';
}

export function slurryExpiry(mixedAt: Date, potLifeMin: number, plantLimitMin: number | null = null): SlurryLimit {
  const usePlant = plantLimitMin !== null && plantLimitMin > 0 && plantLimitMin < potLifeMin;
  const limitMin = usePlant ? plantLimitMin : potLifeMin;
  return { mixedAt, expiresAt: new Date(mixedAt.getTime() + limitMin * 60_000), limitMin, limitedBy: usePlant ? 'plantLimit' : 'potLife' };
}

export interface SlurryAge {
  ageMin: number;
  remainingMin: number;
  expired: boolean;
}

/**
 * Age and time left at `now`. A clock that reads a little before the mixing time (a browser clock
 * behind the server's, or a page clock not yet ticked) reads age 0 and the whole limit left, never a
 * negative age or more than the limit.
 */
export function slurryAge(limit: Pick<SlurryLimit, 'mixedAt' | 'expiresAt'>, now: Date): SlurryAge {
  const at = Math.max(now.getTime(), limit.mixedAt.getTime());
  const ageMin = Math.floor((at - limit.mixedAt.getTime()) / 60_000);
  const remainingMs = limit.expiresAt.getTime() - at;
  return { ageMin, remainingMin: Math.max(0, Math.floor(remainingMs / 60_000)), expired: remainingMs <= 0 };
}
