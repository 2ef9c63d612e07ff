/** Result types of the spectrum-file parser (plain data, crosses the server/browser boundary as JSON). */

/** One problem, with the 1-based line of the file it concerns (null = the whole file). */
export interface SpectrumFileError {
  line: number | null;
  message: string;
}

export interface SpectrumColumn {
  /** From the header row, or "intensity" / "column N" when the file has none. */
  name: string;
  values: number[];
}

export interface SpectrumFileOk {
  ok: true;
  /** Strictly increasing wavelengths (nm). */
  wavelengths: number[];
  /** One intensity column (two-column files) or several (multiColumn). */
  columns: SpectrumColumn[];
  /** Things the parser decided or corrected that the user should know about. */
  warnings: string[];
  dialect: SpectrumFileDialect;
}

export interface SpectrumFileFailed {
  ok: false;
  errors: SpectrumFileError[];
}

export type SpectrumFileResult = SpectrumFileOk | SpectrumFileFailed;

export interface SpectrumFileDialect {
  delimiter: 'comma' | 'semicolon' | 'tab' | 'whitespace';
  decimal: 'point' | 'comma';
  /** Line of the header row, or null when the file starts with data. */
  headerLine: number | null;
}

export interface ParseOptions {
  /** Size limit in bytes (UTF-8); default 2 MB. */
  maxBytes?: number;
  /** Accept several intensity columns (one wavelength column first). Default false: exactly two columns. */
  multiColumn?: boolean;
  /** Fewest data points accepted; default 20. */
  minPoints?: number;
  /** Most data rows accepted; default 20 000. */
  maxPoints?: number;
}
