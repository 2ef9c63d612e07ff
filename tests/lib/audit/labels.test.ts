/**
 * Every event kind the server writes has a label in the one table, so no page, CSV or PDF shows a
 * raw code such as `record_reading` or `roles-changed`.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ACTION_LABELS, ENTITY_LABELS, actionLabel, codeInWords, entityLabel } from '../../../src/lib/audit/labels';

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? files(path) : path.endsWith('.ts') ? [path] : [];
  });
}

const server = files('src/lib/server').map((f) => readFileSync(f, 'utf8'));
const literals = (pattern: RegExp) => [...new Set(server.flatMap((text) => [...text.matchAll(pattern)].map((m) => m[1])))];

describe('labels of the audit trail', () => {
  it('name every event kind written with a literal action', () => {
    const actions = literals(/action: '([a-z][a-z_-]+)'/g);
    expect(actions.length).toBeGreaterThan(20);
    expect(actions.filter((a) => !(a in ACTION_LABELS))).toEqual([]);
  });

  it('name the revision workflow events and the conditional ones', () => {
    for (const a of ['approve', 'return', 'submit', 'supersede', 'withdraw', 'release', 'reject', 'archive', 'restore'])
      expect(ACTION_LABELS[a], a).toBeTruthy();
    for (const a of ['deactivated', 'reactivated', 'emission-spectrum-upload', 'excitation-spectrum-upload'])
      expect(ACTION_LABELS[a], a).toBeTruthy();
  });

  it('name every kind of record', () => {
    const types = literals(/entityType: '([a-z][a-z_-]+)'/g);
    expect(types.filter((t) => !(t in ENTITY_LABELS))).toEqual([]);
  });

  it('read an unknown code in words rather than as a code', () => {
    expect(actionLabel('record_reading')).toBe('Weight recorded');
    expect(entityLabel('batch_line')).toBe('Batch line');
    expect(codeInWords('lamp-rack_moved')).toBe('Lamp rack moved');
    expect(actionLabel('lamp-rack_moved')).toBe('Lamp rack moved');
  });
});
