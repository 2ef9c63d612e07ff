/**
 * Spectrum upload: the file is read and validated completely before anything is written
 * (parser: src/lib/spectrum-file/parse.ts; then the spectral core's own input rules). Only a
 * valid file is stored: original to object storage, parsed spectrum to material_spectra, the
 * material's pointer, peak and FWHM updated — one transaction; the object is removed if it fails.
 */
import { writeTransaction } from '../db/transaction';
import { emissionCoverage } from '../../library/spectrum-coverage';
import * as audit from '../db/audit';
import { putFile } from '../storage/objects';
import { DEFAULT_MAX_BYTES, formatBytes } from '../../spectrum-file/parse';
import { parseSpectrumUpload } from '../../spectrum-file/read-upload';
import { EMITTED_QUANTITIES, type Tm27Meta } from '../../spectrum-file/tm27';
import { decodeText } from '../../spectrum-file/decode';
import { summariseSpectrum, type SpectrumSummary } from '../../library/spectrum-summary';
import { SpectrumInputError } from '../../spectral/errors';
import { invalid, lineIssue, tooLarge, unprocessable } from '../../errors/domain-error';
import { notFound } from './errors';
import { lockForEdit } from './editing';
import * as records from './records';
import * as spectra from './spectra';
import type { Spd } from '../../spectral/types';
import type { User } from '../accounts/users';
import type { SpectrumKind } from './spectra';

export interface SpectrumFileInput {
  name: string;
  contentType: string;
  body: Buffer;
}

export interface SpectrumPreview {
  spd: Spd;
  summary: SpectrumSummary;
  warnings: string[];
  fileName: string;
  /** Header of an IES TM-27 file, kept with the spectrum; null for CSV/TXT. */
  tm27: Tm27Meta | null;
}

/**
 * Parses and checks a file; throws a domain error (413/422) naming the lines. Saves nothing.
 * An emission file must hold its whole band (../../library/spectrum-coverage.ts).
 */
export function previewSpectrumFile(file: SpectrumFileInput, kind: SpectrumKind = 'emission'): SpectrumPreview {
  if (file.body.length === 0) throw unprocessable('The file is empty.');
  if (file.body.length > DEFAULT_MAX_BYTES) {
    throw tooLarge(`The file is ${formatBytes(file.body.length)}; the limit is ${formatBytes(DEFAULT_MAX_BYTES)}. Nothing was saved.`);
  }
  // An emission spectrum is emitted light; an excitation spectrum may be stated as absorptance too (IES TM-27-14 quantities).
  const quantities = kind === 'emission' ? EMITTED_QUANTITIES : [...EMITTED_QUANTITIES, 'absorptance' as const, 'other' as const];
  const parsed = parseSpectrumUpload(decodeText(file.body), { quantities });
  if (!parsed.ok) {
    const n = parsed.errors.length;
    throw unprocessable(
      `${file.name} was not saved: ${n === 1 ? 'one problem' : `${n} problems`} in the file. ${parsed.errors[0].message}`,
      parsed.errors.map((e) => lineIssue(e.line, e.message))
    );
  }
  const spd = { wavelengths: parsed.wavelengths, values: parsed.columns[0].values };
  const coverage = kind === 'emission' ? emissionCoverage(spd) : { refusal: null, warnings: [] };
  if (coverage.refusal) throw unprocessable(`${file.name} was not saved: ${coverage.refusal}.`, [lineIssue(null, coverage.refusal)]);
  try {
    return {
      spd,
      summary: summariseSpectrum(spd),
      warnings: [...parsed.warnings, ...coverage.warnings],
      fileName: file.name,
      tm27: parsed.tm27
    };
  } catch (err) {
    if (err instanceof SpectrumInputError)
      throw unprocessable(`${file.name} was not saved: ${err.message}.`, [lineIssue(null, err.message)]);
    throw err;
  }
}

/** Stores a checked spectrum file as the material's current emission or excitation spectrum. Returns the new version. */
export async function uploadSpectrum(
  actor: User,
  materialId: number,
  kind: SpectrumKind,
  file: SpectrumFileInput,
  version?: number
): Promise<{ spectrumId: number; version: number; preview: SpectrumPreview }> {
  const material = await records.get(materialId);
  if (!material) throw notFound(materialId);
  if (kind === 'excitation' && material.kind === 'pump') throw invalid('A pump has an emission spectrum only.');
  const preview = previewSpectrumFile(file, kind);
  return writeTransaction(async (trx) => {
    const current = await lockForEdit(trx, materialId, version, 'given a new spectrum');
    const fileId = await putFile(
      {
        body: file.body,
        originalName: file.name,
        contentType: file.contentType || 'text/plain',
        purpose: 'spectrum-source',
        entityType: 'material',
        entityId: materialId,
        uploadedBy: actor.id
      },
      trx
    );
    const spectrumId = await spectra.insert(
      { materialId, kind, spd: preview.spd, sourceFileId: fileId, origin: 'upload', createdBy: actor.id, tm27: preview.tm27 },
      trx
    );
    const shape = kind === 'emission' ? { peak_nm: round2(preview.summary.peakNm), fwhm_nm: round2(preview.summary.fwhmNm) } : {};
    await trx('materials')
      .where({ id: materialId, version: current.version })
      .update({
        [kind === 'emission' ? 'emission_spectrum_id' : 'excitation_spectrum_id']: spectrumId,
        ...shape,
        version: current.version + 1,
        updated_by: actor.id,
        updated_at: trx.fn.now(3)
      });
    await audit.record(
      {
        actorId: actor.id,
        actorEmail: actor.email,
        entityType: 'material',
        entityId: materialId,
        action: `${kind}-spectrum-upload`,
        before:
          kind === 'emission'
            ? { peakNm: current.peakNm, fwhmNm: current.fwhmNm, spectrumId: current.emissionSpectrumId }
            : { spectrumId: current.excitationSpectrumId },
        after: {
          spectrumId,
          file: file.name,
          points: preview.spd.wavelengths.length,
          ...(kind === 'emission' ? { peakNm: shape.peak_nm, fwhmNm: shape.fwhm_nm } : {})
        }
      },
      trx
    );
    return { spectrumId, version: current.version + 1, preview };
  });
}

const round2 = (v: number) => Math.round(v * 100) / 100;
