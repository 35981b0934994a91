import type { RequestHandler, Router } from 'express';
import { ADMIN_ROLES, DOCK_ROLES, ENGINEER_ROLES, PLANNER_ROLES, type Role } from '../../shared/roles';
import { requireRole } from './guards';

/** public: no token; signed-in: any active user; a list: only those roles. */
export type Access = 'public' | 'signed-in' | readonly Role[];

const EVERYONE = 'signed-in' as const;
const ENGINEERS = ENGINEER_ROLES;
const DOCK = DOCK_ROLES;
const PLANNERS = PLANNER_ROLES;
const ADMINS = ADMIN_ROLES;

/** Registry tables: everyone signed in reads; engineers and admins write. */
const REGISTRY = ['suppliers', 'thread-specs', 'key-codes', 'drum-types', 'dip-tubes', 'connectors', 'pairings', 'slurries', 'stations', 'tube-sets'];

/**
 * Who may call each API route: the one table. A route registered through `secured()` without an entry
 * here fails at start-up, and the role-matrix test walks every route of the app against this table.
 */
export const POLICY: Readonly<Record<string, Access>> = {
  'GET /api/health': 'public',
  'POST /api/auth/sign-in': 'public',
  // Both answer the same whether or not the address exists; limited per address and per target e-mail.
  'POST /api/auth/forgot-password': 'public',
  // The single-use token from the e-mailed link is the credential.
  'POST /api/auth/reset-password': 'public',
  'GET /api/me': EVERYONE,
  'PATCH /api/me': EVERYONE,
  'POST /api/me/password': EVERYONE,
  'GET /api/users': ADMINS,
  'POST /api/users': ADMINS,
  'PATCH /api/users/:id': ADMINS,
  'POST /api/users/:id/reset-password': ADMINS,
  'GET /api/settings': EVERYONE,
  'PATCH /api/settings': ENGINEERS,
  ...Object.fromEntries(
    REGISTRY.flatMap((r) => [
      [`GET /api/${r}`, EVERYONE],
      [`GET /api/${r}/:id`, EVERYONE],
      [`POST /api/${r}`, ENGINEERS],
      [`PATCH /api/${r}/:id`, ENGINEERS],
      [`DELETE /api/${r}/:id`, ENGINEERS],
    ]),
  ),
  // Four eyes: the service also refuses the pairing's own author.
  'POST /api/pairings/:id/approve': ENGINEERS,
  'POST /api/pairings/:id/reject': ENGINEERS,
  'POST /api/pairings/:id/retire': ENGINEERS,
  'POST /api/fit-checks': EVERYONE,
  'POST /api/tools/thread-match': EVERYONE,
  'POST /api/tools/flow': EVERYONE,
  'GET /api/tools/packaging-codes/:code': EVERYONE,
  'GET /api/tools/drum-types/:id/checks': EVERYONE,
  'GET /api/dock-snapshot': DOCK,
  'GET /api/receiving-checks': EVERYONE,
  'GET /api/receiving-checks/:id': EVERYONE,
  'POST /api/receiving-checks': DOCK,
  'POST /api/receiving-checks/:id/hold': DOCK,
  // Releasing a held lot is an engineering decision.
  'POST /api/receiving-checks/:id/release': ENGINEERS,
  'GET /api/sourcing-plans': EVERYONE,
  'GET /api/sourcing-plans/:id': EVERYONE,
  'POST /api/sourcing-plans': PLANNERS,
  'GET /api/warnings': EVERYONE,
  'POST /api/warnings/:id/acknowledge': PLANNERS,
  'POST /api/warnings/:id/resolve': PLANNERS,
  'GET /api/stations/:id/board': EVERYONE,
  'POST /api/tube-sets/:id/rinse': DOCK,
  'POST /api/tube-sets/:id/standby': DOCK,
  'POST /api/stations/:id/change-out': DOCK,
  'GET /api/notifications': EVERYONE,
  'POST /api/notifications/:id/read': EVERYONE,
  'POST /api/notifications/read-all': EVERYONE,
  // Attaching: the service checks the roles of the record attached to (engineers for registry records, the dock for receiving checks).
  'POST /api/attachments': EVERYONE,
  'GET /api/attachments': EVERYONE,
  'GET /api/attachments/:id/content': EVERYONE,
  'GET /api/attachments/:id/url': EVERYONE,
  'GET /api/imports/templates/:kind': EVERYONE,
  'POST /api/imports': ENGINEERS,
  'GET /api/imports': ENGINEERS,
  'GET /api/imports/:id': ENGINEERS,
  'GET /api/exports/:resource': EVERYONE,
  'GET /api/audit': ENGINEERS,
};

type Method = 'get' | 'post' | 'patch' | 'delete';

/** Registers routes on a router under /api with the access the policy table gives them. */
export function secured(router: Router) {
  const add =
    (method: Method) =>
    (path: string, ...handlers: RequestHandler[]) => {
      const key = `${method.toUpperCase()} /api${path}`;
      const access = POLICY[key];
      if (!access) throw new Error(`No access policy for ${key}: add it to POLICY in server/auth/policy.ts`);
      const guard = Array.isArray(access) ? [requireRole(...(access as Role[]))] : [];
      router[method](path, ...guard, ...handlers);
    };
  return { get: add('get'), post: add('post'), patch: add('patch'), delete: add('delete') };
}
