import type { RequestHandler, Router } from 'express';
import { rolesFor, type Action, type Role } from '../../shared/contract/roles';
import { requireRole } from './guards';

/** public: no token; signed-in: any active user; a list: only those roles. */
export type Access = 'public' | 'signed-in' | readonly Role[];

const EVERYONE = 'signed-in' as const;
/** The roles of the one role table (shared/contract/roles.ts) for this action; the screens' `can` reads the same. */
const may = (action: Action): readonly Role[] => rolesFor(action);

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
  'GET /api/users': may('manage-people'),
  'POST /api/users': may('manage-people'),
  'PATCH /api/users/:id': may('manage-people'),
  'POST /api/users/:id/reset-password': may('manage-people'),
  'GET /api/settings': EVERYONE,
  'PATCH /api/settings': may('keep-registry'),
  ...Object.fromEntries(
    REGISTRY.flatMap((r) => [
      [`GET /api/${r}`, EVERYONE],
      [`GET /api/${r}/:id`, EVERYONE],
      [`POST /api/${r}`, may('keep-registry')],
      [`PATCH /api/${r}/:id`, may('keep-registry')],
      [`DELETE /api/${r}/:id`, may('keep-registry')],
    ]),
  ),
  // Four eyes: the service also refuses the pairing's own author.
  'POST /api/pairings/:id/approve': may('review-pairings'),
  'POST /api/pairings/:id/reject': may('review-pairings'),
  'POST /api/pairings/:id/retire': may('review-pairings'),
  'POST /api/fit-checks': EVERYONE,
  'POST /api/tools/thread-match': EVERYONE,
  'POST /api/tools/flow': EVERYONE,
  'GET /api/tools/packaging-codes/:code': EVERYONE,
  'GET /api/tools/drum-types/:id/checks': EVERYONE,
  'GET /api/dock-snapshot': may('check-lots'),
  'GET /api/receiving-checks': EVERYONE,
  'GET /api/receiving-checks/:id': EVERYONE,
  'POST /api/receiving-checks': may('check-lots'),
  'POST /api/receiving-checks/:id/hold': may('check-lots'),
  // Releasing a held lot is an engineering decision.
  'POST /api/receiving-checks/:id/release': may('release-lots'),
  'GET /api/sourcing-plans': EVERYONE,
  'GET /api/sourcing-plans/:id': EVERYONE,
  'POST /api/sourcing-plans': may('plan-sourcing'),
  'GET /api/warnings': EVERYONE,
  'POST /api/warnings/:id/acknowledge': may('plan-sourcing'),
  'POST /api/warnings/:id/resolve': may('plan-sourcing'),
  'GET /api/stations/:id/board': EVERYONE,
  'POST /api/tube-sets/:id/rinse': may('tend-stations'),
  'POST /api/tube-sets/:id/standby': may('tend-stations'),
  'POST /api/stations/:id/change-out': may('tend-stations'),
  'GET /api/notifications': EVERYONE,
  'POST /api/notifications/:id/read': EVERYONE,
  'POST /api/notifications/read-all': EVERYONE,
  // Attaching: the service checks the roles of the record attached to (engineers for registry records, the dock for receiving checks).
  'POST /api/attachments': EVERYONE,
  'GET /api/attachments': EVERYONE,
  'GET /api/attachments/:id/content': EVERYONE,
  'GET /api/attachments/:id/url': EVERYONE,
  'GET /api/imports/templates/:kind': EVERYONE,
  'POST /api/imports': may('import-records'),
  'GET /api/imports': may('import-records'),
  'GET /api/imports/:id': may('import-records'),
  'GET /api/exports/:resource': EVERYONE,
  'GET /api/audit': may('read-audit'),
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
