import { Router } from 'express';
import type { AppContext } from '../../app-context';
import { kitRequestSchema } from '../../../shared/schemas/kit-request';
import { parseWith } from '../../http/parse';
import { asBuffer } from './kit-zip';
import { buildKitDownload } from './kits.service';

/**
 * POST /api/kits → application/zip (STLs, manifest.json, README.txt); POST /api/kits/summary → the
 * manifest as JSON. No sign-in needed. Bad body → 400 with a path per problem; impossible geometry or more
 * work than the budget allows → 422 with the numbers. The solids are built on the geometry threads.
 */
export function kitRoutes(ctx: AppContext): Router {
  const router = Router();
  router.post('/kits/summary', async (req, res) => {
    const request = parseWith(kitRequestSchema, req.body, 'kit request');
    res.json(await ctx.geometry.kitSummary(request));
  });
  router.post('/kits', async (req, res) => {
    const request = parseWith(kitRequestSchema, req.body, 'kit request');
    const kit = await buildKitDownload(ctx.geometry, request);
    res.status(200).type('application/zip').attachment(kit.fileName).send(asBuffer(kit.zip));
  });
  return router;
}
