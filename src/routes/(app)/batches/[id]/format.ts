/** Display helpers of the batch page. */
export const STATUS_TEXT = { in: 'in range', below: 'below range', above: 'above range' } as const;

export function stamp(d: Date | string | null): string {
  return d ? new Date(d).toISOString().slice(0, 16).replace('T', ' ') + ' UTC' : '—';
}
