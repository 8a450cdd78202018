import type { Geom3 } from './solid/jscad-types';
import type { KeySectionParams } from './section/key-section';
import { keptFeature } from './min-feature';
import { keySection } from './section/key-section';
import { loftSolid } from './solid/loft-solid';
import type { LoftSlice } from './solid/loft-solid';

/** Parameters of a key pin, in mm. The cross-section fields are those of {@link KeySectionParams}. */
export interface KeyPinParams extends KeySectionParams {
  /** Length of the key along its axis (2 × pocket depth − end gap), mm. */
  readonly keyLength: number;
  /** Lead-in chamfer at both ends, 45°, mm. Default 0; below MIN_FEATURE_MM it is left off. Must stay below keyLength / 2. */
  readonly chamfer?: number;
  /** Uniform scale for the `scale` strategy, in (0, 1]; 1 = nominal size. Default 1. */
  readonly scale?: number;
}

/**
 * A key pin in place in the joint: its axis along z, centred on the origin, so it reaches keyLength / 2
 * into each half (half A below z = 0, half B above). The cross-section is lofted corner to corner from a
 * chamfered end ring to the full section and back (no booleans), giving a closed, outward 2-manifold.
 * With `scale` < 1 the whole key (section, length and chamfers) is a scaled-down copy about the origin.
 *
 * @param params - see {@link KeyPinParams}
 * @returns the key as a JSCAD geom3
 * @example
 * keyPin({ shape: 'square', width: 10, keyLength: 15.6, chamfer: 0.4 }); // z from −7.8 to 7.8
 */
export function keyPin(params: KeyPinParams): Geom3 {
  const s = params.scale ?? 1;
  const chamfer = keptFeature(params.chamfer ?? 0);
  const half = params.keyLength / 2;
  const full = keySection(params);
  const slices: LoftSlice[] = [];
  if (chamfer > 0) {
    const end = keySection(params, chamfer);
    slices.push({ w: -half, ring: end }, { w: -half + chamfer, ring: full });
    slices.push({ w: half - chamfer, ring: full }, { w: half, ring: end });
  } else {
    slices.push({ w: -half, ring: full }, { w: half, ring: full });
  }
  return loftSolid(slices, (u, v, w) => [u * s, v * s, w * s]);
}
