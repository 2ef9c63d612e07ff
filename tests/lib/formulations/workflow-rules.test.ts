import { describe, expect, it } from 'vitest';
import {
  COMMAND_RULES,
  STATE_TRANSITIONS,
  allowedCommands,
  refusal,
  type RevisionCommand
} from '../../../src/lib/formulations/workflow-rules';
import { REVISION_STATES } from '../../../src/lib/formulations/workflow-rules';
import type { Role } from '../../../src/lib/roles';
import { ALLOWED, type Person } from './permission-table';

// Revision control as practised for batch records (common practice): draft → in review →
// approved / returned; approval supersedes the previous approved revision; nobody signs off their own work.
const AUTHOR = 7;
const OTHER = 8;
const commands = Object.keys(COMMAND_RULES) as RevisionCommand[];
const who: { label: Person; roles: Role[]; id: number }[] = [
  { label: 'author (formulator)', roles: ['formulator'], id: AUTHOR },
  { label: 'other formulator', roles: ['formulator'], id: OTHER },
  { label: 'technician', roles: ['technician'], id: OTHER },
  { label: 'quality reviewer', roles: ['quality'], id: OTHER },
  { label: 'administrator', roles: ['admin'], id: OTHER }
];

describe('revision state machine: every command × state × person', () => {
  for (const p of who) {
    for (const state of REVISION_STATES) {
      const expected = ALLOWED[p.label][state] ?? [];
      it(`${p.label} on a ${state} revision may: ${expected.join(', ') || 'nothing'}`, () => {
        expect(allowedCommands({ id: p.id, roles: p.roles }, { state, createdBy: AUTHOR })).toEqual(expected);
        for (const cmd of commands.filter((x) => !expected.includes(x))) {
          expect(refusal(cmd, { id: p.id, roles: p.roles }, { state, createdBy: AUTHOR }), `${cmd}`).toEqual(expect.any(String));
        }
      });
    }
  }

  it('refuses self-approval even for an author who also holds the quality role', () => {
    const both = { id: AUTHOR, roles: ['formulator', 'quality'] as Role[] };
    for (const cmd of ['review', 'approve', 'return'] as const) {
      expect(refusal(cmd, both, { state: 'submitted', createdBy: AUTHOR })).toMatch(/own revision/);
    }
  });

  it('changes state only along the listed transitions, which end in superseded, returned or withdrawn', () => {
    for (const cmd of commands) {
      const to = COMMAND_RULES[cmd].to;
      if (to === null) continue;
      for (const from of COMMAND_RULES[cmd].from) expect(STATE_TRANSITIONS).toContainEqual([from, to]);
    }
    const terminal = REVISION_STATES.filter((s) => !STATE_TRANSITIONS.some(([from]) => from === s));
    expect(terminal.sort()).toEqual(['returned', 'superseded', 'withdrawn']);
  });
});
