import { Router } from 'express';
import { couponRequestSchema } from '../../../shared/schemas/coupon-request';
import { parseWith } from '../../http/parse';
import { prepareCouponZip } from './coupons.service';

/** POST /api/coupons → application/zip of a fit-test coupon. No sign-in needed. Bad body → 400. */
export function couponRoutes(): Router {
  const router = Router();
  router.post('/coupons', async (req, res) => {
    const request = parseWith(couponRequestSchema, req.body, 'coupon request');
    const coupon = await prepareCouponZip(request);
    res.status(200).type('application/zip').attachment(coupon.fileName);
    await coupon.writeTo(res);
  });
  return router;
}
