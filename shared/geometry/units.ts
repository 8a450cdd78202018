/**
 * Branded number types for units inside `shared/`, so a degrees-for-radians slip is a compile error.
 * Lengths are plain numbers in millimetres everywhere in Seamwright; angles are branded.
 */

/** An angle in radians. Make one with {@link degreesToRadians} or {@link radians}. */
export type Radians = number & { readonly __unit: 'radians' };

/** A 2D point [x, y] in mm. */
export type Vec2 = readonly [number, number];

/** A 3D point [x, y, z] in mm. */
export type Vec3 = readonly [number, number, number];

/**
 * Converts degrees (as a form or the API shows them) to radians.
 *
 * @param degrees - angle in degrees
 * @returns the angle in radians
 * @example
 * degreesToRadians(90); // π/2
 */
export function degreesToRadians(degrees: number): Radians {
  return ((degrees * Math.PI) / 180) as Radians;
}

/**
 * Brands a number that already holds radians.
 *
 * @param value - angle in radians
 * @returns the same number, typed as radians
 * @example
 * radians(Math.atan(1 / 6)); // the flank angle of a 1:6 dovetail
 */
export function radians(value: number): Radians {
  return value as Radians;
}
