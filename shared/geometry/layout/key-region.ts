import type { Face } from '../../schemas/face';
import { centreBounds } from './centre-bounds';
import type { Bounds, Footprint } from './footprint';
import { LAYOUT_EPS_MM } from './layout-tolerance';
import { pocketGap } from './pocket-gap';
import { pocketWallFunction, type WallFunction } from './pocket-wall-function';

/** Where pockets of one footprint may go on one face, and how close they may sit. Lengths in mm. */
export type KeyRegion = {
  readonly footprint: Footprint;
  /** Minimum wall, pocket to face edge and pocket to pocket (mm). */
  readonly margin: number;
  /** Every centre that fits lies in this box. */
  readonly bounds: Bounds;
  /** Wall between a pocket at (x, y) and the face edge (mm); negative when it does not fit (see `pocketWallFunction`). */
  readonly wall: WallFunction;
  /** Pocket at (x, y) keeps at least `margin` to the face edge. */
  readonly fits: (x: number, y: number) => boolean;
  /** Two pockets (dx, dy) apart keep at least `margin` between them. */
  readonly spaced: (dx: number, dy: number) => boolean;
  /** Pockets whose centres are farther apart than this (mm) always keep the margin: a cheap pre-check. */
  readonly clashDistance: number;
};

/** What the key pickers need to know about spacing. */
export type Spacing = Pick<KeyRegion, 'spaced' | 'clashDistance'>;

/**
 * Sets up the layout problem for one face, footprint and margin.
 *
 * @param face - the cut face (mm), a polygon already validated
 * @param footprint - the pocket outline (mm)
 * @param margin - minimum wall (mm), 0 or more
 * @param keyLabel - how messages name the key, e.g. "a 10 mm key"
 * @returns the region
 * @throws GeometryError `FACE_TOO_SMALL` when the face's size alone rules the pocket out
 * @example
 * const region = keyRegion({ shape: 'circle', diameter: 40 }, { kind: 'circle', diameter: 8 }, 2, 'an 8 mm key');
 * region.fits(0, 10); // true: 20 - 10 - 4 = 6 mm of wall
 */
export function keyRegion(face: Face, footprint: Footprint, margin: number, keyLabel: string): KeyRegion {
  const wall = pocketWallFunction(face, footprint);
  const least = margin - LAYOUT_EPS_MM;
  return {
    footprint,
    margin,
    bounds: centreBounds(face, footprint, margin, keyLabel),
    wall,
    fits: (x, y) => wall(x, y) >= least,
    spaced: (dx, dy) => pocketGap(footprint, dx, dy) >= least,
    // Corner to corner for rectangles, plus the margin on each axis: beyond that, no clash.
    clashDistance:
      footprint.kind === 'circle'
        ? footprint.diameter + margin
        : Math.sqrt((footprint.width + margin) ** 2 + (footprint.height + margin) ** 2),
  };
}
