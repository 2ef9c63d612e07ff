/**
 * Builds typed or pasted as a small CSV (comma, semicolon or tab). The header names the columns:
 * `label`, one column per phosphor headed by its library code (wt %), `x`, `y`, and optionally
 * `path_mm`, `dispense_mg`, `w_per_pump_w`, `lm_per_pump_w`. Lines starting with # are notes.
 * Every problem is reported with its line number; nothing is guessed.
 */
import type { BuildInput } from './schema';

export interface BuildsCsv {
  phosphorCodes: string[];
  builds: BuildInput[];
}

export interface LineError {
  line: number;
  message: string;
}

const OPTIONAL = {
  path_mm: 'pathLengthMm',
  dispense_mg: 'dispenseMassMg',
  w_per_pump_w: 'outputWPerPumpW',
  lm_per_pump_w: 'outputLmPerPumpW'
} as const;
const KNOWN = new Set(['label', 'x', 'y', ...Object.keys(OPTIONAL)]);

function splitLine(line: string): string[] {
  const sep = line.includes('\t') ? '\t' : line.includes(';') ? ';' : ',';
  return line.split(sep).map((c) => c.trim());
}

export function parseBuildsCsv(text: string): { ok: true; value: BuildsCsv } | { ok: false; errors: LineError[] } {
  const lines = text
    .split(/\r?\n/)
    .map((l, i) => ({ n: i + 1, text: l.trim() }))
    .filter((l) => l.text !== '' && !l.text.startsWith('#'));
  if (lines.length === 0) return { ok: false, errors: [{ line: 1, message: 'No builds: paste a header line and one line per build.' }] };
  const header = splitLine(lines[0].text).map((h) => h.toLowerCase());
  const raw = splitLine(lines[0].text);
  const errors: LineError[] = [];
  for (const need of ['label', 'x', 'y'])
    if (!header.includes(need)) errors.push({ line: lines[0].n, message: `The header needs a "${need}" column.` });
  const phosphorCols = header.map((h, i) => (KNOWN.has(h) ? -1 : i)).filter((i) => i >= 0);
  if (phosphorCols.length === 0)
    errors.push({ line: lines[0].n, message: 'The header needs one column per phosphor, headed by its library code (wt %).' });
  if (new Set(header).size !== header.length) errors.push({ line: lines[0].n, message: 'A column is named twice in the header.' });
  if (errors.length) return { ok: false, errors };
  const builds: BuildInput[] = [];
  for (const { n, text: t } of lines.slice(1)) {
    const cells = splitLine(t);
    if (cells.length !== header.length) {
      errors.push({ line: n, message: `Expected ${header.length} values, found ${cells.length}.` });
      continue;
    }
    const num = (col: number, name: string): number | undefined => {
      const v = cells[col];
      if (v === '') return undefined;
      const x = Number(v.replace(',', '.'));
      if (!Number.isFinite(x)) errors.push({ line: n, message: `${name} "${v}" is not a number.` });
      return x;
    };
    const at = (name: string) => header.indexOf(name);
    const label = cells[at('label')] || `line ${n}`;
    const conc = phosphorCols.map((c) => num(c, `${raw[c]} wt %`) ?? 0);
    const build: BuildInput = { label, concentrationsWtPct: conc, x: num(at('x'), 'x'), y: num(at('y'), 'y') };
    for (const [col, key] of Object.entries(OPTIONAL)) if (at(col) >= 0) build[key] = num(at(col), col);
    if (build.x === undefined || build.y === undefined) errors.push({ line: n, message: 'x and y are required.' });
    builds.push(build);
  }
  if (errors.length) return { ok: false, errors };
  return { ok: true, value: { phosphorCodes: phosphorCols.map((c) => raw[c]), builds } };
}
