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

/**
 * Reads a tester table as its text arrives (RFC 4180 fields split by papaparse one block of whole lines at a
 * time; a block never ends inside a quoted field): `write` each piece of text, then `end` for the result. Only
 * the rows kept and the unfinished last line are held, never the whole text; it stops early once refused.
 */
export class TesterTableReader {
  private pending = '';
  private skip: number;
  private started = false;
  private delimiter: string;
  private head: string[] | null = null;
  private index = new Map<TesterField, number>();
  private refused: TableIssue[] | null = null;
  private readonly errors: TableIssue[] = [];
  private readonly rows: TesterRow[] = [];
  private readonly labels = new Map<string, number>();
  private quotingErrors = 0;
  private firstQuotingError = '';
  private r = 0;
  private readonly headerLine: number;

  constructor(private readonly profile: TesterProfile) {
    this.skip = profile.headerLines;
    this.headerLine = profile.headerLines + 1;
    this.delimiter = profile.delimiter === 'auto' ? '' : profile.delimiter === 'tab' ? '\t' : profile.delimiter;
  }

  /** True once the table is refused (later text is not read). */
  get done(): boolean {
    return this.refused !== null || this.errors.length >= MAX_ERRORS;
  }

  write(text: string): void {
    if (this.done) return;
    if (!this.started) {
      this.started = true;
      text = text.replace(/^\uFEFF/, '');
    }
    this.pending += text;
    // The lines before the header are skipped whole.
    while (this.skip > 0) {
      const nl = this.pending.indexOf('\n');
      if (nl < 0) return;
      this.pending = this.pending.slice(nl + 1);
      this.skip--;
    }
    // Cut at the last line end outside a quoted field (an even count of quotes before it, RFC 4180 §2.7).
    let cut = -1;
    let quoted = false; // the unread text always starts a line
    for (let i = 0; i < this.pending.length; i++) {
      const c = this.pending.charCodeAt(i);
      if (c === 34) quoted = !quoted;
      else if (c === 10 && !quoted) cut = i;
    }
    if (cut < 0) return;
    let block = this.pending.slice(0, cut);
    this.pending = this.pending.slice(cut + 1);
    if (block.endsWith('\r')) block = block.slice(0, -1);
    this.parseBlock(block);
  }

  end(): TesterTableResult {
    if (!this.done && this.skip === 0) {
      const rest = this.pending.replace(/\r\n/g, '\n');
      if (rest !== '' || this.head === null) this.parseBlock(rest);
    }
    this.pending = '';
    const { headerLine, errors, rows } = this;
    if (this.refused) return { ok: false, errors: this.refused };
    if (this.head === null) return { ok: false, errors: [{ line: headerLine, message: `line ${headerLine}: no header row` }] };
    if (errors.length) return { ok: false, errors };
    if (!rows.length) return { ok: false, errors: [{ line: headerLine, message: `no parts below the header on line ${headerLine}` }] };
    const warnings = this.quotingErrors ? [`${this.quotingErrors} row(s) had quoting problems: ${this.firstQuotingError}`] : [];
    return { ok: true, rows, warnings };
  }

  private parseBlock(block: string): void {
    const parsed = Papa.parse<string[]>(block.replace(/\r\n/g, '\n'), { delimiter: this.delimiter, skipEmptyLines: false });
    if (!this.delimiter && parsed.meta.delimiter) this.delimiter = parsed.meta.delimiter;
    if (parsed.errors.length) {
      if (!this.quotingErrors) this.firstQuotingError = parsed.errors[0].message;
      this.quotingErrors += parsed.errors.length;
    }
    for (const cells of parsed.data) {
      if (this.done) return;
      if (this.head === null) this.header(cells);
      else this.row(cells, this.headerLine + ++this.r);
    }
  }

  private header(cells: string[]): void {
    const { profile, headerLine } = this;
    const head = cells.map((h) => String(h).trim().toLowerCase());
    if (!head.length || head.every((h) => h === '')) {
      this.refused = [{ line: headerLine, message: `line ${headerLine}: no header row` }];
      return;
    }
    this.head = head;
    const missing: string[] = [];
    for (const f of TESTER_FIELDS) {
      const name = profile.columns[f];
      if (!name) continue;
      const at = head.indexOf(name.toLowerCase());
      if (at < 0) missing.push(`"${name}" (${TESTER_FIELD_LABELS[f]})`);
      else this.index.set(f, at);
    }
    if (missing.length) {
      const shown = cells
        .slice(0, 20)
        .map((h) => `"${String(h).trim()}"`)
        .join(', ');
      this.refused = [{ line: headerLine, message: `line ${headerLine}: column ${missing.join(', ')} not found; the header has ${shown}` }];
    }
  }

  private row(cells: string[], line: number): void {
    const { profile, index, errors, rows, labels } = this;
    const comma = profile.decimalMark === ',';
    const [c1, c2]: TesterField[] = profile.chromaticity === 'xy' ? ['x', 'y'] : ['uPrime', 'vPrime'];
    if (cells.length === 1 && String(cells[0]).trim() === '') return;
    if (rows.length >= MAX_TABLE_ROWS) {
      errors.push({
        line,
        message: `line ${line}: more than ${MAX_TABLE_ROWS.toLocaleString('en')} parts in one table; split the lot into several uploads`
      });
      this.refused = errors;
      return;
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
}

/** Reads a whole tester table text with its profile (see TesterTableReader). */
export function parseTesterTable(text: string, profile: TesterProfile): TesterTableResult {
  const reader = new TesterTableReader(profile);
  reader.write(text);
  return reader.end();
}
