import type { CouponManifest } from '../../shared/coupon/coupon-manifest';
import { GeometryError, type GeometryErrorCode } from '../../shared/geometry/geometry-error';
import type { KitManifest } from '../../shared/kit/kit-manifest';
import type { ResolvedCouponRequest } from '../../shared/schemas/coupon-request';
import type { KitFileHash } from '../../shared/schemas/kit-history';
import type { ResolvedKitRequest } from '../../shared/schemas/kit-request';

/** A built kit as the routes need it: the manifest, the SHA-256 of every STL and the zip's bytes. */
export interface BuiltKit {
  manifest: KitManifest;
  hashes: KitFileHash[];
  zip: Uint8Array;
}

/** A built fit-test coupon: its manifest and the zip's bytes. */
export interface BuiltCoupon {
  manifest: CouponManifest;
  zip: Uint8Array;
}

/** What routes and services ask of the geometry engine; the pool runs it on worker threads. */
export interface Geometry {
  kitZip(request: ResolvedKitRequest): Promise<BuiltKit>;
  kitSummary(request: ResolvedKitRequest): Promise<KitManifest>;
  couponZip(request: ResolvedCouponRequest): Promise<BuiltCoupon>;
}

/** A task's answer: its value, or the GeometryError it threw (class and code do not survive a thread hop). */
export type TaskResult<T> = { ok: true; value: T } | { ok: false; error: { code: GeometryErrorCode; message: string } };

/** A task's value, or its GeometryError thrown again on this side of the thread hop. */
export function unwrap<T>(result: TaskResult<T>): T {
  if (result.ok) return result.value;
  throw new GeometryError(result.error.code, result.error.message);
}
