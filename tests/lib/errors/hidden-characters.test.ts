import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { z } from 'zod';
import { hiddenCharacterReason, plainText } from '../../../src/lib/errors/hidden-characters';

// Control characters: C0 U+0000–U+001F, DEL U+007F, C1 U+0080–U+009F (Unicode 15 §23.1).
// Bidirectional formatting characters: U+202A–U+202E, U+2066–U+2069, U+200E, U+200F, U+061C (Unicode UAX #9 §2).
const controls = [...Array(0x20).keys(), ...Array.from({ length: 0x21 }, (_, i) => 0x7f + i)].map((c) => String.fromCodePoint(c));
const bidi = [0x202a, 0x202b, 0x202c, 0x202d, 0x202e, 0x2066, 0x2067, 0x2068, 0x2069, 0x200e, 0x200f, 0x061c].map((c) =>
  String.fromCodePoint(c)
);

describe('hiddenCharacterReason', () => {
  it('refuses every control character (NUL, ESC, DEL, C1) in a single-line name, naming its code point', () => {
    for (const ch of controls)
      expect(hiddenCharacterReason(`YAG${ch}568`, 'Name')).toMatch(/^Name contains a control character \(U\+00[0-9A-F]{2}\)/);
    expect(hiddenCharacterReason('a\u0000b', 'Name')).toContain('U+0000');
    expect(hiddenCharacterReason('a\u001Bb', 'Name')).toContain('U+001B');
  });

  it('refuses every bidirectional formatting character: "report\u202Efdp.exe" would show as "reportexe.pdf"', () => {
    for (const ch of bidi) expect(hiddenCharacterReason(`report${ch}fdp.exe`, 'The file name')).toMatch(/text-direction character \(U\+/);
    expect(hiddenCharacterReason('report\u202Efdp.exe', 'The file name')).toContain('U+202E');
  });

  it('lets tab and line breaks through in multi-line notes, but not NUL, ESC or an override', () => {
    expect(hiddenCharacterReason('line one\n\tline two\r\n', 'Notes', { multiline: true })).toBeNull();
    expect(hiddenCharacterReason('line one\n', 'Name')).not.toBeNull();
    expect(hiddenCharacterReason('a\u0000', 'Notes', { multiline: true })).not.toBeNull();
    expect(hiddenCharacterReason('a\u001B[2J', 'Notes', { multiline: true })).not.toBeNull();
    expect(hiddenCharacterReason('a\u202Eb', 'Notes', { multiline: true })).not.toBeNull();
  });

  it('accepts ordinary names in any script, with accents, symbols and emoji', () => {
    for (const ok of [
      'Garnet YAG:Ce 568 nm',
      'Nitrure rouge – lot №7',
      'Grünleuchtstoff β-SiAlON',
      '赤色蛍光体',
      'مسحوق',
      'Δu′v′ ≤ 0.002 ✓'
    ])
      expect(hiddenCharacterReason(ok, 'Name')).toBeNull();
  });

  it('property: a string is refused exactly when it holds a hidden character (fast-check)', () => {
    const hidden = new Set([...controls, ...bidi]);
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 30 }), (s) => {
        const expected = [...s].some((ch) => hidden.has(ch));
        expect(hiddenCharacterReason(s, 'Name') !== null).toBe(expected);
      }),
      { numRuns: 2000, seed: 15 }
    );
  });

  it('as a zod refinement it gives one clear issue', () => {
    const schema = z.object({ name: z.string().superRefine(plainText('Name')) });
    const r = schema.safeParse({ name: 'x\u202Ey' });
    expect(r.success).toBe(false);
    expect(r.error!.issues[0]).toMatchObject({ path: ['name'], message: expect.stringContaining('U+202E') });
    expect(schema.safeParse({ name: 'plain' }).success).toBe(true);
  });
});
