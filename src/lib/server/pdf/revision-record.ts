/**
 * The signed record of a formulation revision: what was signed (recipe lines, the recipe per chip bin
 * with each bin's predicted point, target, tolerance and floors), the SHA-256 the signatures bind,
 * and every signature with its meaning (record content after 21 CFR 11.50: name, time, meaning).
 */
import { newDocument, renderToBuffer } from './document';
import { MUTED, Sheet } from './sheet';
import { describeCondition } from '../../aim/condition';
import type { RevisionRecord, SignatureRecord } from '../../formulations/types';

const num = (v: number | null | undefined, d: number) => (v === null || v === undefined || !Number.isFinite(v) ? '—' : v.toFixed(d));
const utc = (d: Date) => `${new Date(d).toISOString().slice(0, 19).replace('T', ' ')} UTC`;

export async function buildRevisionRecord(rev: RevisionRecord, signatures: SignatureRecord[]): Promise<Buffer> {
  const title = `${rev.formulationCode} revision ${rev.revisionNo}`;
  const doc = newDocument('A4', { title: `Revision record ${title}`, subject: rev.formulationName, author: rev.createdByName });
  const sheet = new Sheet(doc, (s) => {
    s.put(`Revision record ${title} (continued)`, s.left, s.y, s.width, { size: 9, bold: true, color: MUTED });
    s.y += 16;
  });
  const c = rev.content;
  sheet.put('Phosforge', sheet.left, sheet.y, 200, { size: 8, color: MUTED });
  sheet.put(`Revision record ${title}`, sheet.left, sheet.y + 10, sheet.width, { size: 18, bold: true });
  sheet.put(`${rev.formulationName} · state: ${rev.state} · generated ${utc(new Date())}`, sheet.left, sheet.y + 34, sheet.width, {
    size: 8.5,
    color: MUTED
  });
  sheet.y += 52;
  sheet.fields([
    ['Target', rev.predicted.target.label],
    ['Holds at', describeCondition(c.condition ?? null)],
    ['Colour tolerance', c.tolerance.kind === 'sdcm' ? `${c.tolerance.steps} steps` : `${c.tolerance.kind} ${c.tolerance.value}`],
    ['Pump', `${c.pump.code} — ${c.pump.name}`],
    ['Silicone system', `${c.silicone.name} (${c.silicone.ratioA}:${c.silicone.ratioB})`],
    ['SHA-256 of the signed content', rev.contentSha256]
  ]);

  sheet.heading('Nominal recipe');
  sheet.table(
    [
      { header: 'Line', width: 30 },
      { header: 'Optical fraction', width: 12, align: 'right' },
      { header: 'wt % of slurry', width: 12, align: 'right' }
    ],
    [
      [`${c.pump.code} leak`, num(c.pumpLeakFraction, 4), '—'],
      ...c.phosphors.map((p) => [`${p.code} — ${p.name}`, num(p.opticalFraction, 4), num(p.wtPct, 4)])
    ]
  );
  sheet.paragraph(
    `Predicted: x ${num(rev.predicted.x, 4)}, y ${num(rev.predicted.y, 4)}, ` +
      `${num(rev.predicted.cct, 0)} K, Duv ${num(rev.predicted.duv, 4)}, ` +
      `Ra ${num(rev.predicted.ra, 1)}, R9 ${num(rev.predicted.r9, 1)}; ${num(rev.predicted.sdcm, 2)} steps from the target.`,
    { size: 8.5 }
  );

  const matrix = c.binRecipes ?? [];
  sheet.heading('Recipe per chip bin');
  if (matrix.length) {
    sheet.table(
      [
        { header: 'Bin', width: 8 },
        { header: 'Range nm', width: 12 },
        ...c.phosphors.map((p) => ({ header: `${p.code} wt %`, width: 11, align: 'right' as const })),
        { header: 'x, y', width: 16 },
        { header: 'CCT', width: 7, align: 'right' },
        { header: 'Ra / R9', width: 10, align: 'right' },
        { header: 'Steps', width: 7, align: 'right' }
      ],
      matrix.map((r) => [
        r.bin.code,
        `${r.bin.fromNm}–${r.bin.toNm} (${r.bin.basis})`,
        ...r.phosphors.map((p) => num(p.wtPct, 3)),
        `${num(r.predicted?.x, 4)}, ${num(r.predicted?.y, 4)}`,
        num(r.predicted?.cct, 0),
        `${num(r.predicted?.ra, 1)} / ${num(r.predicted?.r9, 1)}`,
        num(r.predicted?.steps, 2)
      ])
    );
    sheet.paragraph('Every bin recipe is part of the signed content: the signatures below approve each of them.', { size: 8.5 });
  } else {
    sheet.paragraph('One recipe for every chip (no recipe per chip bin).', { size: 8.5 });
  }

  sheet.heading('Signatures');
  if (signatures.length) {
    sheet.table(
      [
        { header: 'Signed by', width: 22 },
        { header: 'Meaning', width: 14 },
        { header: 'Time', width: 18 },
        { header: 'Comment', width: 30 },
        { header: 'SHA-256 bound', width: 16 }
      ],
      signatures.map((s) => [
        `${s.signerName} (${s.signerEmail})`,
        s.meaning,
        utc(s.signedAt),
        s.comment ?? '—',
        `${s.contentSha256.slice(0, 12)}…${s.contentSha256 === rev.contentSha256 ? ' (this content)' : ' (OTHER CONTENT)'}`
      ])
    );
  } else {
    sheet.paragraph('Not signed yet.', { size: 8.5 });
  }
  return renderToBuffer(doc);
}
