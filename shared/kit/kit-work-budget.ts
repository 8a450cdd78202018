import { GeometryError } from '../geometry/geometry-error';
import type { ResolvedKitRequest } from '../schemas/kit-request';
import { estimateKitWork } from './estimate-kit-work';

/**
 * Most STL bytes one kit request may ask for: 1,000,000 triangles as binary STL, about 240,000 as ASCII.
 * Measured here: a 1,000,000-triangle binary kit builds in about 1.3 s on one core, and its zip is what a
 * slicer still opens comfortably.
 */
export const MAX_KIT_STL_BYTES = 50_000_000;

const mb = (bytes: number) => `${(bytes / 1e6).toFixed(1)} MB`;
const count = (n: number) => n.toLocaleString('en-US');

/**
 * Refuses a kit request whose output would exceed the work budget, before any solid is built: the message
 * says how big the kit would be, the limit, and what to change.
 *
 * @param request - a resolved kit request
 * @param maxStlBytes - the budget in bytes of STL; default {@link MAX_KIT_STL_BYTES}
 * @throws GeometryError `WORK_LIMIT` with the numbers when the estimate is over the budget
 * @example
 * assertKitWithinBudget(request); // returns quietly for every ordinary kit
 */
export function assertKitWithinBudget(request: ResolvedKitRequest, maxStlBytes = MAX_KIT_STL_BYTES): void {
  const work = estimateKitWork(request);
  if (work.stlBytes <= maxStlBytes) return;
  const what =
    request.joint === 'key'
      ? `${work.pieces} ${request.key.shape} keys of ${count(work.sectionCorners)} corners each`
      : `${work.pieces} dovetail rails`;
  const fixes = [
    request.joint === 'key' ? 'fewer keys' : 'fewer rails',
    ...(request.joint === 'key' && request.key.shape === 'round'
      ? [`a coarser chord tolerance (now ${request.chordTolerance} mm; 0.02 mm is plenty for printing)`]
      : []),
    ...(request.format === 'ascii' ? ['binary STL (about a quarter of the size)'] : []),
  ];
  throw new GeometryError(
    'WORK_LIMIT',
    `This kit could be up to ${mb(work.stlBytes)} of STL (about ${count(work.triangles)} triangles for ${what}); a kit may be at most ${mb(maxStlBytes)}. Use ${fixes.join(', or ')}.`,
  );
}
