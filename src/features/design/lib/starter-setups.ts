import type { Face } from '../../../../shared/schemas/face';
import type { PresetSettingsInput } from '../../../../shared/schemas/preset-settings';

/** A ready-made setup anyone can start from, signed in or not: a typical part's joint, face and fit. */
export interface StarterSetup {
  readonly id: string;
  readonly name: string;
  /** What it suits, in a maker's words. */
  readonly detail: string;
  readonly settings: PresetSettingsInput;
  readonly face: Face;
}

// Sizes are common practice for printed registration keys and dovetails (no published source): keys about a
// tenth to a fifth of the face's short side, pockets deep enough to hold (≈ 0.8 × the key's width), walls of
// at least 2 mm, snug fits for glued seams, slide fits for parts that come apart.
export const STARTER_SETUPS: readonly StarterSetup[] = [
  {
    id: 'figure-seam',
    name: 'Figure seam, glued',
    detail: 'Four round 5 mm keys with a flat in a 40 × 30 mm cut, snug in PLA.',
    face: { shape: 'rect', width: 40, height: 30 },
    settings: {
      joint: 'key',
      material: 'PLA',
      fit: 'snug',
      key: { shape: 'round', width: 5, depth: 4, count: 4, margin: 2, flat: 0.5 },
    },
  },
  {
    id: 'helmet-seam',
    name: 'Helmet or armour seam, glued',
    detail: 'Eight square 10 mm keys in a 160 mm round cut, snug in PLA.',
    face: { shape: 'circle', diameter: 160 },
    settings: {
      joint: 'key',
      material: 'PLA',
      fit: 'snug',
      key: { shape: 'square', width: 10, depth: 8, count: 8, margin: 3 },
    },
  },
  {
    id: 'removable-base',
    name: 'Removable display base',
    detail: 'Two dovetail rails with an end stop in a 120 × 80 mm cut, sliding in PETG.',
    face: { shape: 'rect', width: 120, height: 80 },
    settings: {
      joint: 'dovetail',
      material: 'PETG',
      fit: 'slide',
      dovetail: { rootWidth: 12, height: 6, slope: 6, count: 2, endStop: true },
    },
  },
  {
    id: 'resin-detail',
    name: 'Small resin part, press fit',
    detail: 'Three hexagonal 4 mm keys in a 24 × 18 mm cut, pressed in standard resin.',
    face: { shape: 'rect', width: 24, height: 18 },
    settings: {
      joint: 'key',
      material: 'resin-standard',
      fit: 'press',
      key: { shape: 'hex', width: 4, depth: 3, count: 3, margin: 2 },
    },
  },
];
