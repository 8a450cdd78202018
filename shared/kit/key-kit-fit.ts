import { clearanceForKeyScale, keyScaleForClearance, resolveClearance } from '../fit';
import { GeometryError } from '../geometry/geometry-error';
import type { ResolvedKeyKitRequest } from '../schemas/kit-request';

/** Smallest key scale built: below half size the key is a token, not a joint. */
const MIN_COMPUTED_SCALE = 0.5;

/** How a key kit's fit is made: the clearance, the key's print scale and how far the pockets grow. */
export interface KeyKitFit {
  /** Gap per side across the key width, mm (what the scale leaves, for strategy "scale"). */
  readonly clearancePerSide: number;
  /** Print scale of the key: 1 for strategy "clearance". */
  readonly keyScale: number;
  /** Growth of each pocket per side, mm: the clearance, or 0 for strategy "scale". */
  readonly pocketGrowth: number;
  readonly derivation: string;
  readonly steps: Array<{ label: string; mm: number; source: string }>;
  readonly warnings: string[];
}

/**
 * The fit of a key kit. Strategy "clearance": keys at nominal size, pockets grown by the fit engine's
 * clearance. Strategy "scale": pockets at nominal size, the key printed at `scale`, or at the scale that
 * leaves the fit engine's clearance, s = (w − 2c) / w; the clearance reported is then c = (1 − s)·w/2.
 *
 * @param request - a resolved key kit request
 * @returns see {@link KeyKitFit}
 * @throws GeometryError KEY_TOO_SMALL when strategy "scale" would print the key below half size
 * @example
 * keyKitFit(kitRequestSchema.parse({ …, key: { shape: 'square', width: 10, depth: 8, scale: 0.99 } }))
 * // { clearancePerSide: 0.05, keyScale: 0.99, pocketGrowth: 0, … }
 */
export function keyKitFit(request: ResolvedKeyKitRequest): KeyKitFit {
  const { process, material, fit, materialTuning, calibrationOffset, calibrationSource, clearance } = request;
  const resolved = resolveClearance({
    process,
    material,
    fit,
    materialTuning,
    calibrationOffset,
    calibrationSource,
    clearance,
  });
  const k = request.key;
  const common = { derivation: resolved.derivation, steps: resolved.steps, warnings: resolved.warnings };
  if (k.strategy !== 'scale') {
    return {
      ...common,
      clearancePerSide: resolved.clearancePerSide,
      keyScale: 1,
      pocketGrowth: resolved.clearancePerSide,
    };
  }
  const keyScale = k.scale ?? scaleForClearance(k.width, resolved.clearancePerSide);
  return { ...common, clearancePerSide: clearanceForKeyScale(k.width, keyScale), keyScale, pocketGrowth: 0 };
}

/** The print scale that leaves `clearance` per side on a key `width` wide; a GeometryError below half size. */
function scaleForClearance(width: number, clearance: number): number {
  const scale = 2 * clearance < width ? keyScaleForClearance(width, clearance) : 0;
  if (scale < MIN_COMPUTED_SCALE) {
    throw new GeometryError(
      'KEY_TOO_SMALL',
      `a ${clearance} mm clearance per side would print the ${width} mm key at ${Math.round(scale * 1000) / 10} % of its size; ` +
        `strategy "scale" needs a key at least ${Math.ceil(4 * clearance * 100) / 100} mm wide for this fit: use a wider key or strategy "clearance"`,
    );
  }
  return scale;
}
