import express from 'express';
import type { Logger } from 'pino';
import type { Database } from './db/client';
import { apiNotFound, errorHandler } from './http/error-handler';
import { requestLogger } from './http/request-logger';
import { securityHeaders } from './http/security-headers';
import { clientApp } from './http/client-app';
import { healthRoutes } from './modules/health/health.routes';
import { kitRoutes } from './modules/kits/kits.routes';
import { couponRoutes } from './modules/coupons/coupons.routes';
import { accountRoutes } from './modules/accounts/account.routes';
import { authRoutes } from './modules/auth/auth.routes';
import { auditRoutes } from './modules/audit/audit.routes';
import { invitationsRoutes } from './modules/invitations/invitations.routes';
import { membersRoutes } from './modules/teams/members.routes';
import { teamsRoutes } from './modules/teams/teams.routes';
import { outboxRoutes, type Outbox } from './modules/dev-outbox/outbox.routes';
import { presetTransferRoutes } from './modules/presets/preset-transfer.routes';
import { presetsRoutes } from './modules/presets/presets.routes';
import { printerProfilesRoutes } from './modules/printer-profiles/printer-profiles.routes';
import { fitTestsRoutes } from './modules/fit-tests/fit-tests.routes';
import { materialsRoutes } from './modules/materials/materials.routes';
import { kitHistoryRoutes } from './modules/kit-history/kit-history.routes';
import { createSessions } from './auth/sessions';
import { authenticate } from './http/authenticate';
import { sameOrigin } from './http/same-origin';
import { createDroppingMailer, type Mailer } from './mail/mailer';
import { createLinks } from './mail/links';
import { defaultAuthSettings, type AuthSettings } from './config/auth-settings';
import type { AppContext } from './app-context';
import type { Geometry } from './geometry/geometry';
import { sharedGeometryPool } from './geometry/geometry-pool';

export interface AppDeps {
  db: Database;
  logger: Logger;
  /** Folder of the built client (dist/); omitted in API-only tests. */
  clientDir?: string;
  /** Outgoing mail; without one, messages are dropped (API tests that send none). */
  mailer?: Mailer;
  /** The local mail catcher's messages; when given, GET /api/dev/outbox lists them (never in production). */
  outbox?: Outbox;
  /** App address and rate limits; defaults suit tests of other features. */
  auth?: AuthSettings;
  /** Where solids are built; default the process's geometry thread pool. */
  geometry?: Geometry;
}

// Kit requests are small JSON; 256 kB leaves room for a 1000-point polygon face.
const JSON_LIMIT = '256kb';

/** Builds the Express app without listening, so tests drive it through supertest. */
export function createApp({
  db,
  logger,
  clientDir,
  mailer,
  outbox,
  auth = defaultAuthSettings,
  geometry,
}: AppDeps): express.Express {
  const ctx: AppContext = {
    db,
    logger,
    sessions: createSessions(db),
    mailer: mailer ?? createDroppingMailer(logger),
    links: createLinks(auth.appUrl),
    geometry: geometry ?? sharedGeometryPool(),
  };
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.use(requestLogger(logger));
  app.use(securityHeaders());
  app.use(express.json({ limit: JSON_LIMIT }));

  const api = express.Router();
  api.use(sameOrigin(auth.appUrl));
  api.use(authenticate(ctx.sessions));
  api.use(healthRoutes(db));
  api.use(kitRoutes(ctx));
  api.use(couponRoutes(ctx));
  api.use(authRoutes(ctx, { limits: auth.rateLimits, scope: auth.rateLimitScope }));
  api.use(accountRoutes(ctx));
  api.use(teamsRoutes(ctx));
  api.use(membersRoutes(ctx));
  api.use(invitationsRoutes(ctx));
  api.use(auditRoutes(ctx));
  // The team library; export/import first so "export" is never read as a preset id.
  api.use(presetTransferRoutes(ctx));
  api.use(presetsRoutes(ctx));
  api.use(printerProfilesRoutes(ctx));
  api.use(fitTestsRoutes(ctx));
  api.use(materialsRoutes(ctx));
  api.use(kitHistoryRoutes(ctx));
  if (outbox) api.use(outboxRoutes(outbox));
  api.use(apiNotFound);
  app.use('/api', api);

  if (clientDir) app.use(clientApp(clientDir));
  app.use(errorHandler);
  return app;
}
