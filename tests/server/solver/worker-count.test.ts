import { availableParallelism } from 'node:os';
import { describe, expect, it } from 'vitest';
import { workerCount } from '../../../src/lib/server/solver/pool';
import { loadConfig } from '../../../src/lib/server/config';

describe('solver worker count (PF_SOLVE_WORKERS)', () => {
  it('defaults to one worker per core, at most 4', () => {
    const expected = Math.max(1, Math.min(4, availableParallelism()));
    expect(workerCount(loadConfig({}).solveWorkers)).toBe(expected);
    expect(workerCount(loadConfig({ PF_SOLVE_WORKERS: '' }).solveWorkers)).toBe(expected);
  });

  it('takes a whole number from 0 (solve in the request thread) to 16', () => {
    expect(workerCount(loadConfig({ PF_SOLVE_WORKERS: '0' }).solveWorkers)).toBe(0);
    expect(workerCount(loadConfig({ PF_SOLVE_WORKERS: '3' }).solveWorkers)).toBe(3);
    expect(workerCount(loadConfig({ PF_SOLVE_WORKERS: '16' }).solveWorkers)).toBe(16);
  });

  it('refuses anything else with a message naming the variable', () => {
    for (const bad of ['-1', '17', '2.5', 'two']) {
      expect(() => loadConfig({ PF_SOLVE_WORKERS: bad })).toThrow(/PF_SOLVE_WORKERS must be a whole number from 0 to 16/);
    }
  });
});
