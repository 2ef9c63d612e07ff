/** Spectra, lots and edit history of a material as pages show them (read on the server). */
import type { Spd } from '../spectral/types';
import type { Tm27Meta } from '../spectrum-file/tm27/document';

export const SPECTRUM_KINDS = ['emission', 'excitation'] as const;
export type SpectrumKind = (typeof SPECTRUM_KINDS)[number];

export interface StoredSpectrum extends Spd {
  id: number;
  materialId: number;
  kind: SpectrumKind;
  points: number;
  minNm: number;
  maxNm: number;
  sourceFileId: number | null;
  sourceFileName: string | null;
  origin: string;
  createdBy: number | null;
  createdByName: string | null;
  createdAt: Date;
  /** IES TM-27 header of the source file, when the spectrum came from one (null otherwise or in lists). */
  tm27: Tm27Meta | null;
}

export interface Lot {
  id: number;
  materialId: number;
  lotNumber: string;
  supplier: string | null;
  receivedOn: string | null;
  expiresOn: string | null;
  certificateFileId: number | null;
  certificateName: string | null;
  notes: string | null;
  createdByName: string | null;
  createdAt: Date;
}

export interface HistoryEntry {
  id: number;
  at: Date;
  actor: string;
  action: string;
  /** "field: old → new" lines, or a short description of the event. */
  changes: string[];
}
