/**
 * The final batch record: targets against actual readings with lots, who weighed each line and
 * when, flagged lines with the quality decision and reason, slurry times, completion, and an
 * optional measurement summary section (added by the quality feature). Stored in object storage
 * when a batch is completed; fields after ISO 9001:2015 §7.5 / §8.5.2 batch-record practice.
 */
import { newDocument, renderToBuffer, type PaperSize } from './document';
import { headerFields, stamp, type BatchDoc, type MeasurementSummary } from './batch-doc';
import { WEIGHOUT_CAUTION_TITLE, weighoutCautions } from './cautions';
import { MUTED, Sheet } from './sheet';

const STATUS_TEXT = { in: 'in range', below: 'BELOW RANGE', above: 'ABOVE RANGE' } as const;

export interface BatchRecordOptions {
  size?: PaperSize;
  measurementSummary?: MeasurementSummary | null;
}

export async function buildBatchRecord(d: BatchDoc, opts: BatchRecordOptions = {}): Promise<Buffer> {
  const doc = newDocument(opts.size ?? 'A4', {
    title: `Batch record ${d.batchNumber}`,
    subject: `${d.formulation.code} revision ${d.formulation.revisionNo}`,
    author: d.process.completedBy ?? d.createdBy
  });
  const sheet = new Sheet(doc, (s) => {
    s.put(`Batch record ${d.batchNumber} (continued)`, s.left, s.y, s.width, { size: 9, bold: true, color: MUTED });
    s.y += 16;
  });
  sheet.put('Phosforge', sheet.left, sheet.y, 200, { size: 8, color: MUTED });
  sheet.put(`Batch record ${d.batchNumber}`, sheet.left, sheet.y + 10, sheet.width, { size: 18, bold: true });
  sheet.put(`State: ${d.state} · generated ${stamp(d, new Date())}`, sheet.left, sheet.y + 34, sheet.width, { size: 8.5, color: MUTED });
  sheet.y += 52;
  headerFields(sheet, d);

  sheet.heading('Targets and actual readings');
  sheet.table(
    [
      { header: '#', width: 3, align: 'right' },
      { header: 'Material', width: 17 },
      { header: 'Lot', width: 14 },
      { header: 'Target g', width: 9, align: 'right' },
      { header: 'Allowed range g', width: 14, align: 'center' },
      { header: 'Actual g', width: 9, align: 'right' },
      { header: 'Check', width: 10 },
      { header: 'Weighed by, time', width: 17 }
    ],
    d.lines.map((l) => [
      String(l.seq),
      `${l.code} — ${l.name}${l.loadingLabel ? ` (${l.loadingLabel})` : ''}`,
      l.actual?.lotNumber ?? '—',
      l.targetG,
      `${l.lowG} – ${l.highG}`,
      l.actual?.actualG ?? '—',
      l.actual?.status ? STATUS_TEXT[l.actual.status] + (l.actual.override ? ', accepted by quality' : '') : 'not weighed',
      l.actual?.weighedBy ? `${l.actual.weighedBy}, ${stamp(d, l.actual.weighedAt)}` : '—'
    ])
  );

  const flagged = d.lines.filter((l) => l.actual?.status && l.actual.status !== 'in');
  sheet.heading('Deviations');
  if (flagged.length === 0) sheet.paragraph('None: every reading was inside its allowed range.', { size: 9 });
  for (const l of flagged) {
    const a = l.actual!;
    const decision = a.override
      ? `Accepted by ${a.override.by} on ${stamp(d, a.override.at)}. Reason: ${a.override.reason}`
      : 'No quality decision recorded.';
    sheet.paragraph(
      `Line ${l.seq} ${l.code}: ${a.actualG} g is ` +
        `${STATUS_TEXT[a.status!].toLowerCase()} ${l.lowG} – ${l.highG} g (target ` +
        `${l.targetG} g). ${decision}`,
      { size: 9 }
    );
  }

  sheet.heading('Slurry and completion');
  sheet.fields([
    ['Part B mixed in at', stamp(d, d.process.mixedAt)],
    ['Use slurry before', stamp(d, d.process.expiresAt)],
    [
      'Weigh-out completed',
      d.process.completedAt ? `${stamp(d, d.process.completedAt)} by ${d.process.completedBy ?? '—'}` : 'not completed'
    ]
  ]);
  if (d.process.completedAt && d.process.expiresAt && d.process.completedAt > d.process.expiresAt) {
    sheet.paragraph('Completed after the slurry-age limit: the slurry must not be used without a quality decision.', {
      size: 9,
      bold: true,
      color: '#b42318'
    });
  }
  if (d.notes) sheet.paragraph(`Notes: ${d.notes}`, { size: 9 });

  if (opts.measurementSummary) {
    const m = opts.measurementSummary;
    sheet.heading(m.title);
    sheet.fields(m.rows.map((r) => [r.label, r.value] as [string, string]));
    if (m.note) sheet.paragraph(m.note, { size: 8.5, color: MUTED });
  }

  sheet.heading('Signatures', 132);
  sheet.signatures(
    ['Prepared by', 'Checked by', 'Quality disposition'],
    [d.process.completedBy ? `Completed in Phosforge by ${d.process.completedBy}` : null]
  );
  sheet.boxed(WEIGHOUT_CAUTION_TITLE, d.cautions ?? weighoutCautions([]), '#9c4309');
  sheet.footers(`${d.batchNumber} · ${d.formulation.code} rev. ${d.formulation.revisionNo} · batch record`);
  return renderToBuffer(doc);
}
