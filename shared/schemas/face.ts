import { z } from 'zod';

/** Largest face side or diameter Seamwright accepts, in mm (a 2 m part is already far past any printer). */
export const MAX_FACE_SIZE_MM = 2000;
/** Most points a polygon face may have; caps the work one request can ask for. */
export const MAX_POLYGON_POINTS = 1000;

const length = (what: string) =>
  z
    .number({ error: () => `${what} must be a number in mm` })
    .finite({ error: () => `${what} must be a finite number in mm` })
    .positive({ error: () => `${what} must be greater than 0 mm` })
    .max(MAX_FACE_SIZE_MM, { error: () => `${what} must be at most ${MAX_FACE_SIZE_MM} mm` });

const coordinate = z
  .number({ error: () => 'each point coordinate must be a number in mm' })
  .finite({ error: () => 'each point coordinate must be a finite number in mm' })
  .min(-MAX_FACE_SIZE_MM)
  .max(MAX_FACE_SIZE_MM);

/** A rectangular cut face, centred on the origin: width along x, height along y, in mm. */
export const rectFaceSchema = z.object({
  shape: z.literal('rect'),
  width: length('face width'),
  height: length('face height'),
});

/** A round cut face centred on the origin, in mm. */
export const circleFaceSchema = z.object({
  shape: z.literal('circle'),
  diameter: length('face diameter'),
});

/**
 * A polygon cut face: points [x, y] in mm in the cut plane, convex or not, in either winding.
 * Self-intersection is checked by the geometry layer (it needs more than a field check).
 */
export const polygonFaceSchema = z.object({
  shape: z.literal('polygon'),
  points: z
    .array(z.tuple([coordinate, coordinate]), {
      error: () => 'face points must be a list of [x, y] pairs in mm',
    })
    .min(3, { error: () => 'a polygon face needs at least 3 points' })
    .max(MAX_POLYGON_POINTS, {
      error: () => `a polygon face may have at most ${MAX_POLYGON_POINTS} points`,
    }),
});

/** The cut face: the plane z = 0 where the model was split, centred on the origin. */
export const faceSchema = z.discriminatedUnion('shape', [rectFaceSchema, circleFaceSchema, polygonFaceSchema], {
  error: () => 'face.shape must be "rect", "circle" or "polygon"',
});
export type Face = z.infer<typeof faceSchema>;
export type RectFace = z.infer<typeof rectFaceSchema>;
export type CircleFace = z.infer<typeof circleFaceSchema>;
export type PolygonFace = z.infer<typeof polygonFaceSchema>;
