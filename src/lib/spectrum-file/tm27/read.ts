/**
 * Reader of IES TM-27-14 spectral data documents (XML; Illuminating Engineering Society, 2014).
 * Well-formedness is checked by fast-xml-parser's validator (its line and column are reported);
 * then the document's elements are checked one by one and every spectral point goes through the
 * same spectrum rules as a CSV upload (../table-schema.ts), so a bad point names its file line.
 * Several SpectralDistribution elements in one document become several columns (parts); they
 * must share one wavelength grid. Pure: no I/O, runs on the server and in the browser.
 */
import { XMLParser, XMLValidator } from 'fast-xml-parser';
import { spectrumSchema, type NumericRow } from '../table-schema';
import type { ParseOptions, SpectrumFileError, SpectrumFileOk } from '../types';
import {
  emptyHeader,
  HEADER_FIELDS,
  SPECTRAL_QUANTITIES,
  type ExtraElement,
  type SpectralQuantity,
  type Tm27Distribution,
  type Tm27Header,
  type Tm27Meta
} from './document';

/** A read document: the same numbers as a table upload, no table dialect, and what the document kept. */
export type Tm27FileOk = Omit<SpectrumFileOk, 'dialect'> & { dialect: null; tm27: Tm27Meta };
export type Tm27FileResult = Tm27FileOk | { ok: false; errors: SpectrumFileError[] };

const DEFAULT_MIN_POINTS = 20;
const DEFAULT_MAX_POINTS = 20_000;
const KNOWN_DISTRIBUTION_ELEMENTS = new Set([
  'SpectralQuantity',
  'ReflectionGeometry',
  'TransmissionGeometry',
  'BandwidthFWHM',
  'BandwidthCorrected',
  'SpectralData'
]);

/** True when the text is an XML document whose root element is IESTM2714. */
export function looksLikeTm27(text: string): boolean {
  const head = text.replace(/^\uFEFF/, '').slice(0, 4096);
  return /^\s*(<\?xml[^>]*\?>\s*)?(<!--[\s\S]*?-->\s*|<\?[^>]*\?>\s*)*<([\w.-]+:)?IESTM2714[\s>]/.test(head);
}

type Node = Record<string, unknown>;

const parser = new XMLParser({
  ignoreAttributes: false,
  attributeNamePrefix: '@_',
  removeNSPrefix: true,
  parseTagValue: false,
  parseAttributeValue: false,
  trimValues: true,
  isArray: (name) => name === 'SpectralDistribution' || name === 'SpectralData'
});

const fail = (errors: SpectrumFileError[]): Tm27FileResult => ({ ok: false, errors });
const whole = (message: string): SpectrumFileError => ({ line: null, message });

function textOf(v: unknown): string | null {
  if (v === undefined || v === null) return null;
  if (typeof v === 'string') return v;
  if (typeof v === 'number' || typeof v === 'boolean') return String(v);
  if (typeof v === 'object' && '#text' in (v as Node)) return String((v as Node)['#text']);
  return '';
}

function extrasOf(node: Node, known: Set<string>): ExtraElement[] {
  return Object.entries(node)
    .filter(([k]) => !known.has(k) && !k.startsWith('@_') && k !== '#text')
    .flatMap(([name, v]) => (Array.isArray(v) ? v : [v]).map((x) => ({ name, text: textOf(x) ?? '' })));
}

/** 1-based line of every <SpectralData element, in document order. */
function spectralDataLines(text: string): number[] {
  const lines: number[] = [];
  const re = /<([\w.-]+:)?SpectralData[\s>/]/g;
  let line = 1;
  let from = 0;
  for (let m = re.exec(text); m; m = re.exec(text)) {
    for (let i = from; i < m.index; i++) if (text.charCodeAt(i) === 10) line++;
    from = m.index;
    lines.push(line);
  }
  return lines;
}

