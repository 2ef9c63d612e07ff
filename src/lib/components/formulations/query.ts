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

export const utc = (d: Date | string | null | undefined): string => (d ? `${new Date(d).toISOString().slice(0, 16).replace('T', ' ')} UTC` : '—');

export const fixed = (v: number | null | undefined, digits: number): string => (v === null || v === undefined || !Number.isFinite(v) ? '—' : v.toFixed(digits));
