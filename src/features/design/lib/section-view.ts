import type { PreviewKit } from './preview-kit';
import { spanAtY } from './span-at-y';

/**
 * Where the "Cut through" view cuts and what it frames, in the joint frame (mm): the plane y = `y` (vertical,
 * square to the cut face z = 0) through the centre of one key or rail, seen from the −y side.
 */
export interface SectionView {
  /** The section plane, y = this, mm. */
  readonly y: number;
  /** Centre of the framed region on the plane (x, z), mm: the key or rail cut; z is the cut face, 0. */
  readonly x: number;
  readonly z: number;
  /** Size of the region to frame across x and z, mm: the pocket or slot with a little wall round it. */
  readonly width: number;
  readonly height: number;
  /**
   * How far behind the plane the keys, rails and cutters are drawn, mm: past the far side of any pocket the plane
   * cuts, and short of the rows behind, which the halves hide anyway (their edges would only add noise).
   */
  readonly reach: number;
  /** A point in the gap between key and pocket wall (rail and slot flank) on the +x side, on the plane, mm. */
  readonly gapX: number;
  readonly gapZ: number;
}

/** The index of the centre nearest the middle of all of them (the first on ties): a key away from the edges. */
function middleOne(positions: ReadonlyArray<readonly [number, number]>): number {
  const mx = positions.reduce((s, p) => s + p[0], 0) / positions.length;
  const my = positions.reduce((s, p) => s + p[1], 0) / positions.length;
  let best = 0;
  positions.forEach(([x, y], i) => {
    const [bx, by] = positions[best]!;
    if (Math.hypot(x - mx, y - my) < Math.hypot(bx - mx, by - my) - 1e-9) best = i;
  });
  return best;
}

/**
 * Chooses the section of the "Cut through" view: through the centre of the key nearest the middle of the layout
 * (key joints) or the middle rail (dovetails), framing its pocket or slot from one wall to the other.
 *
 * @param kit - a built preview (its manifest and face outlines)
 * @returns the plane and the region to frame, or null when the kit has no key or rail
 * @example
 * sectionView(previewKit(request)); // { y: 0, x: -16.42, z: 0, width: 14.2, height: 19.8, reach: 12.2, gapX: -11.34, gapZ: -4 }
 */
export function sectionView(kit: Pick<PreviewKit, 'manifest' | 'outlines'>): SectionView | null {
  const { request, parts, derived } = kit.manifest;
  if (request.joint === 'key') {
    const positions = parts.find((p) => p.role === 'pocket-cutter')?.positions ?? [];
    const key = kit.outlines.key;
    const pocket = kit.outlines.pocket;
    if (positions.length === 0 || !key || !pocket) return null;
    const [x, y] = positions[middleOne(positions)]!;
    // Outlines are centred on the key, so the plane through its centre cuts them at their own y = 0.
    const keyHalf = spanAtY(key, 0)[1];
    const pocketHalf = spanAtY(pocket, 0)[1];
    const depth = derived.pocketDepth ?? request.key.depth;
    const margin = Math.max(1, 0.12 * Math.max(2 * pocketHalf, 2 * depth));
    const pocketHalfY = Math.max(...pocket.map((p) => Math.abs(p[1])));
    return {
      y,
      x,
      z: 0,
      width: 2 * (pocketHalf + margin),
      height: 2 * (depth + margin),
      // A pocket the plane cuts has its centre within pocketHalfY of it, so its far wall lies within twice that.
      reach: 2 * pocketHalfY + margin,
      gapX: x + (keyHalf + pocketHalf) / 2,
      gapZ: -depth / 2,
    };
  }
  const rails = kit.outlines.rails ?? [];
  const slots = kit.outlines.slots ?? [];
  const centres = parts.find((p) => p.role === 'rail')?.positions ?? [];
  if (rails.length === 0 || rails.length !== slots.length || centres.length !== rails.length) return null;
  const i = middleOne(centres);
  const rail = rails[i]!;
  const slot = slots[i]!;
  const x = centres[i]![0];
  const h = request.dovetail.height;
  // Footprints are the widest outlines (rail top, slot roof); flanks are parallel, so the sideways gap is the same
  // at every height. The pin sits halfway up the flank, where the rail is as wide as the mean of root and top.
  const railTop = rail.maxX - x;
  const slotTop = slot.maxX - x;
  const railMid = (request.dovetail.rootWidth / 2 + railTop) / 2;
  const margin = Math.max(1.5, 0.25 * h);
  // Centred on the cut face like a key, though the rail is all above it: a camera level with z = 0 sends no ray
  // across the face behind the plane, where the rail's floor, half A's roof and half B's floor all lie.
  return {
    y: (rail.minY + rail.maxY) / 2,
    x,
    z: 0,
    width: 2 * (slotTop + margin),
    height: 2 * (h + margin),
    // Rails and slots run across the plane, and clipping one would open it: keep their whole length behind it.
    reach: slot.maxY - (rail.minY + rail.maxY) / 2 + margin,
    gapX: x + railMid + (slotTop - railTop) / 2,
    gapZ: h / 2,
  };
}
