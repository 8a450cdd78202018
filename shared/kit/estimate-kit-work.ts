import { faceArea } from '../geometry/layout/face-area';
import { MAX_KEYS } from '../geometry/layout/place-keys';
import { keySection } from '../geometry/section/key-section';
import type { ResolvedKitRequest } from '../schemas/kit-request';

/** What a kit request will cost to build and send, estimated from the request alone (no layout, no solids). */
export interface KitWorkEstimate {
  /** An upper bound on the triangles of all STL files together. */
  readonly triangles: number;
  /** An upper bound on the STL bytes of all files together (binary or ASCII as asked). */
  readonly stlBytes: number;
  /** The largest number of keys or rails the kit can hold (the count asked for, or what could fit). */
  readonly pieces: number;
  /** Corners of one key or rail section: the triangles of every solid grow with it. */
  readonly sectionCorners: number;
}

// A binary STL stores 50 bytes a triangle after an 84-byte header; the ASCII writer's facets measure
// about 200 bytes each with Seamwright's number format (measured on the reference kits), so 210 is a bound.
const BINARY_BYTES_PER_TRIANGLE = 50;
const ASCII_BYTES_PER_TRIANGLE = 210;
const STL_HEADER_BYTES = 84;
// Keys, pockets, rails and slots are lofts of at most four rings: 2·n side triangles between two rings and
// n − 2 for each end cap, so 3 · 2n + 2(n − 2) < 8n.
const TRIANGLES_PER_CORNER_BOUND = 8;
// A dovetail section has four corners; with its chamfer rings a rail is still a loft of at most four rings.
const DOVETAIL_CORNERS = 4;

/**
 * Bounds the size of a kit before anything is built, so a request that asks for too much work can be
 * refused up front. Key kits: one key file plus two cutter files holding one pocket per key; the number of
 * keys is the count asked for, or — for "as many as fit" — no more than the face area over one key's
 * section area (pockets never overlap) and never more than 64. Dovetail kits: one rail and one slot per rail.
 *
 * @param request - a resolved kit request
 * @returns upper bounds on triangles and STL bytes, see {@link KitWorkEstimate}
 * @example
 * estimateKitWork(kitRequestSchema.parse({ joint: 'key', material: 'PLA', fit: 'snug',
 *   face: { shape: 'rect', width: 80, height: 60 }, key: { shape: 'square', width: 10, depth: 8, count: 8 } }))
 *   .triangles; // 544 (8 corners per triangle bound × 4 corners × 17 solids)
 */
export function estimateKitWork(request: ResolvedKitRequest): KitWorkEstimate {
  let solids: number;
  let corners: number;
  let pieces: number;
  if (request.joint === 'key') {
    const k = request.key;
    const section = keySection({ ...k, chordTolerance: request.chordTolerance });
    corners = section.length;
    pieces =
      k.count ??
      Math.min(
        MAX_KEYS,
        Math.max(
          1,
          Math.floor(faceArea(request.face) / faceArea({ shape: 'polygon', points: section.map(([x, y]) => [x, y]) })),
        ),
      );
    solids = 1 + 2 * pieces;
  } else {
    corners = DOVETAIL_CORNERS;
    pieces = request.dovetail.count;
    solids = 2 * pieces;
  }
  const triangles = solids * TRIANGLES_PER_CORNER_BOUND * corners;
  const perTriangle = request.format === 'ascii' ? ASCII_BYTES_PER_TRIANGLE : BINARY_BYTES_PER_TRIANGLE;
  const files = request.joint === 'key' ? 3 : 2;
  return { triangles, stlBytes: files * STL_HEADER_BYTES + triangles * perTriangle, pieces, sectionCorners: corners };
}
