// The work the geometry worker threads do: build solids, write STL, zip. Runs inside a piscina worker
// (see geometry-worker.mjs), never on the web server's event loop. Every task takes and returns plain,
// structured-cloneable data.
import { buildCoupon } from '../../shared/coupon/build-coupon';
import { GeometryError } from '../../shared/geometry/geometry-error';
import { buildKit, summarizeKit } from '../../shared/kit/build-kit';
import type { KitManifest } from '../../shared/kit/kit-manifest';
import type { ResolvedCouponRequest } from '../../shared/schemas/coupon-request';
import type { ResolvedKitRequest } from '../../shared/schemas/kit-request';
import { manifoldEngine } from '../modules/coupons/manifold-engine';
import { stlHashes, zipKit } from '../modules/kit-history/kit-bytes';
import type { BuiltCoupon, BuiltKit, TaskResult } from './geometry';

async function settle<T>(work: () => T | Promise<T>): Promise<TaskResult<T>> {
  try {
    return { ok: true, value: await work() };
  } catch (error) {
    if (error instanceof GeometryError) return { ok: false, error: { code: error.code, message: error.message } };
    throw error;
  }
}

/** Builds a kit and zips it (manifest.json first, then the STLs and README.txt). */
export function kitZip(request: ResolvedKitRequest): Promise<TaskResult<BuiltKit>> {
  return settle(async () => {
    const kit = buildKit(request);
    return { manifest: kit.manifest, hashes: stlHashes(kit.files), zip: await zipKit(kit) };
  });
}

/** The kit's manifest alone (the meshes are built and measured, no STL is written). */
export function kitSummary(request: ResolvedKitRequest): Promise<TaskResult<KitManifest>> {
  return settle(() => summarizeKit(request));
}

/** Builds a fit-test coupon with manifold-3d (loaded once per thread) and zips it. */
export function couponZip(request: ResolvedCouponRequest): Promise<TaskResult<BuiltCoupon>> {
  return settle(async () => {
    const coupon = buildCoupon(await manifoldEngine(), request);
    return { manifest: coupon.manifest, zip: await zipKit(coupon) };
  });
}
