/** An invented batch for the PDF tests (Kestrel Hollow demo style). */
import type { BatchDoc } from '../../../src/lib/server/pdf/batch-doc';

export function sampleDoc(over: Partial<BatchDoc> = {}): BatchDoc {
  const line = (
    seq: number,
    role: BatchDoc['lines'][number]['role'],
    code: string,
    name: string,
    targetG: string,
    lowG: string,
    highG: string,
    tol: string,
    loading: string | null
  ) => ({ seq, role, code, name, targetG, lowG, highG, toleranceLabel: tol, loadingLabel: loading, actual: null });
  return {
    batchNumber: 'BT-261202-007',
    state: 'planned',
    createdAt: new Date('2026-12-02T08:15:00Z'),
    createdBy: 'Tomas Brand',
    formulation: { code: 'KH-W30-90', name: 'Warm white 3000 K, Ra 90', revisionNo: 2 },
    target: { description: '3000 K, Duv +0.0000', xy: 'x 0.4369, y 0.4041', bin: '3000 K quadrangle', tolerance: '3-step MacAdam' },
    size: {
      batchMassG: '10.000',
      sizingNote: null,
      basisLabel: 'wt % of total slurry',
      loadingSummary: '9.5000 wt % of slurry (10.4972 phr)'
    },
    balance: { resolutionG: '0.001', minWeightG: '0.05', balanceRef: 'BAL-03' },
    silicone: {
      name: 'Brackenfield BS-6610',
      ratio: '10:1',
      potLifeMin: 240,
      plantLimitMin: 120,
      cure: '1 h at 80 °C, then 2 h at 150 °C',
      degasNotes: 'Vacuum below 5 kPa for 15 min.',
      safetyNote: null
    },
    lines: [
      line(1, 'siliconeA', 'PART A', 'Brackenfield BS-6610', '8.227', '8.145', '8.309', '±1 %', null),
      line(2, 'phosphor', 'GL-530', 'green garnet', '0.700', '0.697', '0.703', '±0.5 %', '7.0000 wt %'),
      line(3, 'phosphor', 'RD-625', 'red nitride', '0.250', '0.249', '0.251', '±0.5 %', '2.5000 wt %'),
      line(4, 'siliconeB', 'PART B', 'Brackenfield BS-6610', '0.823', '0.815', '0.830', '±1 %', null)
    ],
    process: { mixedAt: null, expiresAt: null, completedAt: null, completedBy: null },
    notes: null,
    ...over
  };
}
