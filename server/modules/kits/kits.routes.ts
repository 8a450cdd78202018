import { Router } from 'express';
import { kitRequestSchema } from '../../../shared/schemas/kit-request';
import { parseWith } from '../../http/parse';
import { prepareKitZip, summarizeKit } from './kits.service';

/**
 * POST /api/kits → application/zip (STLs, manifest.json, README.txt); POST /api/kits/summary → the
 * manifest as JSON. No sign-in needed. Bad body → 400 with a path per problem; impossible geometry → 422.
 */
export function kitRoutes(): Router {
  const router = Router();
  router.post('/kits/summary', (req, res) => {
    const request = parseWith(kitRequestSchema, req.body, 'kit request');
    res.json(summarizeKit(request));
  });
  router.post('/kits', async (req, res) => {
    const request = parseWith(kitRequestSchema, req.body, 'kit request');
    const kit = prepareKitZip(request);
    res.status(200).type('application/zip').attachment(kit.fileName);
    await kit.writeTo(res);
  });
  return router;
}
