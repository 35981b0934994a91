/** The four roles of Bungwise and what each may do; client and server read the same table. */
export const ROLES = ['clerk', 'engineer', 'buyer', 'admin'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  clerk: 'Receiving clerk',
  engineer: 'Engineer',
  buyer: 'Buyer',
  admin: 'Administrator',
};

// Role groups: the one home for "who may", read by the route policy (server/auth/policy.ts) and by the
// screens that decide what to offer. A screen never writes its own list of roles.
/** Engineers and administrators: registry changes, releasing a held or quarantined lot. */
export const ENGINEER_ROLES: readonly Role[] = ['engineer', 'admin'];
/** Everyone who works at the dock and the stations: dock checks, holds, rinses, change-outs. */
export const DOCK_ROLES: readonly Role[] = ['clerk', 'engineer', 'admin'];
/** Buyers and engineers: sourcing plans and their warnings. */
export const PLANNER_ROLES: readonly Role[] = ['buyer', 'engineer', 'admin'];
export const ADMIN_ROLES: readonly Role[] = ['admin'];

export const hasRole = (roles: readonly Role[], role: Role | null | undefined): boolean => !!role && roles.includes(role);

/** "Engineer or Administrator": a role group in words for a screen. */
export const rolesInWords = (roles: readonly Role[]): string => roles.map((r) => ROLE_LABELS[r]).join(' or ');
