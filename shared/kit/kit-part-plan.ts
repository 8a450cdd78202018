import type { Geom3 } from '../geometry/solid/jscad-types';
import type { KitPart } from './kit-manifest';

/**
 * One file of a kit before it is meshed: the solid plus what the manifest says about it.
 *
 * @example
 * const plan: KitPartPlan = { file: 'key.stl', role: 'key', quantity: 8, solid, note: 'print 8' };
 */
export interface KitPartPlan {
  readonly file: string;
  readonly role: KitPart['role'];
  readonly half?: 'A' | 'B';
  readonly quantity: number;
  readonly solid: Geom3;
  readonly positions?: Array<[number, number]>;
  readonly note: string;
}

/**
 * Everything a joint family contributes to a kit: its files, the clearance it was built with, warnings and
 * derived sizes (mm) for the manifest, and its lines of the README and print notes.
 *
 * @example
 * const plan = keyKitPlan(request); plan.parts.map((p) => p.file); // ['key.stl', 'pocket-cutter-A.stl', …]
 */
export interface KitPlan {
  readonly parts: KitPartPlan[];
  readonly clearancePerSide: number;
  readonly keyScale?: number;
  readonly derivation: string;
  readonly steps: Array<{ label: string; mm: number; source: string }>;
  readonly warnings: string[];
  readonly derived: Record<string, number>;
  readonly printNotes: string[];
}
