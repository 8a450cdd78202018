import { createHash } from 'node:crypto';
import type { Writable } from 'node:stream';
import { buildCoupon } from '../../../shared/coupon/build-coupon';
import type { ResolvedCouponRequest } from '../../../shared/schemas/coupon-request';
import { writeZip } from '../kits/kit-zip';
import { manifoldEngine } from './manifold-engine';

/**
 * Builds a fit-test coupon; returns its download name and a function that streams the zip (STLs,
 * manifest.json with the graded pockets, README.txt with the legend).
 */
export async function prepareCouponZip(
  request: ResolvedCouponRequest,
): Promise<{ fileName: string; writeTo: (out: Writable) => Promise<void> }> {
  const { manifest, files } = buildCoupon(await manifoldEngine(), request);
  const manifestBytes = new TextEncoder().encode(`${JSON.stringify(manifest, null, 2)}\n`);
  const entries = [{ name: 'manifest.json', bytes: manifestBytes }, ...files];
  const digest = createHash('sha256').update(JSON.stringify(request)).digest('hex').slice(0, 8);
  return { fileName: `seamwright-${request.joint}-fit-test-${digest}.zip`, writeTo: (out) => writeZip(entries, out) };
}
