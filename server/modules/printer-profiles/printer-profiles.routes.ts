import { Router } from 'express';
import type { AppContext } from '../../app-context';
import { requireUser } from '../../http/current-user';
import { parseWith } from '../../http/parse';
import { uuidParam } from '../../http/params';
import {
  printerProfileInputSchema,
  printerProfileListQuerySchema,
  printerProfilePatchSchema,
} from '../../../shared/schemas/printer-profile';
import * as service from './printer-profiles.service';

const base = '/teams/:teamId/printer-profiles';

/**
 * GET …/printer-profiles?q=&process=&sort=&order=&page=&pageSize= and GET …/:profileId (members)
 * · POST … and PATCH …/:profileId (editors, owners) · DELETE …/:profileId (owners).
 */
export function printerProfilesRoutes(ctx: AppContext): Router {
  const router = Router();
  const ids = (req: Parameters<typeof uuidParam>[0]) => ({
    teamId: uuidParam(req, 'teamId', 'team'),
    id: uuidParam(req, 'profileId', 'printer profile'),
  });
  router.get(base, async (req, res) => {
    const user = requireUser(req);
    const teamId = uuidParam(req, 'teamId', 'team');
    const query = parseWith(printerProfileListQuerySchema, req.query, 'query');
    res.json(await service.listPrinterProfiles(ctx, user, teamId, query));
  });
  router.post(base, async (req, res) => {
    const user = requireUser(req);
    const teamId = uuidParam(req, 'teamId', 'team');
    const input = parseWith(printerProfileInputSchema, req.body, 'printer profile');
    res.status(201).json(await service.createPrinterProfile(ctx, user, teamId, input));
  });
  router.get(`${base}/:profileId`, async (req, res) => {
    const { teamId, id } = ids(req);
    res.json(await service.getPrinterProfile(ctx, requireUser(req), teamId, id));
  });
  router.patch(`${base}/:profileId`, async (req, res) => {
    const user = requireUser(req);
    const { teamId, id } = ids(req);
    const patch = parseWith(printerProfilePatchSchema, req.body, 'printer profile');
    res.json(await service.updatePrinterProfile(ctx, user, teamId, id, patch));
  });
  router.delete(`${base}/:profileId`, async (req, res) => {
    const user = requireUser(req);
    const { teamId, id } = ids(req);
    await service.deletePrinterProfile(ctx, user, teamId, id);
    res.status(204).end();
  });
  return router;
}
