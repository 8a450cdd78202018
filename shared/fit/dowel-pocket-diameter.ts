import { cleanFloat } from './clean-float';
import { isoFitClearance } from './iso-fit-clearance';

/** Diameters in mm of a pocket (the H hole) for a steel dowel pin. */
export interface DowelPocket {
  /** Smallest hole diameter in mm (the nominal size: an H hole never goes below it). */
  readonly min: number;
  /** Largest hole diameter in mm (nominal + IT of the hole grade). */
  readonly max: number;
  /** Middle of the hole's tolerance zone in mm: the diameter to aim for when reaming or modelling. */
  readonly nominal: number;
}

/**
 * The hole for a steel dowel pin, sized from an ISO 286 fit: the pin is the shaft of the fit, the pocket is
 * its H hole. These are machining limits; a printed pocket still needs the printing clearance on top
 * (see `resolveClearance`), because a printer does not hold micrometres.
 *
 * @param text - the fit, e.g. "10 H7/g6" (a 10 mm pin, a sliding fit)
 * @returns `{ min, max, nominal }` in mm
 * @throws SyntaxError or RangeError from {@link parseIsoFit} for text that is not a fit held here
 * @example
 * dowelPocketDiameter('10 H7/g6'); // { min: 10, max: 10.015, nominal: 10.0075 }
 */
export function dowelPocketDiameter(text: string): DowelPocket {
  const { size, hole } = isoFitClearance(text);
  // µm to mm; cleanFloat drops the float noise of 10 + 0.015.
  const min = cleanFloat(size + hole.lower / 1000);
  const max = cleanFloat(size + hole.upper / 1000);
  return { min, max, nominal: cleanFloat((min + max) / 2) };
}
