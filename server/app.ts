import 'reflect-metadata';
import fs from 'node:fs';
import path from 'node:path';
import express, { type Express } from 'express';
import cors from 'cors';
import onHeaders from 'on-headers';
import morgan from 'morgan';
import type { DataSource } from 'typeorm';
import { authRouter, DEFAULT_SIGN_IN_LIMITS, type SignInLimits } from './auth/auth.router';
import { makeAuthenticator } from './auth/guards';
import { passwordChangeGate } from './auth/password-gate';
import { DEFAULT_PASSWORD_LIMITS, passwordRouters, type PasswordLimits } from './auth/password.router';
import { notFound, unavailable } from './common/errors';
import { errorMiddleware } from './common/error-middleware';
import { securityHeaders } from './common/security-headers';
import { bodyGuard, requestGuard } from './common/input-guard';
import { healthRouter } from './health/health.router';
import { attachmentsRouter } from './attachments/attachments.router';
import { auditRouter } from './audit/audit';
import type { ChangeFeed } from './db/change-feed';
import { fitCheckRouter } from './fit/fit-check.router';
import { FitCheckService } from './fit/fit-check.service';
import { exportsRouter } from './imports/exports.router';
import type { ImportOptions } from './imports/import.service';
import { importsRouter } from './imports/imports.router';
import type { Storage } from './storage/storage';
import { notificationsRouter } from './notifications/notifications.router';
import { receivingRouter } from './receiving/receiving.router';
import { ReceivingService } from './receiving/receiving.service';
import { sourcingRouter } from './sourcing/sourcing.router';
import { SourcingService } from './sourcing/sourcing.service';
import { rotationRouter } from './stations/rotation.router';
import { pairingActionsRouter } from './pairings/pairing-actions.router';
import { RESOURCES } from './registry/resources';
import { pairingDef } from './registry/pairings/pairing.def';
import { resourceRouter, ResourceService } from './registry/resource';
import { settingsRouter } from './settings/settings.router';
import { toolsRouter } from './tools/tools.router';
import { usersRouter } from './users/users.router';
import { compressAnswers, serveWeb } from './web/serve-web';

export interface AppOptions {
  dataSource: DataSource;
  jwtSecret: string;
  /** Folder of the exported web app; served at `/` with a fallback to index.html for client routes. */
  webDir?: string;
  signInLimits?: Partial<SignInLimits>;
  /** "Forgot password" and wrong-current-password limits (tests lower or raise them). */
  passwordLimits?: Partial<PasswordLimits>;
  /** Request logging (morgan); off in tests to keep their output readable. */
  logRequests?: boolean;
  /** The app's public address (`BUNGWISE_PUBLIC_URL`); an https one makes every answer send the HTTPS-only headers. */
  publicUrl?: string;
  /** Express's `trust proxy` (`BUNGWISE_TRUST_PROXY`); loopback by default. */
  trustProxy?: boolean | number | string;
  /** Other origins allowed to call the API from a browser; by default none (the app's own origin only). */
  allowedOrigins?: string[];
  /** Object storage for attachments and imported files; without it those routes answer 503. */
  storage?: Storage | null;
  imports?: ImportOptions;
  /**
   * The change feed: with it, the signed-in users and the fit answers to registry-only questions are kept
   * in memory until their tables change. Created before the app (which registers what it keeps), started
   * and stopped by the caller.
   */
  changes?: ChangeFeed | null;
  /** The clock the dock's "today" is read from (the site's local date); tests pass a fixed one. */
  clock?: () => Date;
}

// Requests that change no table the kept answers or users are read from (a fit check writes nothing; a dock
// check writes the lot, its notices and warnings; a sourcing plan writes the plan, its warning and notices):
// they leave what is kept in place.
const WRITES_NO_KEPT_TABLE = new Set(['/fit-checks', '/receiving-checks', '/sourcing-plans']);

/** The app factory: everything under /api, the web app at /. One process is stateless apart from the kept fit
 * answers and signed-in users (which every process drops when their tables change). */
