import { describe, expect, it } from 'vitest';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { buildBatchTicket } from '../../../src/lib/server/pdf/batch-ticket';
import { buildBatchRecord } from '../../../src/lib/server/pdf/batch-record';
import { pdfSafe } from '../../../src/lib/server/pdf/fonts';
import { sampleDoc } from './fixtures';
import { pdfInfo, pdfToText } from './pdf-text';

const oneLine = (t: string) => t.replace(/\s+/g, ' ');

describe('weigh-out ticket PDF', () => {
  it.each([
    ['A4', /A4/],
    ['LETTER', /letter/]
  ] as const)('on %s: Plex embedded, every line with target and range, write-in columns', async (size, paper) => {
    const pdf = await buildBatchTicket(sampleDoc(), size);
    const info = pdfInfo(pdf);
    expect(info.size).toMatch(paper);
    expect(info.pages).toBeLessThanOrEqual(2);
    expect(info.fonts).toMatch(/IBMPlexSans-Regular\s+CID TrueType\s+Identity-H\s+yes/);
    expect(info.fonts).toMatch(/IBMPlexSans-SemiBold/);
    const text = pdfToText(pdf);
    const flat = oneLine(pdfToText(pdf, false));
    expect(flat).toContain('Weigh-out ticket');
    expect(flat).toContain('BT-261202-007');
    expect(flat).toContain('KH-W30-90 — Warm white 3000 K');
    expect(flat).toContain('Revision 2 (approved)');
    expect(flat).toContain('x 0.4369, y 0.4041');
    expect(flat).toContain('3000 K quadrangle');
    expect(flat).toContain('wt % of total slurry'); // the loading basis is always stated
    expect(flat).toContain('10.000 g');
    for (const h of ['Supplier lot', 'Target g', 'Allowed range g', 'Actual g', 'Initials', 'Time']) expect(flat).toContain(h);
    // Each line's row: target, then its range (values from the fixture, worked in tests/lib/batches/weighout/compute.test.ts).
    const rows = text.split('\n');
    for (const [code, target, range] of [
      ['PART A', '8.227', '8.145 – 8.309'],
      ['GL-530', '0.700', '0.697 – 0.703'],
      ['RD-625', '0.250', '0.249 – 0.251'],
      ['PART B', '0.823', '0.815 – 0.830']
    ]) {
      const row = rows.find((r) => r.includes(code) && r.includes(target));
      expect(row, code).toBeDefined();
      expect(row).toContain(range);
    }
    expect(text.indexOf('PART A')).toBeLessThan(text.indexOf('GL-530')); // weighing order
    expect(text.lastIndexOf('PART B')).toBeGreaterThan(text.indexOf('RD-625'));
    expect(flat).toMatch(/plant slurry-age limit 120 min \(pot life 240 min\)/);
    expect(flat).toContain('Vacuum below 5 kPa for 15 min.');
    expect(flat).toContain('Prepared by');
    expect(flat).toContain('Checked by');
    expect(flat).toContain('Caution: phosphor powders and silicone chemicals');
    expect(flat).toMatch(/safety data sheet of every material/);
  });

  it('carries the batch number as two images (Code 128 and QR)', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'pf-img-'));
    const file = join(dir, 't.pdf');
    writeFileSync(file, await buildBatchTicket(sampleDoc()));
    const list = execFileSync('pdfimages', ['-list', file], { encoding: 'utf8' }).trim().split('\n').slice(2);
    expect(list.length).toBeGreaterThanOrEqual(2);
  });

  it('flows onto more pages for a long batch and repeats the table header', async () => {
    const base = sampleDoc();
    const many = Array.from({ length: 14 }, (_, i) => ({ ...base.lines[1], seq: i + 1, code: `GL-${500 + i}` }));
    const text = pdfToText(await buildBatchTicket({ ...base, lines: many }, 'LETTER'));
    expect(text.match(/Allowed range g/g)!.length).toBeGreaterThanOrEqual(2);
    expect(text).toContain('GL-513');
    expect(text).toMatch(/Page 2 of \d/);
  });
});

describe('batch record PDF', () => {
  const done = sampleDoc({
    state: 'complete',
    process: {
      mixedAt: new Date('2026-12-02T09:40:00Z'),
      expiresAt: new Date('2026-12-02T11:40:00Z'),
      completedAt: new Date('2026-12-02T09:55:00Z'),
      completedBy: 'Tomas Brand'
    }
  });
  done.lines = done.lines.map((l, i) => ({
    ...l,
    actual: {
      actualG: ['8.230', '0.700', '0.2530', '0.823'][i],
      lotNumber: ['BS-A-2611', 'LLM-GL-2409-03', 'TPW-RD-2410-11', 'BS-B-2611'][i],
      status: i === 2 ? 'above' : 'in',
      weighedBy: 'Tomas Brand',
      weighedAt: new Date(`2026-12-02T09:${30 + i}:00Z`),
      override:
        i === 2
          ? {
              by: 'Ines Halloran',
              at: new Date('2026-12-02T09:50:00Z'),
              reason: 'Within the colour window; 1.2 % high on a minor red line.'
            }
          : null
    }
  }));

  it('shows targets against actuals, lots, who and when, and the quality decision', async () => {
    const pdf = await buildBatchRecord(done);
    const flat = oneLine(pdfToText(pdf, false));
    const rows = pdfToText(pdf).split('\n');
    expect(flat).toContain('Batch record BT-261202-007');
    expect(flat).toContain('LLM-GL-2409-03');
    expect(flat).toContain('TPW-RD-2410-11');
    expect(rows.find((r) => r.includes('RD-625'))).toMatch(/0\.250\s+0\.249 – 0\.251\s+0\.2530\s+ABOVE/);
    expect(flat).toContain('accepted by quality');
    expect(flat).toMatch(
      new RegExp(
        /Line 3 RD-625: 0\.2530 g is above range 0\.249 – 0\.251 g \(target 0\.250 g\)\. /.source +
          /Accepted by Ines Halloran on 2026-12-02 09:50 UTC\. Reason: Within the colour window/.source
      )
    );
    expect(flat).toContain('2026-12-02 09:40 UTC'); // mixed
    expect(flat).toContain('2026-12-02 11:40 UTC'); // use before
    expect(flat).toMatch(/2026-12-02 09:55 UTC by Tomas Brand/);
    expect(flat).toContain('Quality disposition');
    expect(flat).not.toContain('Measured colour');
  });

  it('adds the optional measurement summary section', async () => {
    const flat = oneLine(
      pdfToText(
        await buildBatchRecord(done, {
          size: 'LETTER',
          measurementSummary: {
            title: 'Measured colour of finished parts',
            rows: [
              { label: 'Parts measured', value: '24' },
              { label: 'Mean CCT', value: '3012 K' }
            ],
            note: 'Sphere, 25 °C.'
          }
        })
      )
    );
    expect(flat).toContain('Measured colour of finished parts');
    expect(flat).toMatch(/Parts measured .*Mean CCT/);
    expect(flat).toContain('3012 K');
  });

  it('marks completion after the slurry-age limit', async () => {
    const late = { ...done, process: { ...done.process, completedAt: new Date('2026-12-02T12:00:00Z') } };
    expect(oneLine(pdfToText(await buildBatchRecord(late)))).toContain('Completed after the slurry-age limit');
  });
});

describe('text limited to the embedded glyph subset', () => {
  it('swaps symbols outside IBM Plex Sans latin for plain ones', () => {
    expect(pdfSafe('≥ 5 → ±1 % − 2 µm')).toBe('>= 5 -> ±1 % − 2 µm');
  });
});
