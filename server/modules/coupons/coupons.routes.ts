import { Router } from 'express';
import type { AppContext } from '../../app-context';
import { couponRequestSchema } from '../../../shared/schemas/coupon-request';
import { parseWith } from '../../http/parse';
import { asBuffer } from '../kits/kit-zip';
import { buildCouponDownload } from './coupons.service';

/** POST /api/coupons → application/zip of a fit-test coupon. No sign-in needed. Bad body → 400. */
export function couponRoutes(ctx: AppContext): Router {
  const router = Router();
  router.post('/coupons', async (req, res) => {
    const request = parseWith(couponRequestSchema, req.body, 'coupon request');
    const coupon = await buildCouponDownload(ctx.geometry, request);
    res.status(200).type('application/zip').attachment(coupon.fileName).send(asBuffer(coupon.zip));
  });
  return router;
}
