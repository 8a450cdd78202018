import { Router, type Request } from 'express';
import type { AppContext } from '../../app-context';
import { requireUser } from '../../http/current-user';
import { parseWith } from '../../http/parse';
import { uuidParam } from '../../http/params';
import { kitDownloadQuerySchema, kitHistoryQuerySchema, recordKitSchema } from '../../../shared/schemas/kit-history';
import { getKitEntry, listKitHistory } from './kit-history.service';
import { checkKit, downloadKit } from './rebuild-kit.service';
import { recordKit } from './record-kit.service';
import { asBuffer } from '../kits/kit-zip';

const base = '/teams/:teamId/kits';
const ids = (req: Request) => ({ teamId: uuidParam(req, 'teamId', 'team'), id: uuidParam(req, 'kitId', 'kit') });

/**
 * The team's kit history; every route is open to any member (viewers download kits too).
 * POST …/kits {request, presetId?, presetVersion?, printerProfileId?} → 201 application/zip, recorded
 * (X-Seamwright-Kit-Id and Location name the entry) · GET …/kits (search, filters, sort, paging)
 * · GET …/kits/:kitId · GET …/kits/:kitId/check (rebuild and compare hashes)
 * · GET …/kits/:kitId/download?variant=current|original (X-Seamwright-Identical says whether it matches).
 * The public POST /api/kits is unchanged and records nothing.
 */
export function kitHistoryRoutes(ctx: AppContext): Router {
  const router = Router();
  router.post(base, async (req, res) => {
    const user = requireUser(req);
    const teamId = uuidParam(req, 'teamId', 'team');
    const input = parseWith(recordKitSchema, req.body, 'kit request');
    const kit = await recordKit(ctx.db, ctx.geometry, user, teamId, input);
    res
      .status(201)
      .location(`/api/teams/${teamId}/kits/${kit.id}`)
      .set('X-Seamwright-Kit-Id', kit.id)
      // The clearance the kit was built with (mm per side): the design screen compares it with its preview,
      // which may have used a printer calibration or team material that changed since the page loaded.
      .set('X-Seamwright-Clearance', String(kit.clearancePerSide))
      .type('application/zip')
      .attachment(kit.fileName)
      .send(asBuffer(kit.zip));
  });
  router.get(base, async (req, res) => {
    const user = requireUser(req);
    const teamId = uuidParam(req, 'teamId', 'team');
    res.json(await listKitHistory(ctx, user, teamId, parseWith(kitHistoryQuerySchema, req.query, 'query')));
  });
  router.get(`${base}/:kitId`, async (req, res) => {
    const { teamId, id } = ids(req);
    res.json(await getKitEntry(ctx, requireUser(req), teamId, id));
  });
  router.get(`${base}/:kitId/check`, async (req, res) => {
    const { teamId, id } = ids(req);
    res.json(await checkKit(ctx, requireUser(req), teamId, id));
  });
  router.get(`${base}/:kitId/download`, async (req, res) => {
    const user = requireUser(req);
    const { teamId, id } = ids(req);
    const { variant } = parseWith(kitDownloadQuerySchema, req.query, 'query');
    const kit = await downloadKit(ctx, user, teamId, id, variant);
    res
      .set('X-Seamwright-Identical', String(kit.identical))
      .type('application/zip')
      .attachment(kit.fileName)
      .send(kit.zip);
  });
  return router;
}
