import { withKitBudget } from './kit-budget';
import { unwrap } from './geometry';
import { couponZip, kitSummary, kitZip } from './geometry-tasks';

/**
 * The geometry tasks on the calling thread, for command-line tools such as the seed that build a few kits
 * with nobody waiting on an event loop. Same budget and same answers as the pool.
 */
export const inlineGeometry = withKitBudget({
  kitZip: async (request) => unwrap(await kitZip(request)),
  kitSummary: async (request) => unwrap(await kitSummary(request)),
  couponZip: async (request) => unwrap(await couponZip(request)),
});
