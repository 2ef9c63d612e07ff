/**
 * IES TM-27-14, "IES Standard Format for the Electronic Transfer of Spectral Data" (Illuminating
 * Engineering Society, 2014): the parts of a spectral data document Phosforge reads and writes.
 * Header fields keep the standard's element names; elements the product has no field for are kept
 * verbatim (`extra`) so a file read and written again loses nothing.
 */

export const TM27_NAMESPACE = 'http://www.ies.org/iestm2714';
export const TM27_VERSION = '1.0';

/** Header elements in the order the standard lists them; the required ones are marked. */
export const HEADER_FIELDS = [
  { element: 'Manufacturer', key: 'manufacturer', required: false },
  { element: 'CatalogNumber', key: 'catalogNumber', required: false },
  { element: 'Description', key: 'description', required: true },
  { element: 'DocumentCreator', key: 'documentCreator', required: true },
  { element: 'UniqueIdentifier', key: 'uniqueIdentifier', required: false },
  { element: 'MeasurementEquipment', key: 'measurementEquipment', required: false },
  { element: 'Laboratory', key: 'laboratory', required: false },
  { element: 'ReportNumber', key: 'reportNumber', required: false },
  { element: 'ReportDate', key: 'reportDate', required: false },
  { element: 'DocumentCreationDate', key: 'documentCreationDate', required: true },
  { element: 'Comments', key: 'comments', required: false }
] as const;

export type HeaderKey = (typeof HEADER_FIELDS)[number]['key'];

/** An element kept as it was read: its name and text. */
export interface ExtraElement {
  name: string;
  text: string;
}

export type Tm27Header = { [K in HeaderKey]: string | null } & { extra: ExtraElement[] };

/** Values of SpectralQuantity the standard allows. */
export const SPECTRAL_QUANTITIES = [
  'absorptance',
  'exitance',
  'flux',
  'intensity',
  'irradiance',
  'radiance',
  'reflectance',
  'relative',
  'transmittance',
  'R-Factor',
  'T-Factor',
  'other'
] as const;
export type SpectralQuantity = (typeof SPECTRAL_QUANTITIES)[number];

/** Quantities that describe emitted light (an emission spectrum or a measured part). */
export const EMITTED_QUANTITIES: readonly SpectralQuantity[] = ['exitance', 'flux', 'intensity', 'irradiance', 'radiance', 'relative'];

export interface Tm27Distribution {
  spectralQuantity: SpectralQuantity;
  reflectionGeometry: string | null;
  transmissionGeometry: string | null;
  bandwidthFwhmNm: number | null;
  bandwidthCorrected: boolean | null;
  extra: ExtraElement[];
  wavelengths: number[];
  values: number[];
}

export interface Tm27Document {
  version: string;
  header: Tm27Header;
  distributions: Tm27Distribution[];
}

/** What a parsed file keeps of its document besides the numbers (stored beside the spectrum). */
export interface Tm27Meta {
  version: string;
  header: Tm27Header;
  distributions: Omit<Tm27Distribution, 'wavelengths' | 'values'>[];
}

export function emptyHeader(): Tm27Header {
  const h = { extra: [] } as unknown as Tm27Header;
  for (const f of HEADER_FIELDS) h[f.key] = null;
  return h;
}
