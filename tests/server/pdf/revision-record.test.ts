/** The revision record prints the recipe per chip bin and the signatures that approve it (text read back with pdftotext). */
import { describe, expect, it } from 'vitest';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { buildRevisionRecord } from '../../../src/lib/server/pdf/revision-record';
import type { RevisionRecord, SignatureRecord } from '../../../src/lib/formulations/types';
import { parseRecipe } from '../../../src/lib/recipe';
import { V1_ROW } from '../../recipe/fixtures';

const content = parseRecipe(V1_ROW);
const bin = (code: string, fromNm: number, yl: number) => ({
  bin: { code, basis: 'peak' as const, fromNm, toNm: fromNm + 2.5, sharePct: null },
  pumpLeakFraction: 0.13,
  phosphors: content.phosphors.map((p, i) => ({ ...p, wtPct: i === 0 ? yl : 3 })),
  predicted: { x: 0.4338, y: 0.403, cct: 3000, duv: 0, ra: 82.1, r9: 10.4, steps: 0.12 }
});
const rev = {
  formulationCode: 'KH-T30',
  formulationName: 'Record test',
  revisionNo: 2,
  state: 'approved',
  createdByName: 'Rhea Okafor',
  contentSha256: 'ab'.repeat(32),
  content: { ...content, binRecipes: [bin('B4', 447.5, 11.812), bin('B5', 450, 12.304)] },
  predicted: { x: 0.4338, y: 0.403, cct: 3000, duv: 0, ra: 82, r9: 10, sdcm: 0.1, target: { label: '3000 K, Duv 0' } }
} as unknown as RevisionRecord;
const signature: SignatureRecord = {
  id: 1,
  revisionId: 1,
  signerId: 3,
  signerName: 'Ines Halloran',
  signerEmail: 'ines.halloran@kestrelhollow.example',
  meaning: 'approved',
  comment: 'Matrix checked on trial builds',
  signedAt: new Date('2026-12-05T01:00:00Z'),
  contentSha256: 'ab'.repeat(32)
};

describe('revision record PDF', () => {
  it('lists every bin recipe and the signature that binds the same content', async () => {
    const pdf = await buildRevisionRecord(rev, [signature]);
    const dir = mkdtempSync(join(tmpdir(), 'rev-record-'));
    writeFileSync(join(dir, 'r.pdf'), pdf);
    const text = execFileSync('pdftotext', ['-layout', join(dir, 'r.pdf'), '-'], { encoding: 'utf8' });
    expect(text).toContain('Recipe per chip bin');
    expect(text).toMatch(/B4\s+447\.5–450 \(peak\)\s+11\.812/);
    expect(text).toMatch(/B5\s+450–452\.5 \(peak\)\s+12\.304/);
    expect(text).toContain('Ines Halloran');
    expect(text).toContain('(this content)');
    expect(text.replace(/\s/g, '')).toContain('ab'.repeat(32)); // the hash wraps in its field
  });
});
