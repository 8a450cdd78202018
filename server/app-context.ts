import type { Logger } from 'pino';
import type { Database } from './db/client';
import type { Sessions } from './auth/sessions';
import type { Mailer } from './mail/mailer';
import type { Links } from './mail/links';
import type { Geometry } from './geometry/geometry';

/** What services need from the outside world; built once in app.ts, never holds request data. */
export interface AppContext {
  db: Database;
  sessions: Sessions;
  mailer: Mailer;
  links: Links;
  logger: Logger;
  /** Builds kits, summaries and coupons off the event loop (worker threads). */
  geometry: Geometry;
}
