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

export function numberCell(decimal: SpectrumFileDialect['decimal']) {
  const pattern = decimal === 'comma' ? COMMA_NUMBER : POINT_NUMBER;
  return z.string().transform((raw, ctx) => {
    const s = raw.trim();
    if (s === '') {
      ctx.addIssue({ code: 'custom', message: 'is empty' });
      return z.NEVER;
    }
    const n = pattern.test(s) ? Number(decimal === 'comma' ? s.replace(',', '.') : s) : NaN;
    if (!Number.isFinite(n)) {
      const shown = s.length > 24 ? `${s.slice(0, 24)}…` : s;
      ctx.addIssue({ code: 'custom', message: `"${shown}" is not a number${decimal === 'comma' ? ' (decimal comma expected)' : ''}` });
      return z.NEVER;
    }
    return n;
  });
}
