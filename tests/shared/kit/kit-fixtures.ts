import type { KitRequest } from '../../../shared/schemas/kit-request';

type KeyBody = Extract<KitRequest, { joint: 'key' }>;
type DovetailBody = Extract<KitRequest, { joint: 'dovetail' }>;

/** The three reference kits of issue 3's benchmark, as request bodies. */
export const squareKeysBody: KeyBody = {
  joint: 'key',
  material: 'PLA',
  fit: 'snug',
  face: { shape: 'rect', width: 80, height: 60 },
  key: { shape: 'square', width: 10, depth: 8, count: 8 },
};

export const roundKeysBody: KeyBody = {
  joint: 'key',
  material: 'PETG',
  fit: 'snug',
  face: { shape: 'rect', width: 80, height: 60 },
  key: { shape: 'round', width: 8, depth: 8, count: 8, flat: 0.8, entryChamfer: 0.4 },
};

export const dovetailBody: DovetailBody = {
  joint: 'dovetail',
  material: 'PETG',
  fit: 'slide',
  face: { shape: 'rect', width: 90, height: 60 },
  dovetail: { rootWidth: 10, height: 6, count: 3 },
};
