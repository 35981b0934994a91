// The four roles of Bungwise and what each may do: the one role table. The route policy
// (server/auth/policy.ts), the screens (`can`, `useCan`) and the acceptance rules' "released by" read it;
// a screen never writes its own list of roles.

export const ROLES = ['clerk', 'engineer', 'buyer', 'admin'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  clerk: 'Receiving clerk',
  engineer: 'Engineer',
  buyer: 'Buyer',
  admin: 'Administrator',
};

/** The role a person added by an administrator starts with. */
export const DEFAULT_ROLE: Role = 'clerk';

// Role groups.
/** Engineers and administrators: registry changes, releasing a held or quarantined lot. */
export const ENGINEER_ROLES: readonly Role[] = ['engineer', 'admin'];
/** Everyone who works at the dock and the stations: dock checks, holds, rinses, change-outs. */
export const DOCK_ROLES: readonly Role[] = ['clerk', 'engineer', 'admin'];
/** Buyers and engineers: sourcing plans and their warnings. */
export const PLANNER_ROLES: readonly Role[] = ['buyer', 'engineer', 'admin'];
export const ADMIN_ROLES: readonly Role[] = ['admin'];

/** What each action needs. Reading is open to everyone signed in and is not listed. */
export const ROLE_TABLE = {
  /** Add, change and delete registry records; the site settings. */
  'keep-registry': ENGINEER_ROLES,
  /** Approve, reject and retire another engineer's pairing. */
  'review-pairings': ENGINEER_ROLES,
  /** Dry-run and commit spec-sheet imports, read their history. */
  'import-records': ENGINEER_ROLES,
  /** Read the audit trail. */
  'read-audit': ENGINEER_ROLES,
  /** Release a held or quarantined lot. */
  'release-lots': ENGINEER_ROLES,
  /** Check a lot at the dock, hold it, attach its certificate, keep the dock snapshot. */
  'check-lots': DOCK_ROLES,
  /** Rinse, stand by and change out tube sets at a station. */
  'tend-stations': DOCK_ROLES,
  /** Make sourcing plans, acknowledge and resolve their warnings. */
  'plan-sourcing': PLANNER_ROLES,
  /** Add people, change their roles, reset their passwords. */
  'manage-people': ADMIN_ROLES,
} as const satisfies Record<string, readonly Role[]>;

export type Action = keyof typeof ROLE_TABLE;

/** The roles that may do this (a navigation item, a sentence naming who may). */
export const rolesFor = (action: Action): readonly Role[] => ROLE_TABLE[action];

/** May this role do this? False for no role (signed out). */
export const can = (role: Role | null | undefined, action: Action): boolean => !!role && ROLE_TABLE[action].includes(role);

/** "Engineer or Administrator": a role group in words for a screen. */
export const rolesInWords = (roles: readonly Role[]): string => roles.map((r) => ROLE_LABELS[r]).join(' or ');
