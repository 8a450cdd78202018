// The joint engine's geometry: pure builders over @jscad/modeling (the only place it is imported), meshes out
// as plain typed arrays, and the STL writers. Millimetres; the cut face is the plane z = 0 (see KIT_FRAME).
export { keyPin, type KeyPinParams } from './key-pin';
export { keyOnBed } from './key-on-bed';
export { pocketCutter, CUTTER_OVERSHOOT_MM, type PocketCutterParams } from './pocket-cutter';
export { dovetailRail, type DovetailRailParams } from './dovetail-rail';
export { dovetailSlotCutter, type DovetailSlotCutterParams } from './dovetail-slot-cutter';
export { placeRails, type PlaceRailsParams, type RailPlacement } from './place-rails';
export { keySection, type KeySectionParams, type KeyShape } from './section/key-section';
export { pocketSection } from './section/pocket-section';
export { dovetailSection, type DovetailSectionParams } from './section/dovetail-section';
export { offsetConvexPolygon } from './section/offset-convex-polygon';
export { segmentsForRadius, MIN_ROUND_SEGMENTS, MAX_ROUND_SEGMENTS } from './section/segments-for-radius';
export { loftSolid, type LoftSlice, type LoftPlacement } from './solid/loft-solid';
export { mergeSolids } from './solid/merge-solids';
export type { Geom3, Poly3 } from './solid/jscad-types';
export { MIN_FEATURE_MM, keptFeature } from './min-feature';
export { degreesToRadians, radians, type Radians, type Vec2, type Vec3 } from './units';
export { GeometryError, geometryErrorCodes, type GeometryErrorCode } from './geometry-error';
export * from './mesh';
export * from './stl';