function readHeader(node: Node | undefined, errors: SpectrumFileError[]): Tm27Header {
  const header = emptyHeader();
  if (!node || typeof node !== 'object') {
    errors.push(
      whole('The document has no Header element (IES TM-27-14 requires one, with Description, DocumentCreator and DocumentCreationDate).')
    );
    return header;
  }
  // Older writers name the document creator FileCreator; it is read as DocumentCreator.
  const source: Node = { ...node };
  if (source.DocumentCreator === undefined && source.FileCreator !== undefined) {
    source.DocumentCreator = source.FileCreator;
    delete source.FileCreator;
  }
  for (const f of HEADER_FIELDS) {
    const t = textOf(source[f.element]);
    header[f.key] = t === null || t === '' ? null : t;
    if (f.required && header[f.key] === null)
      errors.push(whole(`Header: the ${f.element} element is missing or empty (required by IES TM-27-14).`));
  }
  header.extra = extrasOf(source, new Set(HEADER_FIELDS.map((f) => f.element)));
  return header;
}

function readNumber(raw: string | null): number | null {
  if (raw === null) return null;
  const s = raw.trim();
  if (s === '') return null;
  const n = Number(s);
  return Number.isFinite(n) ? n : null;
}

function readDistribution(node: Node, index: number, lines: number[], cursor: { i: number }, errors: SpectrumFileError[]) {
  const where = `SpectralDistribution ${index + 1}`;
  const quantity = textOf(node.SpectralQuantity);
  if (!quantity) errors.push(whole(`${where}: the SpectralQuantity element is missing (required by IES TM-27-14).`));
  else if (!(SPECTRAL_QUANTITIES as readonly string[]).includes(quantity))
    errors.push(whole(`${where}: SpectralQuantity "${quantity}" is not one of ${SPECTRAL_QUANTITIES.join(', ')}.`));
  const fwhmText = textOf(node.BandwidthFWHM);
  const fwhm = readNumber(fwhmText);
  if (fwhmText !== null && fwhmText !== '' && (fwhm === null || fwhm < 0))
    errors.push(whole(`${where}: BandwidthFWHM "${fwhmText}" is not a non-negative number of nanometres.`));
  const correctedText = textOf(node.BandwidthCorrected);
  let corrected: boolean | null = null;
  if (correctedText !== null && correctedText !== '') {
    if (/^(true|1)$/i.test(correctedText)) corrected = true;
    else if (/^(false|0)$/i.test(correctedText)) corrected = false;
    else errors.push(whole(`${where}: BandwidthCorrected "${correctedText}" is not true or false.`));
  }
  const data = (node.SpectralData as unknown[] | undefined) ?? [];
  if (data.length === 0) errors.push(whole(`${where}: no SpectralData elements.`));
  const points: { line: number | null; wavelength: number; value: number }[] = [];
  for (const d of data) {
    const line = lines[cursor.i++] ?? null;
    const at = line === null ? `${where}` : `Line ${line}`;
    const wlText = typeof d === 'object' && d !== null ? textOf((d as Node)['@_wavelength']) : null;
    const wl = readNumber(wlText);
    const valueText = textOf(d);
    const value = readNumber(valueText);
    if (wl === null) {
      errors.push({ line, message: `${at}: SpectralData needs a numeric wavelength attribute (nm); found "${wlText ?? ''}".` });
      continue;
    }
    if (value === null) {
      errors.push({ line, message: `${at}: the value at ${wl} nm is "${valueText ?? ''}", not a number.` });
      continue;
    }
    points.push({ line, wavelength: wl, value });
  }
  const distribution: Omit<Tm27Distribution, 'wavelengths' | 'values'> = {
    spectralQuantity: (quantity ?? 'other') as SpectralQuantity,
    reflectionGeometry: textOf(node.ReflectionGeometry) || null,
    transmissionGeometry: textOf(node.TransmissionGeometry) || null,
    bandwidthFwhmNm: fwhm,
    bandwidthCorrected: corrected,
    extra: extrasOf(node, KNOWN_DISTRIBUTION_ELEMENTS)
  };
  return { distribution, points };
}

