/** Links for server-side lists: the current query with some parameters changed (null removes one). */
export function hrefWith(url: URL, changes: Record<string, string | number | null>): string {
  const params = new URLSearchParams(url.search);
  for (const [k, v] of Object.entries(changes)) {
    if (v === null || v === '') params.delete(k);
    else params.set(k, String(v));
  }
  const s = params.toString();
  return s ? `${url.pathname}?${s}` : url.pathname;
}

export const utc = (d: Date | string | null | undefined): string =>
  d ? `${new Date(d).toISOString().slice(0, 16).replace('T', ' ')} UTC` : '—';

/** A number at fixed digits; values that round to zero print without a minus sign. */
export const fixed = (v: number | null | undefined, digits: number): string => {
  if (v === null || v === undefined || !Number.isFinite(v)) return '—';
  return (Math.abs(v) < 0.5 * 10 ** -digits ? 0 : v).toFixed(digits);
};

/** "B-450 royal blue chip" rather than "B-450 B-450 royal blue chip" when the name already starts with the code. */
export const materialLabel = (m: { code: string; name: string }): string => (m.name.startsWith(m.code) ? m.name : `${m.code} ${m.name}`);
