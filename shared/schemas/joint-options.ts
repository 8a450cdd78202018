import { z } from 'zod';

/**
 * How the part is printed. `fdm` lays down melted filament; `resin` cures liquid photopolymer.
 * The process sets which published clearance ranges apply.
 */
export const processSchema = z.enum(['fdm', 'resin'], {
  error: () => 'process must be "fdm" or "resin"',
});
export type Process = z.infer<typeof processSchema>;

/** Built-in base materials. Team materials (a later feature) refer to one of these. */
export const materialSchema = z.enum(['PLA', 'PETG', 'ABS', 'ASA', 'PA', 'TPU', 'resin-standard', 'resin-tough'], {
  error: () => 'material must be one of PLA, PETG, ABS, ASA, PA, TPU, resin-standard, resin-tough',
});
export type Material = z.infer<typeof materialSchema>;

/**
 * How the joint should hold.
 * - `press`: permanent, pushed in with force, no glue gap.
 * - `snug`: aligns exactly and is glued.
 * - `slide`: removable by hand.
 */
export const fitClassSchema = z.enum(['press', 'snug', 'slide'], {
  error: () => 'fit must be "press", "snug" or "slide"',
});
export type FitClass = z.infer<typeof fitClassSchema>;