export function createApp(options: AppOptions): Express {
  const { dataSource: ds, jwtSecret } = options;
  const app = express();
  app.disable('x-powered-by');
  // No ETag on API answers: nothing sends If-None-Match for them, and hashing each body cost a twentieth
  // of the fit check's CPU. Static files keep theirs (express.static sets its own).
  app.set('etag', false);
  // Which proxies may tell the client's address and protocol (X-Forwarded-For, -Proto): loopback by default.
  app.set('trust proxy', options.trustProxy ?? 'loopback');
  app.use(securityHeaders(options.publicUrl));
  app.use(compressAnswers());
  if (options.logRequests) app.use(morgan(':method :url :status :res[content-length] - :response-time ms'));

  const api = express.Router();
  // CORS: same-origin only unless origins are listed (BUNGWISE_ALLOWED_ORIGINS); a browser on any other
  // origin gets no Access-Control-Allow-Origin and cannot read the answers.
  const allowed = new Set(options.allowedOrigins ?? []);
  api.use(cors({ origin: (origin, done) => done(null, !!origin && allowed.has(origin)), credentials: false, maxAge: 600 }));
  // The input guard first: paths, queries, encodings and bodies no route should see get a 400 or 415 here.
  api.use(requestGuard);
  api.use(express.json({ limit: '1mb' }));
  api.use(bodyGuard);
  api.use(healthRouter(ds));
  // Until the first connection is made (the database may start after the server), answer 503, not 500.
  api.use((_req, _res, next) => next(ds.isInitialized ? undefined : unavailable()));
  api.use(authRouter(ds, jwtSecret, { ...DEFAULT_SIGN_IN_LIMITS, ...options.signInLimits }));
  const passwords = passwordRouters(ds, jwtSecret, { ...DEFAULT_PASSWORD_LIMITS, ...options.passwordLimits });
  api.use(passwords.forgot);
  const changes = options.changes ?? null;
  const fitAnswers = changes?.keep<Buffer>('bungwise_registry', { maxSize: 32 * 2 ** 20, sizeOf: (json) => json.length }) ?? null;
  // One fit service for the fit-check route, the dock and sourcing: all three use the kept answers.
  const fit = new FitCheckService(ds, fitAnswers);
  const receiving = new ReceivingService(ds, fit, options.clock);
  if (changes) {
    // Read your own writes: a change accepted by this process drops what it keeps before its answer is
    // sent, without waiting for the database's notice (which the other processes act on).
    api.use((req, res, next) => {
      if (req.method !== 'GET' && req.method !== 'HEAD' && !WRITES_NO_KEPT_TABLE.has(req.path)) {
        onHeaders(res, () => {
          if (res.statusCode < 400) changes.invalidateAll();
        });
      }
      next();
    });
  }
  // After the drop-what-is-kept step above: a reset from an e-mailed link bumps the session epoch, and this
  // process must refuse the old tokens at once, not when the database's notice arrives.
  api.use(passwords.reset);
  // Everything below needs a valid token.
  api.use(makeAuthenticator(ds, jwtSecret, changes));
  // An account with a temporary password may only change it (and read itself) until it has.
  api.use(passwordChangeGate());
  // The dock's hot path first: every router above it is matched against each request.
  api.use(fitCheckRouter(fit));
  api.use(usersRouter(ds));
  api.use(passwords.signedIn);
  api.use(settingsRouter(ds));
  api.use(pairingActionsRouter(ds, new ResourceService(ds, pairingDef)));
  api.use(rotationRouter(ds));
  for (const def of RESOURCES) api.use(resourceRouter(ds, def).router);
  api.use(toolsRouter(ds));
  api.use(receivingRouter(ds, receiving, options.clock));
  api.use(sourcingRouter(new SourcingService(ds, fit)));
  api.use(notificationsRouter(ds));
  api.use(attachmentsRouter(ds, options.storage ?? null, receiving));
  api.use(importsRouter(ds, options.storage ?? null, options.imports));
  api.use(exportsRouter(ds));
  api.use(auditRouter(ds));
  api.use((req) => {
    throw notFound(`The API route ${req.method} ${req.path}`);
  });
  app.use('/api', api);
  // The API router, for tools that list its routes (the role-matrix test).
  app.locals.apiRouter = api;

  if (options.webDir && fs.existsSync(path.join(options.webDir, 'index.html'))) {
    serveWeb(app, options.webDir);
  }

  app.use(errorMiddleware);
  return app;
}
