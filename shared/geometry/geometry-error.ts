/**
 * Codes for geometry that passed the schema but cannot be built. A closed list, so the API can map
 * every one to a 422 and the client can explain it.
 */
export const geometryErrorCodes = [
  'FACE_TOO_SMALL',
  'NO_ROOM_FOR_KEYS',
  'TOO_MANY_KEYS',
  'WALL_TOO_THIN',
  'RAIL_DOES_NOT_FIT',
  'POLYGON_INVALID',
  'WORK_LIMIT',
  'KEY_TOO_SMALL',
] as const;
export type GeometryErrorCode = (typeof geometryErrorCodes)[number];

/**
 * Thrown by a builder when the requested geometry is impossible. The message is for the user and
 * carries the numbers ("a 10 mm key with 3 mm walls needs a face at least 16.4 mm wide; this one is 12 mm").
 */
export class GeometryError extends Error {
  readonly code: GeometryErrorCode;

  constructor(code: GeometryErrorCode, message: string) {
    super(message);
    this.name = 'GeometryError';
    this.code = code;
  }
}
