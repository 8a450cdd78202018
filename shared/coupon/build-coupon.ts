import type { ManifoldToplevel } from 'manifold-3d';
import { writeBinaryStl } from '../geometry/stl';
import type { KitFile } from '../kit/build-kit';
import type { ResolvedCouponRequest } from '../schemas/coupon-request';
import type { CouponManifest } from './coupon-manifest';
import { couponReadme } from './coupon-readme';
import { dovetailCoupon } from './dovetail-coupon';
import { keyCoupon } from './key-coupon';

/**
 * Builds a fit-test coupon: binary STLs of the graded plate (or slot block) and its keys (or rail), and
 * README.txt with the legend; the server adds manifest.json and zips. Deterministic for the same request.
 *
 * @param wasm - the loaded manifold-3d module (plates need one boolean)
 * @param request - a resolved coupon request (`couponRequestSchema.parse(body)`)
 * @returns the manifest and the files, in manifest order with README.txt last
 */
export function buildCoupon(
  wasm: ManifoldToplevel,
  request: ResolvedCouponRequest,
): { manifest: CouponManifest; files: KitFile[] } {
  const { manifest, meshes } = request.joint === 'key' ? keyCoupon(wasm, request) : dovetailCoupon(wasm, request);
  const files: KitFile[] = manifest.parts.map((p) => ({
    name: p.file,
    bytes: writeBinaryStl(meshes.get(p.file)!, {
      header: `Seamwright fit-test ${p.file.replace(/\.stl$/, '')}; units: mm`,
    }),
  }));
  files.push({ name: 'README.txt', bytes: new TextEncoder().encode(couponReadme(manifest)) });
  return { manifest, files };
}
