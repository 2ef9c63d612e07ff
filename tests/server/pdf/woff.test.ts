import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { woffToSfnt } from '../../../src/lib/server/pdf/woff';

// W3C WOFF 1.0 §3–§5: the SFNT rebuilt from a WOFF has the WOFF header's flavor, table count and
// (table data padded to 4 bytes) exactly the totalSfntSize the WOFF header declares.
const require = createRequire(import.meta.url);
const woff = readFileSync(require.resolve('@fontsource/ibm-plex-sans/files/ibm-plex-sans-latin-400-normal.woff'));

describe('WOFF → SFNT', () => {
  it('rebuilds the declared SFNT', () => {
    const sfnt = woffToSfnt(woff);
    expect(sfnt.readUInt32BE(0)).toBe(woff.readUInt32BE(4));
    expect(sfnt.readUInt16BE(4)).toBe(woff.readUInt16BE(12));
    expect(sfnt.length).toBe(woff.readUInt32BE(16));
    const tags = Array.from({ length: sfnt.readUInt16BE(4) }, (_, i) => sfnt.toString('latin1', 12 + i * 16, 16 + i * 16));
    for (const t of ['cmap', 'glyf', 'head', 'hmtx', 'name']) expect(tags).toContain(t);
  });
  it('refuses a file that is not WOFF 1.0', () => {
    expect(() => woffToSfnt(Buffer.from('wOF2....'))).toThrow(/not a WOFF 1.0/);
  });
});
