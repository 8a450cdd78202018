import { z } from 'zod';
import { countField, mmField, num, tooFine } from './kit-number-fields';

/** Most rails one kit may ask for: caps the work one request can ask for. */
export const MAX_RAIL_COUNT = 16;
/** Default dovetail slope 1:6, the softwood norm (REFERENCES §6: Popular Woodworking, Lee Valley). */
export const DEFAULT_DOVETAIL_SLOPE = 6;
/** Steepest slope accepted: 1:2 (26.565° from the vertical). */
export const MIN_DOVETAIL_SLOPE = 2;
/** Shallowest slope accepted: 1:20 (2.862° from the vertical). */
export const MAX_DOVETAIL_SLOPE = 20;

const degrees = (slope: number) => (Math.atan(1 / slope) * 180) / Math.PI;
const MAX_ANGLE_DEG = Math.ceil(degrees(MIN_DOVETAIL_SLOPE) * 100) / 100;
const MIN_ANGLE_DEG = Math.floor(degrees(MAX_DOVETAIL_SLOPE) * 100) / 100;

const dovetailFields = {
  rootWidth: mmField('dovetail root width', { min: 2, max: 100 }),
  height: mmField('dovetail height', { min: 1, max: 50 }),
  slope: mmField('dovetail slope (the n of 1:n)', { min: MIN_DOVETAIL_SLOPE, max: MAX_DOVETAIL_SLOPE }, '').optional(),
  angleDeg: mmField('dovetail angle', { min: MIN_ANGLE_DEG, max: MAX_ANGLE_DEG }, '°').optional(),
  length: mmField('dovetail length', { min: 4, max: 2000 }).optional(),
  count: countField('dovetail count', MAX_RAIL_COUNT).default(1),
  pitch: mmField('dovetail pitch', { above: 0, max: 2000 }).optional(),
  endStop: z.boolean({ error: () => 'dovetail endStop must be true or false' }).default(false),
  endStopWall: mmField('dovetail end stop wall', { min: 0.5, max: 50 }).default(3),
  chamfer: mmField('dovetail chamfer', { min: 0, max: 20 }).optional(),
  margin: mmField('dovetail margin (the wall beside each slot)', { min: 0.4, max: 50 }).default(2),
};

type DovetailFields = z.output<z.ZodObject<typeof dovetailFields>>;

function checkDovetail(d: DovetailFields, ctx: z.RefinementCtx): void {
  tooFine(ctx, ['chamfer'], 'dovetail chamfer', d.chamfer);
  // Both may be sent (a resolved request carries both); they must then describe the same slope.
  if (d.slope !== undefined && d.angleDeg !== undefined && Math.abs(degrees(d.slope) - d.angleDeg) > 0.01) {
    ctx.addIssue({
      code: 'custom',
      path: ['angleDeg'],
      message: `dovetail slope 1:${num(d.slope)} is ${num(degrees(d.slope))}°, not ${num(d.angleDeg)}°: give the slope as a ratio ("slope") or as an angle ("angleDeg")`,
    });
  }
  const c = d.chamfer;
  if (c !== undefined && d.rootWidth >= 2 && c > 0.4 * d.rootWidth) {
    ctx.addIssue({
      code: 'custom',
      path: ['chamfer'],
      message: `dovetail chamfer ${num(c)} mm is more than 40 % of the ${num(d.rootWidth)} mm root width (${num(0.4 * d.rootWidth)} mm)`,
    });
  } else if (c !== undefined && d.height >= 1 && c > d.height / 2) {
    ctx.addIssue({
      code: 'custom',
      path: ['chamfer'],
      message: `dovetail chamfer ${num(c)} mm is more than half the ${num(d.height)} mm rail height (${num(d.height / 2)} mm)`,
    });
  } else if (c !== undefined && d.length !== undefined && d.length >= 4 && 4 * c >= d.length) {
    ctx.addIssue({
      code: 'custom',
      path: ['chamfer'],
      message: `dovetail chamfer ${num(c)} mm is a quarter or more of the ${num(d.length)} mm rail length; keep it below ${num(d.length / 4)} mm`,
    });
  }
  if (d.pitch !== undefined && d.count === 1) {
    ctx.addIssue({
      code: 'custom',
      path: ['pitch'],
      message: 'dovetail pitch is the spacing between rails; it needs a count of 2 or more',
    });
  }
}

/**
 * A sliding dovetail's options, lengths in mm. Rails run along y and are spaced along x; each rises from
 * the face (z = 0) with a trapezoid `rootWidth` wide at the face and wider at the top by 2 × height / slope.
 * The slope is a ratio 1:`slope` (1:6 softwood, 1:8 hardwood) or an angle `angleDeg` from the vertical;
 * give either (both only if they agree within 0.01°); default 1:6. Both come back resolved: slope 6 ⇔
 * angleDeg 9.462, and a resolved request parses again to itself.
 *
 * Defaults: count 1; pitch spreads the rails evenly across the face; length as long as the face allows at
 * each rail; endStop false (wall 3 mm when on); chamfer 0.5 mm (at most 10 % of the root width and a
 * quarter of the height); margin 2 mm. Unknown fields are rejected.
 *
 * @example
 * dovetailOptionsSchema.parse({ rootWidth: 10, height: 6 }).angleDeg; // 9.4623…
 */
export const dovetailOptionsSchema = z
  .strictObject(dovetailFields, {
    error: (iss) => {
      if (iss.code === 'unrecognized_keys')
        return `unknown dovetail option${iss.keys.length > 1 ? 's' : ''} ${iss.keys.map((k) => `"${k}"`).join(', ')}: check the spelling`;
      return iss.input === undefined
        ? 'a dovetail joint needs a "dovetail" object with rootWidth and height'
        : '"dovetail" must be an object';
    },
  })
  .superRefine(checkDovetail)
  .transform((d) => {
    const fromAngle = (deg: number) => 1 / Math.tan((deg * Math.PI) / 180);
    // Clamped: the angle bounds are rounded outward to 0.01°, the slope must still parse again.
    const slope =
      d.slope ??
      (d.angleDeg !== undefined
        ? Math.min(Math.max(fromAngle(d.angleDeg), MIN_DOVETAIL_SLOPE), MAX_DOVETAIL_SLOPE)
        : DEFAULT_DOVETAIL_SLOPE);
    const chamfer = d.chamfer ?? Math.min(0.5, Math.floor(10 * d.rootWidth) / 100, Math.floor(25 * d.height) / 100);
    return { ...d, slope, angleDeg: d.angleDeg ?? degrees(slope), chamfer };
  });
/** Dovetail options as sent (defaults optional). */
export type DovetailOptionsInput = z.input<typeof dovetailOptionsSchema>;
/** Dovetail options with every default applied; `slope` and `angleDeg` both set. */
export type DovetailOptions = z.output<typeof dovetailOptionsSchema>;
