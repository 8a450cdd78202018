import { Router } from 'express';
import type { AppContext } from '../../app-context';
import { requireSession, requireUser } from '../../http/current-user';
import { parseWith } from '../../http/parse';
import { changePasswordSchema, updateAccountSchema } from '../../../shared/schemas/account';
import { changePassword, getAccount, getMe, updateAccount } from './account.service';

/**
 * GET /api/me (fixed contract; 401 signed out) · GET /api/session (200 for anyone: {"me": <the /api/me reply> | null},
 * so a visitor's page load logs no failed request) · GET /api/account · PATCH /api/account (units) ·
 * POST /api/account/password.
 */
export function accountRoutes(ctx: AppContext): Router {
  const router = Router();
  router.get('/me', async (req, res) => {
    res.json(await getMe(ctx.db, requireUser(req)));
  });
  router.get('/session', async (req, res) => {
    res.json({ me: req.auth ? await getMe(ctx.db, req.auth.user) : null });
  });
  router.get('/account', async (req, res) => {
    res.json(await getAccount(ctx, requireUser(req).id));
  });
  router.patch('/account', async (req, res) => {
    const userId = requireUser(req).id;
    res.json(await updateAccount(ctx, userId, parseWith(updateAccountSchema, req.body)));
  });
  router.post('/account/password', async (req, res) => {
    const auth = requireSession(req);
    await changePassword(ctx, auth, parseWith(changePasswordSchema, req.body));
    res.status(204).end();
  });
  return router;
}
