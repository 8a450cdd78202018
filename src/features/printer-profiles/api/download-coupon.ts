import { useMutation } from '@tanstack/react-query';
import { couponRequestSchema, type CouponRequest } from '../../../../shared/schemas/coupon-request';
import { apiFile, saveFile } from '../../../lib/api-client';

/** POST /api/coupons: the fit-test coupon as a zip (no sign-in needed); the body is checked before it goes. */
export async function downloadCoupon(request: CouponRequest) {
  const body = couponRequestSchema.parse(request);
  return apiFile('/coupons', { method: 'POST', body: JSON.stringify(body) });
}

/** Fetches the coupon and hands it to the browser as a download. */
export function useDownloadCoupon() {
  return useMutation({
    mutationFn: async (request: CouponRequest) => saveFile(await downloadCoupon(request)),
  });
}
