import { Router } from 'express';
import type { CapturedMail } from '../../mail/catcher';

/** Where the outbox reads captured messages from (the in-process catcher). */
export interface Outbox {
  messages(): CapturedMail[];
}

/**
 * GET /api/dev/outbox → {"messages":[…]} newest first. Mounted only while the local mail catcher
 * runs (development, tests, the `npm start` demo); a server that sends real mail has no such route.
 */
export function outboxRoutes(outbox: Outbox): Router {
  const router = Router();
  router.get('/dev/outbox', (_req, res) => {
    res.json({ messages: outbox.messages() });
  });
  return router;
}
