/**
 * One field of a data row as a number (zod). Accepts plain and exponent notation with the
 * file's decimal mark; refuses anything else (units, thousands separators, NaN, Infinity).
 */
import { z } from 'zod';
import type { SpectrumFileDialect } from './types';

const POINT_NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
const COMMA_NUMBER = /^[+-]?(\d+,?\d*|,\d+)([eE][+-]?\d+)?$/;

/** True when the trimmed field reads as a number in either decimal convention. */
export function looksNumeric(field: string): boolean {
  const t = field.trim();
  return POINT_NUMBER.test(t) || COMMA_NUMBER.test(t);
}

/** A field as quoted in a message: at most 24 characters (a field may be a whole megabyte of text). */
export function shownField(s: string): string {
  return s.length > 24 ? `${s.slice(0, 24)}…` : s;
}

/** One field as a number, or the reason it is not one (plain function: wide multi-part files have ~10⁵ fields). */
export function readNumberCell(
  raw: string,
  decimal: SpectrumFileDialect['decimal']
): { ok: true; value: number } | { ok: false; message: string } {
  const s = raw.trim();
  if (s === '') return { ok: false, message: 'is empty' };
  const pattern = decimal === 'comma' ? COMMA_NUMBER : POINT_NUMBER;
  const n = pattern.test(s) ? Number(decimal === 'comma' ? s.replace(',', '.') : s) : NaN;
  if (!Number.isFinite(n)) {
    return { ok: false, message: `"${shownField(s)}" is not a number${decimal === 'comma' ? ' (decimal comma expected)' : ''}` };
  }
  return { ok: true, value: n };
}

export function numberCell(decimal: SpectrumFileDialect['decimal']) {
  return z.string().transform((raw, ctx) => {
    const r = readNumberCell(raw, decimal);
    if (r.ok) return r.value;
    ctx.addIssue({ code: 'custom', message: r.message });
    return z.NEVER;
  });
}
