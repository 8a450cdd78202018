import { Router } from 'express';
import type { AppContext } from '../../app-context';
import { requireUser } from '../../http/current-user';
import { parseWith } from '../../http/parse';
import { uuidParam } from '../../http/params';
import { changeRoleSchema } from '../../../shared/schemas/team';
import { changeMemberRole, listTeamMembers, removeMember } from './members.service';

/**
 * GET /api/teams/:teamId/members (members) · PATCH …/members/:userId {role} (owners)
 * · DELETE …/members/:userId (owners; any member for themselves, which means leaving).
 */
export function membersRoutes(ctx: AppContext): Router {
  const router = Router();
  router.get('/teams/:teamId/members', async (req, res) => {
    const user = requireUser(req);
    res.json(await listTeamMembers(ctx, user, uuidParam(req, 'teamId', 'team')));
  });
  router.patch('/teams/:teamId/members/:userId', async (req, res) => {
    const user = requireUser(req);
    const teamId = uuidParam(req, 'teamId', 'team');
    const userId = uuidParam(req, 'userId', 'member');
    const { role } = parseWith(changeRoleSchema, req.body);
    res.json(await changeMemberRole(ctx, user, teamId, userId, role));
  });
  router.delete('/teams/:teamId/members/:userId', async (req, res) => {
    const user = requireUser(req);
    const teamId = uuidParam(req, 'teamId', 'team');
    await removeMember(ctx, user, teamId, uuidParam(req, 'userId', 'member'));
    res.status(204).end();
  });
  return router;
}
