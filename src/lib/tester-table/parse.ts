/**
 * Reads an inline tester's per-part table with a tester profile: skips the lines before the header,
 * splits fields with papaparse (RFC 4180 quoting), finds each mapped column by its header name (case and
 * surrounding spaces ignored), and reads every cell as a number with the profile's decimal mark (one
 * replace and Number(), no pattern test per cell). Everything is checked before anything is kept: a
 * missing column names the header line, a bad cell names its line and column. Pure.
 */
import Papa from 'papaparse';
import { TESTER_FIELD_LABELS, TESTER_FIELDS, type TesterField, type TesterProfile } from './profile';

/** One row of a tester table, in the profile's units turned into lm and V. */
export interface TesterRow {
  label: string;
  /** Line of the file (1-based). */
  line: number;
  chromaticity: [number, number];
  cct: number | null;
  duv: number | null;
  ra: number | null;
  r9: number | null;
  fluxLm: number | null;
  forwardVoltageV: number | null;
  peakNm: number | null;
  bin: string | null;
}

export interface TableIssue {
  line: number | null;
  message: string;
}

export type TesterTableResult = { ok: true; rows: TesterRow[]; warnings: string[] } | { ok: false; errors: TableIssue[] };

export const MAX_TABLE_ROWS = 100_000;
const MAX_ERRORS = 20;

/** Plausible ranges of what a tester reports (wider than any white LED; outside = a wrong mapping or unit). */
const RANGES: Partial<Record<TesterField, [number, number]>> = {
  x: [0, 1],
  y: [0, 1],
  uPrime: [0, 1],
  vPrime: [0, 1],
  cct: [1000, 100_000],
  duv: [-0.1, 0.1],
  ra: [-200, 100],
  r9: [-500, 100],
  flux: [0, 1e9],
  forwardVoltage: [0, 1e5],
  peakNm: [360, 830]
};

export function parseTesterTable(text: string, profile: TesterProfile): TesterTableResult {
  const lines = text.replace(/^\uFEFF/, '').split(/\r?\n/);
  const headerLine = profile.headerLines + 1;
  const body = lines.slice(profile.headerLines).join('\n');
  const delimiter = profile.delimiter === 'auto' ? '' : profile.delimiter === 'tab' ? '\t' : profile.delimiter;
  const parsed = Papa.parse<string[]>(body, { delimiter, skipEmptyLines: false });
  const table = parsed.data;
  const head = (table[0] ?? []).map((h) => String(h).trim().toLowerCase());
  if (!head.length || head.every((h) => h === ''))
    return { ok: false, errors: [{ line: headerLine, message: `line ${headerLine}: no header row` }] };
  const index = new Map<TesterField, number>();
  const missing: string[] = [];
  for (const f of TESTER_FIELDS) {
    const name = profile.columns[f];
    if (!name) continue;
    const at = head.indexOf(name.toLowerCase());
    if (at < 0) missing.push(`"${name}" (${TESTER_FIELD_LABELS[f]})`);
    else index.set(f, at);
  }
  if (missing.length) {
    const shown = (table[0] ?? [])
      .slice(0, 20)
      .map((h) => `"${String(h).trim()}"`)
      .join(', ');
    return {
      ok: false,
      errors: [{ line: headerLine, message: `line ${headerLine}: column ${missing.join(', ')} not found; the header has ${shown}` }]
    };
  }
  const comma = profile.decimalMark === ',';
  const errors: TableIssue[] = [];
  const rows: TesterRow[] = [];
  const labels = new Map<string, number>();
  const [c1, c2]: TesterField[] = profile.chromaticity === 'xy' ? ['x', 'y'] : ['uPrime', 'vPrime'];
  for (let r = 1; r < table.length && errors.length < MAX_ERRORS; r++) {
    const cells = table[r];
    const line = headerLine + r;
    if (cells.length === 1 && String(cells[0]).trim() === '') continue;
    if (rows.length >= MAX_TABLE_ROWS) {
      errors.push({
        line,
        message: `line ${line}: more than ${MAX_TABLE_ROWS.toLocaleString('en')} parts in one table; split the lot into several uploads`
      });
      break;
    }
    const num = (f: TesterField, required: boolean): number | null => {
      const at = index.get(f);
      if (at === undefined) return null;
      const raw = String(cells[at] ?? '').trim();
      const column = `column "${profile.columns[f]}"`;
      if (raw === '') {
        if (required) errors.push({ line, message: `line ${line}, ${column}: empty; ${TESTER_FIELD_LABELS[f]} is required` });
        return null;
      }
      const v = Number(comma ? raw.replace(',', '.') : raw);
      const range = RANGES[f];
      if (!Number.isFinite(v)) {
        errors.push({ line, message: `line ${line}, ${column}: "${raw.slice(0, 24)}" is not a number` });
        return null;
      }
      if (range && (v < range[0] || v > range[1])) {
        errors.push({
          line,
          message:
            `line ${line}, ${column}: ${raw} is outside ${range[0]}–${range[1]} for ${TESTER_FIELD_LABELS[f]} ` +
            '(is the column mapping right?)'
        });
        return null;
      }
      return v;
    };
    const a = num(c1, true);
    const b = num(c2, true);
    const flux = num('flux', false);
    const vf = num('forwardVoltage', false);
    const row: TesterRow = {
      label: '',
      line,
      chromaticity: [a ?? NaN, b ?? NaN],
      cct: num('cct', false),
      duv: num('duv', false),
      ra: num('ra', false),
      r9: num('r9', false),
      fluxLm: flux === null ? null : profile.fluxUnit === 'mlm' ? flux / 1000 : flux,
      forwardVoltageV: vf === null ? null : profile.voltageUnit === 'mV' ? vf / 1000 : vf,
      peakNm: num('peakNm', false),
      bin: index.has('bin')
        ? String(cells[index.get('bin')!] ?? '')
            .trim()
            .slice(0, 40) || null
        : null
    };
    const labelAt = index.get('label');
    row.label = (labelAt === undefined ? '' : String(cells[labelAt] ?? '').trim()).slice(0, 80) || `row ${line}`;
    const seen = labels.get(row.label);
    if (seen !== undefined) errors.push({ line, message: `line ${line}: part "${row.label}" is already on line ${seen}` });
    labels.set(row.label, line);
    rows.push(row);
  }
  if (errors.length) return { ok: false, errors };
  if (!rows.length) return { ok: false, errors: [{ line: headerLine, message: `no parts below the header on line ${headerLine}` }] };
  const warnings = parsed.errors.length ? [`${parsed.errors.length} row(s) had quoting problems: ${parsed.errors[0].message}`] : [];
  return { ok: true, rows, warnings };
}
