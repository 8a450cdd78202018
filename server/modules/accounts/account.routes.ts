import { Router } from 'express';
import type { AppContext } from '../../app-context';
import { requireSession, requireUser } from '../../http/current-user';
import { parseWith } from '../../http/parse';
import { changePasswordSchema } from '../../../shared/schemas/account';
import { changePassword, getAccount, getMe } from './account.service';

/** GET /api/me (fixed contract; 401 signed out) · GET /api/account · POST /api/account/password. */
export function accountRoutes(ctx: AppContext): Router {
  const router = Router();
  router.get('/me', async (req, res) => {
    res.json(await getMe(ctx.db, requireUser(req)));
  });
  router.get('/account', async (req, res) => {
    res.json(await getAccount(ctx, requireUser(req).id));
  });
  router.post('/account/password', async (req, res) => {
    const auth = requireSession(req);
    await changePassword(ctx, auth, parseWith(changePasswordSchema, req.body));
    res.status(204).end();
  });
  return router;
}
