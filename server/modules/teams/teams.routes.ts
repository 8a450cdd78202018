import { Router } from 'express';
import type { AppContext } from '../../app-context';
import { requireUser } from '../../http/current-user';
import { parseWith } from '../../http/parse';
import { uuidParam } from '../../http/params';
import { teamInputSchema } from '../../../shared/schemas/team';
import { createTeam, deleteTeam, getTeam, listMyTeams, renameTeam } from './teams.service';

/**
 * GET /api/teams · POST /api/teams {name} (any signed-in user) · GET /api/teams/:teamId (members)
 * · PATCH /api/teams/:teamId {name} and DELETE /api/teams/:teamId (owners).
 */
export function teamsRoutes(ctx: AppContext): Router {
  const router = Router();
  router.get('/teams', async (req, res) => {
    res.json(await listMyTeams(ctx.db, requireUser(req).id));
  });
  router.post('/teams', async (req, res) => {
    const user = requireUser(req);
    res.status(201).json(await createTeam(ctx, user, parseWith(teamInputSchema, req.body).name));
  });
  router.get('/teams/:teamId', async (req, res) => {
    const user = requireUser(req);
    res.json(await getTeam(ctx, user, uuidParam(req, 'teamId', 'team')));
  });
  router.patch('/teams/:teamId', async (req, res) => {
    const user = requireUser(req);
    const teamId = uuidParam(req, 'teamId', 'team');
    res.json(await renameTeam(ctx, user, teamId, parseWith(teamInputSchema, req.body).name));
  });
  router.delete('/teams/:teamId', async (req, res) => {
    const user = requireUser(req);
    await deleteTeam(ctx, user, uuidParam(req, 'teamId', 'team'));
    res.status(204).end();
  });
  return router;
}
