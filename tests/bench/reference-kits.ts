import type { KitRequest } from '../../shared/schemas/kit-request';

/** The three reference kits of the speed targets (issue 3), also used by the preview's measurements. */
export const referenceKits: Array<{ name: string; request: KitRequest }> = [
  {
    name: '8 square 10 mm keys, 80 × 60 face',
    request: {
      joint: 'key',
      material: 'PLA',
      fit: 'snug',
      face: { shape: 'rect', width: 80, height: 60 },
      key: { shape: 'square', width: 10, depth: 8, count: 8 },
    },
  },
  {
    name: '8 round 8 mm keys, 80 × 60 face',
    request: {
      joint: 'key',
      material: 'PLA',
      fit: 'snug',
      face: { shape: 'rect', width: 80, height: 60 },
      key: { shape: 'round', width: 8, depth: 8, count: 8 },
    },
  },
  {
    name: '3 dovetail rails, 90 mm face',
    request: {
      joint: 'dovetail',
      material: 'PLA',
      fit: 'snug',
      face: { shape: 'rect', width: 90, height: 90 },
      dovetail: { rootWidth: 12, height: 6, count: 3 },
    },
  },
];
