/**
 * Pump bins as typed in a form, one bin per line: "code, from nm, to nm[, share %]" (a semicolon
 * or tab also separates; a decimal comma is read when the fields are separated by semicolons or tabs).
 * Problems are named by line; the whole set is then checked by the schema.
 */
import { pumpBinSetSchema, type PumpBinSet, type WavelengthBasis } from './schema';

export type BinTextResult = { ok: true; set: PumpBinSet } | { ok: false; errors: { line: number | null; message: string }[] };

export function parseBinText(basis: WavelengthBasis, text: string): BinTextResult {
  const errors: { line: number | null; message: string }[] = [];
  const bins: { code: string; fromNm: number; toNm: number; sharePct: number | null }[] = [];
  text.split(/\r?\n/).forEach((raw, i) => {
    const line = i + 1;
    const trimmed = raw.trim();
    if (trimmed === '' || trimmed.startsWith('#')) return;
    const fields = (/[;\t]/.test(trimmed) ? trimmed.split(/[;\t]/).map((f) => f.replace(',', '.')) : trimmed.split(',')).map((f) =>
      f.trim()
    );
    if (fields.length < 3 || fields.length > 4) {
      errors.push({
        line,
        message: `Line ${line}: give "code, from nm, to nm" and optionally a share in % (found ${fields.length} fields).`
      });
      return;
    }
    const [code, from, to, share] = fields;
    const num = (v: string) => (v === '' ? Number.NaN : Number(v));
    if (!Number.isFinite(num(from)) || !Number.isFinite(num(to))) {
      errors.push({ line, message: `Line ${line}: the range "${from}–${to}" is not two numbers in nm.` });
      return;
    }
    if (share !== undefined && share !== '' && !Number.isFinite(num(share.replace('%', '')))) {
      errors.push({ line, message: `Line ${line}: the share "${share}" is not a number.` });
      return;
    }
    bins.push({
      code,
      fromNm: num(from),
      toNm: num(to),
      sharePct: share === undefined || share === '' ? null : num(share.replace('%', ''))
    });
  });
  if (errors.length) return { ok: false, errors };
  if (!bins.length) return { ok: false, errors: [{ line: null, message: 'Give at least one bin: "code, from nm, to nm".' }] };
  const parsed = pumpBinSetSchema.safeParse({ basis, bins });
  if (!parsed.success)
    return {
      ok: false,
      errors: parsed.error.issues.map((issue) => {
        const index = issue.path[0] === 'bins' && typeof issue.path[1] === 'number' ? issue.path[1] : null;
        return { line: null, message: index === null ? issue.message : `Bin ${index + 1} (${bins[index]?.code ?? ''}): ${issue.message}` };
      })
    };
  return { ok: true, set: parsed.data };
}

/** The set as the form shows it again. */
export function binText(set: PumpBinSet): string {
  return set.bins.map((b) => [b.code, b.fromNm, b.toNm, ...(b.sharePct === null ? [] : [b.sharePct])].join(', ')).join('\n');
}
