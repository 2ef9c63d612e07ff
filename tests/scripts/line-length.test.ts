/** The line-length check of `npm run lint`: at most 140 characters (house style), generated data exempt. */
import { describe, expect, it } from 'vitest';
import { isChecked, longLines, MAX_LINE_LENGTH } from '../../scripts/check-line-length.mjs';

describe('check-line-length', () => {
  it('allows 140 characters and reports 141, counting characters rather than UTF-8 bytes', () => {
    const text = ['a'.repeat(140), 'b'.repeat(141), '°'.repeat(140), `${'c'.repeat(140)}\r`].join('\n');
    expect(MAX_LINE_LENGTH).toBe(140);
    expect(longLines(text)).toEqual([{ line: 2, length: 141 }]);
  });

  it('covers hand-written code and leaves generated tables, prose and data alone', () => {
    const cases: [string, boolean][] = [
      ['src/lib/spectral/cct/ohno2014.ts', true],
      ['src/routes/(app)/designer/Readout.svelte', true],
      ['scripts/test.sh', true],
      ['migrations/20261204210000_create_package_models.ts', true],
      // Landed before the rule: landed migrations are never edited.
      ['migrations/20261201000000_create_users.ts', false],
      ['src/lib/spectral/data/cie1931-2deg-cmf.ts', false],
      ['README.md', false],
      ['tests/fixtures/spectra/orange-band-semicolon.csv', false]
    ];
    for (const [path, checked] of cases) expect(isChecked(path), path).toBe(checked);
  });
});
