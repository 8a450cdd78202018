import type { Geometry } from '../../geometry/geometry';
import type { ResolvedCouponRequest } from '../../../shared/schemas/coupon-request';
import { downloadName } from '../kits/kit-zip';

/**
 * Builds a fit-test coupon on a geometry thread; returns its download name and the zip (STLs, manifest.json
 * with the graded pockets, README.txt with the legend).
 */
export async function buildCouponDownload(
  geometry: Geometry,
  request: ResolvedCouponRequest,
): Promise<{ fileName: string; zip: Uint8Array }> {
  const { zip } = await geometry.couponZip(request);
  return { fileName: downloadName(`${request.joint}-fit-test`, request), zip };
}
