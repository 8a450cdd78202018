import type { Writable } from 'node:stream';
import { buildCoupon } from '../../../shared/coupon/build-coupon';
import type { ResolvedCouponRequest } from '../../../shared/schemas/coupon-request';
import { downloadName, withManifest, writeZip } from '../kits/kit-zip';
import { manifoldEngine } from './manifold-engine';

/**
 * Builds a fit-test coupon; returns its download name and a function that streams the zip (STLs,
 * manifest.json with the graded pockets, README.txt with the legend).
 */
export async function prepareCouponZip(
  request: ResolvedCouponRequest,
): Promise<{ fileName: string; writeTo: (out: Writable) => Promise<void> }> {
  const { manifest, files } = buildCoupon(await manifoldEngine(), request);
  const entries = withManifest(manifest, files);
  return { fileName: downloadName(`${request.joint}-fit-test`, request), writeTo: (out) => writeZip(entries, out) };
}
