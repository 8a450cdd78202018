import express from 'express';
import type { Logger } from 'pino';
import type { Database } from './db/client';
import { apiNotFound, errorHandler } from './http/error-handler';
import { requestLogger } from './http/request-logger';
import { securityHeaders } from './http/security-headers';
import { clientApp } from './http/client-app';
import { healthRoutes } from './modules/health/health.routes';

export interface AppDeps {
  db: Database;
  logger: Logger;
  /** Folder of the built client (dist/); omitted in API-only tests. */
  clientDir?: string;
}

// Kit requests are small JSON; 256 kB leaves room for a 1000-point polygon face.
const JSON_LIMIT = '256kb';

/** Builds the Express app without listening, so tests drive it through supertest. */
export function createApp({ db, logger, clientDir }: AppDeps): express.Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.use(requestLogger(logger));
  app.use(securityHeaders());
  app.use(express.json({ limit: JSON_LIMIT }));

  const api = express.Router();
  api.use(healthRoutes(db));
  api.use(apiNotFound);
  app.use('/api', api);

  if (clientDir) app.use(clientApp(clientDir));
  app.use(errorHandler);
  return app;
}
