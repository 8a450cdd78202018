// Face layout: where registration keys go on a cut face (plane z = 0, centred on the origin, mm).
export type { Bounds, Footprint, Point2 } from './footprint';
export { distanceToFaceEdge } from './distance-to-face-edge';
export { faceArea } from './face-area';
export { faceBounds } from './face-bounds';
export { faceSpanAtX } from './face-span-at-x';
export { MAX_KEYS, MIN_STAGGER_MM, placeKeys, type PlaceKeysParams } from './place-keys';
export { pointInFace } from './point-in-face';
export { validatePolygon } from './validate-polygon';
