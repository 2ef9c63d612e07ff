/** A batch line as pages show it (read on the server from batch_lines). */
import type { PlannedLine } from './weighout/compute';
import type { ActualStatus } from './weighout/actual';

type PlannedFields = 'seq' | 'role' | 'materialId' | 'code' | 'name' | 'basisPct' | 'idealG' | 'targetG' | 'lowG' | 'highG' | 'tolerance';

/** A stored line: the planned fields (as computed) plus the reading, lot, people and quality decision. */
export interface BatchLine extends Pick<PlannedLine, PlannedFields> {
  id: number;
  actualG: string | null;
  actualStatus: ActualStatus | null;
  lotId: number | null;
  lotNumber: string | null;
  weighedBy: number | null;
  weighedByName: string | null;
  weighedAt: Date | null;
  overrideBy: number | null;
  overrideByName: string | null;
  overrideAt: Date | null;
  overrideReason: string | null;
  version: number;
}
