import { assertKitWithinBudget } from '../../shared/kit/kit-work-budget';
import type { Geometry } from './geometry';

/**
 * The same geometry with the work budget checked first: a kit request over it is refused (422 with its
 * numbers) before any thread is asked to build it.
 */
export function withKitBudget(geometry: Geometry): Geometry {
  return {
    kitZip: async (request) => {
      assertKitWithinBudget(request);
      return geometry.kitZip(request);
    },
    kitSummary: async (request) => {
      assertKitWithinBudget(request);
      return geometry.kitSummary(request);
    },
    couponZip: geometry.couponZip,
  };
}