/** Reads a TM-27 document; refuses it as a whole, naming the element or line of each problem. */
export function parseTm27(text: string, options: ParseOptions = {}): Tm27FileResult {
  const valid = XMLValidator.validate(text);
  if (valid !== true) {
    const { line, col, msg } = valid.err;
    return fail([{ line, message: `Line ${line}, column ${col}: the XML is not well formed: ${msg}` }]);
  }
  let doc: Node;
  try {
    doc = parser.parse(text) as Node;
  } catch (err) {
    return fail([whole(`The XML could not be read: ${err instanceof Error ? err.message : String(err)}`)]);
  }
  const root = doc.IESTM2714 as Node | undefined;
  if (!root || typeof root !== 'object')
    return fail([whole('The root element is not IESTM2714; this is not an IES TM-27 spectral data document.')]);
  const errors: SpectrumFileError[] = [];
  const version = textOf(root['@_version']) || '1.0';
  const header = readHeader(root.Header as Node | undefined, errors);
  const nodes = (root.SpectralDistribution as Node[] | undefined) ?? [];
  if (nodes.length === 0) errors.push(whole('The document has no SpectralDistribution element.'));
  const lines = spectralDataLines(text);
  const cursor = { i: 0 };
  const read = nodes.map((n, i) => readDistribution(typeof n === 'object' && n !== null ? n : {}, i, lines, cursor, errors));
  if (errors.length) return fail(errors);

  // Every distribution on the first one's wavelengths, in ascending order.
  const order = <P extends { wavelength: number }>(pts: P[]): P[] => [...pts].sort((a, b) => a.wavelength - b.wavelength);
  const first = order(read[0].points);
  for (let k = 1; k < read.length; k++) {
    const other = order(read[k].points);
    const same = other.length === first.length && other.every((p, i) => p.wavelength === first[i].wavelength);
    if (!same)
      return fail([
        whole(
          `SpectralDistribution ${k + 1} has other wavelengths than SpectralDistribution 1 ` +
            `(${other.length} points from ${other[0]?.wavelength} nm, against ${first.length} from ${first[0]?.wavelength} nm); ` +
            'several spectra in one file must share one wavelength grid.'
        )
      ]);
  }
  const sorted = read.map((r) => order(r.points));
  const rows: NumericRow[] = first.map((p, i) => ({ line: p.line ?? 0, values: [p.wavelength, ...sorted.map((s) => s[i].value)] }));
  const base = header.uniqueIdentifier ?? header.catalogNumber ?? header.description ?? 'spectrum';
  const names = ['wavelength', ...read.map((_, k) => (read.length === 1 ? base : `${base} ${k + 1}`).slice(0, 80))];
  const limits = { minPoints: options.minPoints ?? DEFAULT_MIN_POINTS, maxPoints: options.maxPoints ?? DEFAULT_MAX_POINTS };
  const checked = spectrumSchema(names, limits).safeParse(rows);
  if (!checked.success)
    return fail(
      checked.error.issues.map((issue) => {
        const i = typeof issue.path[0] === 'number' ? issue.path[0] : null;
        const line = i === null ? null : rows[i].line || null;
        return { line, message: line ? `Line ${line}: ${issue.message}.`.replace(/\.\.$/, '.') : issue.message };
      })
    );
  const warnings = [
    `Read as an IES TM-27 document (version ${version}) with ${read.length} spectral distribution${read.length === 1 ? '' : 's'}.`
  ];
  const columns = names.slice(1).map((name, k) => {
    const values = checked.data.map((r) => r.values[k + 1]);
    const clamped = values.filter((v) => v < 0).length;
    if (clamped)
      warnings.push(`${clamped} small negative value${clamped === 1 ? '' : 's'} in ${name} (noise, within 1 % of the maximum) set to 0.`);
    return { name, values: values.map((v) => (v < 0 ? 0 : v)) };
  });
  if (!options.multiColumn && columns.length > 1)
    return fail([whole(`The document holds ${columns.length} spectral distributions; this upload takes one.`)]);
  return {
    ok: true,
    wavelengths: checked.data.map((r) => r.values[0]),
    columns,
    warnings,
    dialect: null,
    tm27: { version, header, distributions: read.map((r) => r.distribution) }
  };
}
