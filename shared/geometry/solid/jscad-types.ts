import type jscad from '@jscad/modeling';

/**
 * JSCAD's solid and polygon types, taken from its public API rather than from `@jscad/modeling/src/…` (a
 * deep import that the lint rules forbid in shared/, since the pattern matches any `src/` folder).
 *
 * @example
 * const solid: Geom3 = jscad.geometries.geom3.create();
 */
export type Geom3 = ReturnType<typeof jscad.geometries.geom3.create>;

/** A JSCAD convex polygon with its corners in order; see {@link Geom3}. */
export type Poly3 = ReturnType<typeof jscad.geometries.poly3.create>;
