/**
 * Named policies: one answer to "who may do what", read by the route table (the guard), the
 * handlers and the state machine. The role split is the product's own rule (common practice:
 * separation of duties — line, quality and formulation roles; nobody signs off their own work).
 */
import { describe, expect, it } from 'vitest';
import { ROLES, type Role } from '../../src/lib/roles';
import { decide, ROUTE_TABLE } from '../../src/lib/access/route-table';
import * as policies from '../../src/lib/access/policies';
import { COMMAND_RULES } from '../../src/lib/formulations/workflow-rules';

const who = (...roles: Role[]) => ({ id: 7, roles });

// Expected: the roles each duty belongs to (common practice for the four roles of the product).
const table: { policy: keyof typeof policies; roles: Role[] }[] = [
  { policy: 'mayRead', roles: ['formulator', 'technician', 'quality', 'admin'] },
  { policy: 'mayEditLibrary', roles: ['formulator', 'admin'] },
  { policy: 'mayDesign', roles: ['formulator', 'admin'] },
  { policy: 'mayAuthorFormulations', roles: ['formulator', 'admin'] },
  { policy: 'mayActOnRevisions', roles: ['formulator', 'quality', 'admin'] },
  { policy: 'maySignRevisions', roles: ['quality', 'admin'] },
  { policy: 'mayPlanBatch', roles: ['technician', 'admin'] },
  { policy: 'mayWeigh', roles: ['technician', 'admin'] },
  { policy: 'mayAcceptDeviation', roles: ['quality', 'admin'] },
  { policy: 'mayJudgeBatches', roles: ['quality', 'admin'] },
  { policy: 'mayReadAudit', roles: ['quality', 'admin'] },
  { policy: 'mayAdminister', roles: ['admin'] }
];

describe('role policies', () => {
  it.each(table)('$policy admits exactly $roles', ({ policy, roles }) => {
    const p = policies[policy] as policies.RolePolicy;
    expect([...p.roles].sort()).toEqual([...roles].sort());
    for (const role of ROLES) expect(p(who(role))).toBe(roles.includes(role));
    expect(p(null)).toBe(false);
  });
});

describe('the route table reads the same policies', () => {
  const cases: { route: string; method: string; policy: policies.RolePolicy }[] = [
    { route: '/api/v1/batches', method: 'POST', policy: policies.mayPlanBatch },
    { route: '/api/v1/batches/[id]/mix', method: 'POST', policy: policies.mayWeigh },
    { route: '/api/v1/batches/[id]/lines/[seq]/override', method: 'POST', policy: policies.mayAcceptDeviation },
    { route: '/api/v1/measurements/[batchId]/disposition', method: 'POST', policy: policies.mayJudgeBatches },
    { route: '/api/v1/formulations', method: 'POST', policy: policies.mayAuthorFormulations },
    { route: '/api/v1/formulations/[id]/revisions/[revisionId]/submit', method: 'POST', policy: policies.mayActOnRevisions },
    { route: '/api/v1/formulations/[id]/revisions/[revisionId]/review', method: 'POST', policy: policies.maySignRevisions },
    { route: '/api/v1/phosphors/[id]', method: 'PUT', policy: policies.mayEditLibrary },
    { route: '/(app)/designer', method: 'POST', policy: policies.mayDesign },
    { route: '/(app)/audit', method: 'GET', policy: policies.mayReadAudit },
    { route: '/(app)/admin/users', method: 'POST', policy: policies.mayAdminister }
  ];
  it.each(cases)('$method $route', ({ route, method, policy }) => {
    expect(route in ROUTE_TABLE).toBe(true);
    for (const role of ROLES) expect(decide(route, method, [role]) === 'allow').toBe(policy(who(role)));
  });

  it('lets the roles of the approve command reach the approve endpoint, and nobody else', () => {
    for (const role of ROLES) {
      expect(decide('/api/v1/formulations/[id]/revisions/[revisionId]/approve', 'POST', [role]) === 'allow').toBe(
        COMMAND_RULES.approve.roles.includes(role)
      );
    }
    expect(policies.mayApprove.roles).toBe(COMMAND_RULES.approve.roles);
  });
});

describe('mayApprove(user, revision)', () => {
  const submitted = { state: 'submitted' as const, createdBy: 1 };
  it("lets quality approve someone else's submitted revision", () => {
    expect(policies.mayApprove(who('quality'), submitted)).toBe(true);
  });
  it('refuses the author, other roles, other states and nobody', () => {
    expect(policies.mayApprove({ id: 1, roles: ['quality'] }, submitted)).toBe(false);
    expect(policies.mayApprove(who('formulator'), submitted)).toBe(false);
    expect(policies.mayApprove(who('quality'), { state: 'draft', createdBy: 1 })).toBe(false);
    expect(policies.mayApprove(null, submitted)).toBe(false);
  });
});
