/**
 * Spectra leave Phosforge as IES TM-27-14 documents (Illuminating Engineering Society, 2014): a
 * material's current emission or excitation spectrum, a revision's predicted SPD, and the parts
 * of a measurement upload (one SpectralDistribution per part). A spectrum that came in as a TM-27
 * file goes out with the header it came with, so the maker's and laboratory's fields travel on;
 * otherwise the header is written from the product's own record.
 */
import { notFound } from '../../errors/domain-error';
import { emptyHeader, TM27_VERSION, writeTm27, type Tm27Document, type Tm27Header, type Tm27Meta } from '../../spectrum-file/tm27';
import * as materials from '../library/records';
import * as spectra from '../library/spectra';
import { getRevision } from '../formulations/read';
import { uploadSpectra } from '../measurements/records';
import { getBatch } from '../batches/read';
import { describeCondition } from '../../aim/condition';

export interface Tm27Export {
  fileName: string;
  xml: string;
}

const CREATOR = 'Phosforge';
const today = () => new Date().toISOString().slice(0, 10);
const safe = (s: string) => s.replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-+|-+$/g, '') || 'spectrum';

function header(fields: Partial<Tm27Header>): Tm27Header {
  return { ...emptyHeader(), documentCreator: CREATOR, documentCreationDate: today(), ...fields };
}

const plain = (
  wavelengths: number[],
  values: number[],
  kept?: Tm27Meta['distributions'][number]
): Tm27Document['distributions'][number] => ({
  spectralQuantity: kept?.spectralQuantity ?? 'relative',
  reflectionGeometry: kept?.reflectionGeometry ?? null,
  transmissionGeometry: kept?.transmissionGeometry ?? null,
  bandwidthFwhmNm: kept?.bandwidthFwhmNm ?? null,
  bandwidthCorrected: kept?.bandwidthCorrected ?? null,
  extra: kept?.extra ?? [],
  wavelengths,
  values
});

export async function materialSpectrumTm27(
  materialId: number,
  kind: 'emission' | 'excitation',
  materialKind: 'pump' | 'phosphor'
): Promise<Tm27Export> {
  const m = await materials.get(materialId);
  if (!m || m.kind !== materialKind) throw notFound(`No ${materialKind} with id ${materialId}.`);
  const spectrumId = kind === 'emission' ? m.emissionSpectrumId : m.excitationSpectrumId;
  if (spectrumId === null) throw notFound(`${m.code} has no ${kind} spectrum yet.`);
  const s = await spectra.get(spectrumId);
  if (!s) throw notFound(`${m.code} has no ${kind} spectrum yet.`);
  const kept = s.tm27;
  const doc: Tm27Document = {
    version: kept?.version ?? TM27_VERSION,
    header:
      kept?.header ??
      header({
        manufacturer: m.supplier,
        catalogNumber: m.code,
        description: `${m.name}: ${kind} spectrum (relative)`,
        uniqueIdentifier: `material-${m.id}-spectrum-${s.id}`,
        comments: `${m.kind === 'pump' ? 'Pump' : 'Phosphor'} ${m.code} in the Phosforge library; spectrum version ${s.id}.`
      }),
    distributions: [plain(s.wavelengths, s.values, kept?.distributions[0])]
  };
  return { fileName: `${safe(m.code)}-${kind}.xml`, xml: writeTm27(doc) };
}

export async function revisionSpectrumTm27(formulationId: number, revisionId: number): Promise<Tm27Export> {
  const rev = await getRevision(revisionId);
  if (!rev || rev.formulationId !== formulationId) throw notFound('No such revision of this formulation.');
  const spd = rev.predicted.spd;
  const wavelengths = spd.values.map((_, i) => spd.startNm + i * spd.stepNm);
  const condition = rev.content.condition ? ` at ${describeCondition(rev.content.condition)}` : '';
  const doc: Tm27Document = {
    version: TM27_VERSION,
    header: header({
      catalogNumber: `${rev.formulationCode} rev ${rev.revisionNo}`,
      description:
        `Predicted SPD of ${rev.formulationName} (${rev.formulationCode} rev ${rev.revisionNo}), ` +
        `aimed at ${rev.predicted.target.label}${condition}`,
      uniqueIdentifier: `revision-${rev.id}-${rev.contentSha256.slice(0, 16)}`,
      comments: `Computed by ${rev.coreVersion}; content SHA-256 ${rev.contentSha256}; state ${rev.state}. A prediction, not a measurement.`
    }),
    distributions: [plain(wavelengths, spd.values)]
  };
  return { fileName: `${safe(rev.formulationCode)}-rev${rev.revisionNo}-predicted.xml`, xml: writeTm27(doc) };
}

export async function uploadSpectraTm27(batchId: number, uploadId: number): Promise<Tm27Export> {
  const [detail, upload] = await Promise.all([getBatch(batchId), uploadSpectra(batchId, uploadId)]);
  if (!detail || !upload) throw notFound('No such measurement upload of this batch.');
  if (upload.parts.length === 0) throw notFound('This upload holds no parts.');
  const kept = upload.tm27Json ? (JSON.parse(upload.tm27Json) as Tm27Meta) : null;
  const bn = detail.batch.batchNumber;
  const doc: Tm27Document = {
    version: kept?.version ?? TM27_VERSION,
    header:
      kept?.header ??
      header({
        catalogNumber: detail.revision ? `${detail.revision.formulationCode} rev ${detail.revision.revisionNo}` : null,
        description: `Parts of batch ${bn} measured in ${upload.name}: ${upload.parts.map((p) => p.label).join(', ')}`.slice(0, 2000),
        uniqueIdentifier: `batch-${bn}-upload-${uploadId}`
      }),
    distributions: upload.parts.map((p, i) => plain(upload.wavelengths, p.values, kept?.distributions[i]))
  };
  return { fileName: `${safe(bn)}-upload${uploadId}.xml`, xml: writeTm27(doc) };
}

/** The HTTP response of an export: an XML attachment. */
export function tm27Response(e: Tm27Export): Response {
  return new Response(e.xml, {
    headers: {
      'content-type': 'application/xml; charset=utf-8',
      'content-disposition': `attachment; filename="${e.fileName}"`,
      'x-content-type-options': 'nosniff'
    }
  });
}
