/**
 * The parts list of a batch, paged, sorted and filtered on the server so a lot of 100,000 parts never
 * travels whole: by verdict, ANSI bin, steps from the target, and a rectangle of the chromaticity plot
 * (x0–x1, y0–y1). Read from the page's query string; a bad value is refused by name. Pure.
 */
import { z } from 'zod';

const num = (what: string) =>
  z
    .string()
    .trim()
    .optional()
    .transform((v, ctx) => {
      if (v === undefined || v === '') return null;
      const n = Number(v.replace(',', '.'));
      if (Number.isFinite(n)) return n;
      ctx.addIssue({ code: 'custom', message: `${what}: "${v.slice(0, 20)}" is not a number` });
      return z.NEVER;
    });

export const PARTS_SORTS = ['file', 'label', 'steps', 'cct', 'ra'] as const;

export const partsQuerySchema = z.object({
  verdict: z.enum(['all', 'pass', 'fail'], 'verdict: all, pass or fail').default('all'),
  /** Nominal CCT of an ANSI bin, or "none" for parts in no bin; empty = any. */
  bin: z
    .string()
    .trim()
    .optional()
    .transform((v, ctx) => {
      if (!v) return null;
      if (v === 'none') return 'none' as const;
      const n = Number(v);
      if (Number.isInteger(n) && n > 0) return n;
      ctx.addIssue({ code: 'custom', message: `bin: "${v.slice(0, 20)}" is not an ANSI bin's nominal CCT` });
      return z.NEVER;
    }),
  stepsMin: num('steps from'),
  stepsMax: num('steps to'),
  x0: num('x from'),
  x1: num('x to'),
  y0: num('y from'),
  y1: num('y to'),
  sort: z.enum(PARTS_SORTS, `sort: one of ${PARTS_SORTS.join(', ')}`).default('file'),
  dir: z.enum(['asc', 'desc'], 'dir: asc or desc').default('asc'),
  page: z.coerce.number('page must be a number').int().min(1, 'page starts at 1').default(1),
  pageSize: z.coerce.number('pageSize must be a number').int().min(10, 'pageSize: 10–500').max(500, 'pageSize: 10–500').default(100)
});
export type PartsQuery = z.output<typeof partsQuerySchema>;
export const PARTS_QUERY_KEYS: readonly string[] = Object.keys(partsQuerySchema.shape);

/** The parts-list parameters of a URL's query (other parameters left out), as raw strings. */
export function partsQueryParams(params: URLSearchParams): Record<string, string> {
  return Object.fromEntries([...params].filter(([k]) => PARTS_QUERY_KEYS.includes(k)));
}

/** An x,y rectangle in CIE 1931 coordinates (x0 < x1, y0 < y1), as the plot draws it and the filter reads it. */
export interface XyRect {
  x0: number;
  x1: number;
  y0: number;
  y1: number;
}

/** The query's rectangle, when all four sides are given. */
export function queryRect(q: Partial<Record<'x0' | 'x1' | 'y0' | 'y1', number | null | undefined>>): XyRect | null {
  const { x0, x1, y0, y1 } = q;
  return typeof x0 === 'number' && typeof x1 === 'number' && typeof y0 === 'number' && typeof y1 === 'number' ? { x0, x1, y0, y1 } : null;
}
export const DEFAULT_PARTS_QUERY: PartsQuery = partsQuerySchema.parse({});

/** What the list needs of a part. */
export interface QueryablePart {
  label: string;
  metrics: { x: number; y: number; cct: number; ra: number | null };
  verdict: { pass: boolean; ansiBin: number | null; offset: { steps: number } };
}

export interface PartsPage<T> {
  items: T[];
  /** Parts matching the filters, and all parts of the batch. */
  matched: number;
  total: number;
  page: number;
  pages: number;
  pageSize: number;
}

export function selectParts<T extends QueryablePart>(parts: readonly T[], q: PartsQuery): PartsPage<T> {
  const between = (v: number, lo: number | null, hi: number | null) => (lo === null || v >= lo) && (hi === null || v <= hi);
  const [xLo, xHi] = q.x0 !== null && q.x1 !== null && q.x0 > q.x1 ? [q.x1, q.x0] : [q.x0, q.x1];
  const [yLo, yHi] = q.y0 !== null && q.y1 !== null && q.y0 > q.y1 ? [q.y1, q.y0] : [q.y0, q.y1];
  const matched = parts.filter(
    (p) =>
      (q.verdict === 'all' || p.verdict.pass === (q.verdict === 'pass')) &&
      (q.bin === null || (q.bin === 'none' ? p.verdict.ansiBin === null : p.verdict.ansiBin === q.bin)) &&
      between(p.verdict.offset.steps, q.stepsMin, q.stepsMax) &&
      between(p.metrics.x, xLo, xHi) &&
      between(p.metrics.y, yLo, yHi)
  );
  if (q.sort !== 'file') {
    const key: (p: T) => number | string =
      q.sort === 'label'
        ? (p) => p.label
        : q.sort === 'steps'
          ? (p) => p.verdict.offset.steps
          : q.sort === 'cct'
            ? (p) => p.metrics.cct
            : (p) => p.metrics.ra ?? -Infinity;
    const sign = q.dir === 'asc' ? 1 : -1;
    matched.sort((a, b) => {
      const ka = key(a);
      const kb = key(b);
      return sign * (typeof ka === 'string' ? ka.localeCompare(kb as string, 'en', { numeric: true }) : (ka as number) - (kb as number));
    });
  } else if (q.dir === 'desc') matched.reverse();
  const pages = Math.max(1, Math.ceil(matched.length / q.pageSize));
  const page = Math.min(q.page, pages);
  return {
    items: matched.slice((page - 1) * q.pageSize, page * q.pageSize),
    matched: matched.length,
    total: parts.length,
    page,
    pages,
    pageSize: q.pageSize
  };
}
