import type { KitPart } from '../kit/kit-manifest';
import type { ResolvedCouponRequest } from '../schemas/coupon-request';

/** One graded pocket (or slot) of a coupon: its mark, its clearance per side (mm) and its centre [x, y] (mm). */
export interface CouponPocket {
  mark: string;
  clearancePerSide: number;
  position: [number, number];
  /** With the `scale` strategy, the key printed for this pocket and its scale. */
  keyFile?: string;
  keyScale?: number;
}

/**
 * A coupon's manifest.json: the kit manifest's fields (units, request, parts, warnings) plus every graded
 * pocket (issue 7 fixes the names `pockets`, `mark`, `clearancePerSide`, `position`).
 */
export interface CouponManifest {
  units: 'mm';
  kind: 'fit-test-coupon';
  request: ResolvedCouponRequest;
  clearanceRange: { from: number; to: number; step: number };
  pockets: CouponPocket[];
  parts: Array<Omit<KitPart, 'role'> & { role: 'coupon-plate' | 'key' | 'rail' | 'slot-block' }>;
  warnings: string[];
  printNotes: string[];
}
