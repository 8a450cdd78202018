import { Router } from 'express';
import type { AppContext } from '../../app-context';
import { requireUser } from '../../http/current-user';
import { parseWith } from '../../http/parse';
import { uuidParam } from '../../http/params';
import { auditQuerySchema } from '../../../shared/schemas/audit';
import { readAuditLog } from './audit.service';

/** GET /api/teams/:teamId/audit?before=&limit= → a page of the audit log (owners). */
export function auditRoutes(ctx: AppContext): Router {
  const router = Router();
  router.get('/teams/:teamId/audit', async (req, res) => {
    const user = requireUser(req);
    const teamId = uuidParam(req, 'teamId', 'team');
    const query = parseWith(auditQuerySchema, req.query, 'query');
    res.json(await readAuditLog(ctx, user, teamId, query));
  });
  return router;
}
