/**
 * Characters that must not appear in names, codes, lot numbers and file names: control characters
 * (C0 U+0000–U+001F, DEL U+007F, C1 U+0080–U+009F; Unicode 15 §23.1) and the bidirectional
 * formatting characters that reorder what is shown (LRE/RLE/PDF/LRO/RLO U+202A–U+202E, LRI/RLI/
 * FSI/PDI U+2066–U+2069, LRM/RLM U+200E/U+200F, ALM U+061C; Unicode UAX #9 §2). A name with U+202E
 * shows "report<U+202E>fdp.exe" as "reportexe.pdf". Multi-line fields (notes) may keep tab and line breaks.
 * Pure: used by the zod schemas of every feature.
 */

const BIDI = /[\u061C\u200E\u200F\u202A-\u202E\u2066-\u2069]/u;
// eslint-disable-next-line no-control-regex
const CONTROL = /[\u0000-\u001F\u007F-\u009F]/u;
// eslint-disable-next-line no-control-regex
const CONTROL_EXCEPT_LINES = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F]/u;

const codePoint = (ch: string): string => `U+${ch.codePointAt(0)!.toString(16).toUpperCase().padStart(4, '0')}`;

/** Why `text` is refused (naming the first hidden character), or null when it is plain text. */
export function hiddenCharacterReason(text: string, label: string, opts: { multiline?: boolean } = {}): string | null {
  const control = (opts.multiline ? CONTROL_EXCEPT_LINES : CONTROL).exec(text);
  if (control) return `${label} contains a control character (${codePoint(control[0])}); remove it`;
  const bidi = BIDI.exec(text);
  if (bidi) return `${label} contains a text-direction character (${codePoint(bidi[0])}) that can disguise it; remove it`;
  return null;
}

/**
 * Zod refinement for `.superRefine(...)` on a string: refuses control and bidirectional formatting
 * characters. `multiline` lets tab, line feed and carriage return through (notes, comments).
 */
export function plainText(label: string, opts: { multiline?: boolean } = {}) {
  return (text: string | null | undefined, ctx: { addIssue: (issue: { code: 'custom'; message: string }) => void }): void => {
    if (typeof text !== 'string') return;
    const reason = hiddenCharacterReason(text, label, opts);
    if (reason) ctx.addIssue({ code: 'custom', message: reason });
  };
}
