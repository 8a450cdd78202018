import { serialize } from '@jscad/stl-serializer';
import type { Geom3 } from '../../../shared/geometry/solid/jscad-types';
import { STLLoader } from 'three/examples/jsm/loaders/STLLoader.js';

/** The reference writer's binary STL for a solid (@jscad/stl-serializer 2.1.23), as one byte array. */
export function referenceStl(solid: Geom3): Uint8Array {
  const parts = serialize({ binary: true }, solid) as ArrayBuffer[];
  const out = new Uint8Array(parts.reduce((n, b) => n + b.byteLength, 0));
  let at = 0;
  for (const b of parts) {
    out.set(new Uint8Array(b), at);
    at += b.byteLength;
  }
  return out;
}

/** A plain binary STL reader over a DataView: the count and, per facet, the 12 floats of its record. */
export function readBinaryStl(bytes: Uint8Array): { header: string; count: number; records: Float32Array } {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const count = view.getUint32(80, true);
  const records = new Float32Array(count * 12);
  for (let t = 0; t < count; t++) {
    for (let k = 0; k < 12; k++) records[t * 12 + k] = view.getFloat32(84 + 50 * t + 4 * k, true);
  }
  return { header: new TextDecoder().decode(bytes.subarray(0, 80)), count, records };
}

/** Parses STL bytes (binary or ASCII) with three.js's STLLoader, an independent reader; returns its positions. */
export function threeParse(bytes: Uint8Array | string): Float32Array {
  const input = typeof bytes === 'string' ? bytes : bytes.slice().buffer;
  const geometry = new STLLoader().parse(input);
  return geometry.getAttribute('position').array as Float32Array;
}
