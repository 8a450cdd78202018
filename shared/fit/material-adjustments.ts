import type { Material } from '../schemas/joint-options';

/** A per-material change to the default clearance, and how sure we are of it. */
export interface MaterialAdjustment {
  /** Added to the clearance per side, in mm (0 for the reference materials). */
  readonly mm: number;
  /** "common practice" or "from memory" (no published source for any of these). */
  readonly source: 'common practice' | 'from memory';
}

/**
 * Per-material adjustments to the clearance per side, in mm. None is published: the published ranges
 * (REFERENCES §7.2) do not split by material, so these are trade habits or recollection, marked as such.
 */
export const materialAdjustments: Readonly<Record<Material, MaterialAdjustment>> = {
  // Common practice: the reference filament most fit tests and published ranges are printed in.
  PLA: { mm: 0, source: 'common practice' },
  // Common practice: oozes and strings, so walls come out a little fat and mating faces grab.
  PETG: { mm: 0.02, source: 'common practice' },
  // From memory: shrinks and warps more than PLA (REFERENCES §7.1 gives 1.0–1.5 %, weak), holes close up.
  ABS: { mm: 0.02, source: 'from memory' },
  // From memory: behaves like ABS on the printer.
  ASA: { mm: 0.02, source: 'from memory' },
  // From memory: nylon takes up moisture after printing and swells.
  PA: { mm: 0.03, source: 'from memory' },
  // From memory: flexible filament drags and stretches rather than slides, and over-extrudes when pushed.
  TPU: { mm: 0.05, source: 'from memory' },
  // Common practice: the reference for the published resin ranges.
  'resin-standard': { mm: 0, source: 'common practice' },
  // From memory: no consistent difference from standard resin at these clearances.
  'resin-tough': { mm: 0, source: 'from memory' },
};
