import { Router } from 'express';
import type { AppContext } from '../../app-context';
import { requireUser } from '../../http/current-user';
import { parseWith } from '../../http/parse';
import { uuidParam } from '../../http/params';
import { fitTestInputSchema } from '../../../shared/schemas/fit-test';
import * as service from './fit-tests.service';

const base = '/teams/:teamId/printer-profiles/:profileId/fit-tests';

/**
 * GET …/printer-profiles/:profileId/fit-tests and GET …/:testId (members) · POST … and
 * POST …/:testId/make-current (editors, owners).
 */
export function fitTestsRoutes(ctx: AppContext): Router {
  const router = Router();
  const ids = (req: Parameters<typeof uuidParam>[0]) => ({
    teamId: uuidParam(req, 'teamId', 'team'),
    profileId: uuidParam(req, 'profileId', 'printer profile'),
  });
  const testId = (req: Parameters<typeof uuidParam>[0]) => uuidParam(req, 'testId', 'fit test');
  router.get(base, async (req, res) => {
    const { teamId, profileId } = ids(req);
    res.json(await service.listFitTests(ctx, requireUser(req), teamId, profileId));
  });
  router.post(base, async (req, res) => {
    const user = requireUser(req);
    const { teamId, profileId } = ids(req);
    const input = parseWith(fitTestInputSchema, req.body, 'fit test');
    res.status(201).json(await service.recordFitTest(ctx, user, teamId, profileId, input));
  });
  router.get(`${base}/:testId`, async (req, res) => {
    const { teamId, profileId } = ids(req);
    res.json(await service.getFitTest(ctx, requireUser(req), teamId, profileId, testId(req)));
  });
  router.post(`${base}/:testId/make-current`, async (req, res) => {
    const user = requireUser(req);
    const { teamId, profileId } = ids(req);
    res.json(await service.makeFitTestCurrent(ctx, user, teamId, profileId, testId(req)));
  });
  return router;
}
