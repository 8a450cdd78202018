import { Router } from 'express';
import type { AppContext } from '../../app-context';
import { requireUser } from '../../http/current-user';
import { parseWith } from '../../http/parse';
import { uuidParam } from '../../http/params';
import {
  teamMaterialInputSchema,
  teamMaterialListQuerySchema,
  teamMaterialPatchSchema,
} from '../../../shared/schemas/material';
import * as service from './materials.service';

const base = '/teams/:teamId/materials';

/**
 * GET …/materials/catalogue (built-in, read-only) and GET …/materials?q=&base=&sort=&order=&page=&pageSize=
 * (members) · POST … and PATCH …/:materialId (editors, owners) · DELETE …/:materialId (owners).
 */
export function materialsRoutes(ctx: AppContext): Router {
  const router = Router();
  router.get(`${base}/catalogue`, async (req, res) => {
    res.json(await service.readCatalogue(ctx, requireUser(req), uuidParam(req, 'teamId', 'team')));
  });
  router.get(base, async (req, res) => {
    const user = requireUser(req);
    const teamId = uuidParam(req, 'teamId', 'team');
    const query = parseWith(teamMaterialListQuerySchema, req.query, 'query');
    res.json(await service.listTeamMaterials(ctx, user, teamId, query));
  });
  router.post(base, async (req, res) => {
    const user = requireUser(req);
    const teamId = uuidParam(req, 'teamId', 'team');
    const input = parseWith(teamMaterialInputSchema, req.body, 'material');
    res.status(201).json(await service.createTeamMaterial(ctx, user, teamId, input));
  });
  router.patch(`${base}/:materialId`, async (req, res) => {
    const user = requireUser(req);
    const teamId = uuidParam(req, 'teamId', 'team');
    const id = uuidParam(req, 'materialId', 'material');
    const patch = parseWith(teamMaterialPatchSchema, req.body, 'material');
    res.json(await service.updateTeamMaterial(ctx, user, teamId, id, patch));
  });
  router.delete(`${base}/:materialId`, async (req, res) => {
    const user = requireUser(req);
    await service.deleteTeamMaterial(
      ctx,
      user,
      uuidParam(req, 'teamId', 'team'),
      uuidParam(req, 'materialId', 'material'),
    );
    res.status(204).end();
  });
  return router;
}
