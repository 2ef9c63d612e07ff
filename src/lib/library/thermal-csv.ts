/**
 * Thermal CSV of a material: a header row naming the columns, then one row per temperature.
 *   phosphor: temperature_c, relative_emission [, peak_shift_nm] [, width_factor]
 *   pump:     temperature_c, relative_output   (drift per K / per mA are entered with the upload)
 * Comment lines and the separators follow the spectrum-file dialect (../spectrum-file/dialect.ts);
 * fields are split by papaparse; every value and the curve as a whole are checked with the thermal
 * schema. Any problem fails the whole file and names its line. Pure.
 */
import Papa from 'papaparse';
import { contentLines, DELIMITER_CHAR, detectDelimiter } from '../spectrum-file/dialect';
import { readNumberCell } from '../spectrum-file/number-cell';
import { phosphorThermalSchema, pumpThermalSchema, type MaterialThermal } from '../blend/thermal/schema';

export interface ThermalCsvError {
  line: number | null;
  message: string;
}

export type ThermalCsvResult = { ok: true; thermal: MaterialThermal } | { ok: false; errors: ThermalCsvError[] };

export interface PumpDrift {
  peakDriftNmPerK: number;
  peakDriftNmPerMa: number | null;
  referenceCurrentMa: number | null;
}

const COLUMNS = {
  phosphor: { required: ['temperature_c', 'relative_emission'], optional: ['peak_shift_nm', 'width_factor'] },
  pump: { required: ['temperature_c', 'relative_output'], optional: [] as string[] }
} as const;

const MAX_ROWS = 20;

function headerErrors(kind: 'phosphor' | 'pump', header: string[], line: number): ThermalCsvError[] {
  const spec = COLUMNS[kind];
  const allowed: string[] = [...spec.required, ...spec.optional];
  const unknown = header.filter((h) => !allowed.includes(h));
  const missing = spec.required.filter((r) => !header.includes(r));
  const errors: ThermalCsvError[] = [];
  if (unknown.length) errors.push({ line, message: `Line ${line}: unknown column ${unknown.join(', ')} (expected ${allowed.join(', ')})` });
  if (missing.length) errors.push({ line, message: `Line ${line}: the header lacks ${missing.join(', ')}` });
  return errors;
}

/** Reads the table into columns of numbers by header name, or the line errors. */
function readTable(kind: 'phosphor' | 'pump', text: string) {
  const { lines } = contentLines(text);
  if (lines.length < 2) return { errors: [{ line: null, message: 'The file needs a header row and at least two temperatures.' }] };
  if (lines.length - 1 > MAX_ROWS) return { errors: [{ line: lines[MAX_ROWS + 1].line, message: `At most ${MAX_ROWS} temperatures.` }] };
  const delimiter = detectDelimiter(lines);
  const rows = lines.map((l) => {
    const t = delimiter === 'whitespace' ? l.text.trim().replace(/\s+/g, ' ') : l.text;
    return Papa.parse<string[]>(t, { delimiter: DELIMITER_CHAR[delimiter] }).data[0]?.map((c) => c.trim()) ?? [];
  });
  const header = rows[0].map((h) => h.toLowerCase());
  const errors = headerErrors(kind, header, lines[0].line);
  if (errors.length) return { errors };
  const values: Record<string, number[]> = Object.fromEntries(header.map((h) => [h, []]));
  const lineOf: number[] = [];
  rows.slice(1).forEach((cells, i) => {
    const line = lines[i + 1].line;
    lineOf.push(line);
    if (cells.length !== header.length)
      errors.push({ line, message: `Line ${line}: expected ${header.length} fields, found ${cells.length}` });
    header.forEach((h, c) => {
      const r = readNumberCell(cells[c] ?? '', delimiter !== 'comma' && cells[c]?.includes(',') ? 'comma' : 'point');
      if (r.ok) values[h].push(r.value);
      else if (cells.length === header.length) errors.push({ line, message: `Line ${line}: ${h} ${r.message}` });
    });
  });
  return errors.length ? { errors } : { values, lineOf };
}

function curve(t: number[], v: number[]) {
  return t.map((temperatureC, i) => ({ temperatureC, value: v[i] }));
}

/** Parses a thermal CSV for a phosphor or (with its drift) a pump; saves nothing, names the lines of any problem. */
export function parseThermalCsv(kind: 'phosphor' | 'pump', text: string, drift?: PumpDrift): ThermalCsvResult {
  const table = readTable(kind, text);
  if (!('values' in table) || !table.values) return { ok: false, errors: table.errors ?? [] };
  const { values, lineOf } = table;
  const t = values.temperature_c;
  const candidate =
    kind === 'phosphor'
      ? {
          kind,
          relativeEmission: curve(t, values.relative_emission),
          peakShiftNm: values.peak_shift_nm ? { points: curve(t, values.peak_shift_nm) } : null,
          widthFactor: values.width_factor ? { points: curve(t, values.width_factor) } : null
        }
      : { kind, ...(drift ?? { peakDriftNmPerK: Number.NaN }), relativeOutput: curve(t, values.relative_output) };
  const parsed = (kind === 'phosphor' ? phosphorThermalSchema : pumpThermalSchema).safeParse(candidate);
  if (parsed.success) return { ok: true, thermal: parsed.data };
  const errors = parsed.error.issues.map((issue) => {
    const row = issue.path.find((p) => typeof p === 'number');
    const line = typeof row === 'number' ? (lineOf[row] ?? null) : null;
    return { line, message: line === null ? issue.message : `Line ${line}: ${issue.message}` };
  });
  return { ok: false, errors };
}
