/**
 * The ticket and the batch record print the operating condition and the cold check target of a
 * hot-aimed revision (85 °C junction: common practice for hot binning; point invented), and
 * nothing of the kind for a bench target.
 */
import { describe, expect, it } from 'vitest';
import { buildBatchTicket } from '../../../src/lib/server/pdf/batch-ticket';
import { buildBatchRecord } from '../../../src/lib/server/pdf/batch-record';
import { coldCheckLabel } from '../../../src/lib/formulations/cold-check';
import { sampleDoc } from './fixtures';
import { pdfToText } from './pdf-text';

const oneLine = (t: string) => t.replace(/\s+/g, ' ');
const COLD = {
  x: 0.43721,
  y: 0.40212,
  cct: 2990.4,
  duv: 0.00061,
  ra: 82,
  r9: 10,
  steps: 2.2,
  condition: { reference: 'junction' as const, temperatureC: 25, driveCurrentMa: null }
};

describe('cold check target on the batch papers', () => {
  it('formats the bench point with its CCT and Duv', () => {
    expect(coldCheckLabel(COLD)).toBe('x 0.4372, y 0.4021 (2990 K, Duv 0.0006) at bench (25 °C)');
  });

  it('prints the condition and the cold check on the ticket and the record', async () => {
    const base = sampleDoc();
    const doc = sampleDoc({ target: { ...base.target, condition: 'Tj 85 °C, 350 mA', coldCheck: coldCheckLabel(COLD) } });
    for (const pdf of [await buildBatchTicket(doc, 'A4'), await buildBatchRecord(doc)]) {
      const flat = oneLine(pdfToText(pdf, false));
      // Labels and values are laid out in two columns.
      expect(flat).toContain('Target holds at');
      expect(flat).toContain('Tj 85 °C, 350 mA');
      expect(flat).toContain('Cold check target (bench)');
      expect(flat).toContain('x 0.4372, y 0.4021 (2990 K, Duv 0.0006) at bench (25 °C)');
    }
    const bench = oneLine(pdfToText(await buildBatchTicket(base, 'A4'), false));
    expect(bench).not.toContain('Cold check target');
  });
});
