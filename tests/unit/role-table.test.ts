import { POLICY } from '../../server/auth/policy';
import { can, ROLE_TABLE, ROLES, rolesFor, type Action } from '../../shared/contract/roles';

describe('the one role table', () => {
  it('gives every guarded route of the policy the roles of one of its actions', () => {
    const groups = Object.values(ROLE_TABLE);
    for (const [route, access] of Object.entries(POLICY)) {
      if (access === 'public' || access === 'signed-in') continue;
      expect({ route, known: groups.includes(access as (typeof groups)[number]) }).toEqual({ route, known: true });
    }
  });

  it('answers can() from the table, and false with no role', () => {
    for (const action of Object.keys(ROLE_TABLE) as Action[]) {
      for (const role of ROLES) expect(can(role, action)).toBe(rolesFor(action).includes(role));
      expect(can(undefined, action)).toBe(false);
      expect(can(null, action)).toBe(false);
    }
  });

  it('keeps the registry with engineers and administrators only, and people with administrators only', () => {
    expect(ROLES.filter((r) => can(r, 'keep-registry'))).toEqual(['engineer', 'admin']);
    expect(ROLES.filter((r) => can(r, 'check-lots'))).toEqual(['clerk', 'engineer', 'admin']);
    expect(ROLES.filter((r) => can(r, 'plan-sourcing'))).toEqual(['engineer', 'buyer', 'admin']);
    expect(ROLES.filter((r) => can(r, 'manage-people'))).toEqual(['admin']);
    // The policy's routes read the same table.
    expect(POLICY['POST /api/receiving-checks/:id/release']).toBe(rolesFor('release-lots'));
    expect(POLICY['POST /api/sourcing-plans']).toBe(rolesFor('plan-sourcing'));
  });
});
