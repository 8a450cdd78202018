import type { Face } from '../../schemas/face';
import { faceBounds } from './face-bounds';
import type { Bounds, Footprint } from './footprint';
import { keyLayoutError } from './key-layout-error';
import { LAYOUT_EPS_MM } from './layout-tolerance';

/**
 * The box that holds every possible pocket centre: the face's box shrunk by half the pocket and
 * the margin on each side. Checks the plain size limits first and throws with the numbers, e.g.
 * "a 10 mm key with 3 mm walls needs a face at least 16.4 mm wide; this one is 12 mm".
 *
 * @param face - the cut face (mm)
 * @param footprint - the pocket outline (mm)
 * @param margin - minimum wall between pocket and face edge (mm)
 * @param keyLabel - how messages name the key, e.g. "a 10 mm key"
 * @returns the box of possible centres, in mm (may be a single point)
 * @throws GeometryError `FACE_TOO_SMALL` when the face is narrower, lower or smaller across than the pocket plus two walls
 * @example
 * centreBounds({ shape: 'rect', width: 80, height: 60 }, { kind: 'circle', diameter: 10 }, 3, 'an 8 mm key');
 * // { minX: -32, minY: -22, maxX: 32, maxY: 22 }
 */
export function centreBounds(face: Face, footprint: Footprint, margin: number, keyLabel: string): Bounds {
  const a = footprint.kind === 'rect' ? footprint.width / 2 : footprint.diameter / 2;
  const b = footprint.kind === 'rect' ? footprint.height / 2 : a;
  const tooSmall = (need: number, have: number, how: 'wide' | 'high' | 'across') =>
    keyLayoutError({ kind: 'too-small', keyLabel, margin, need, have, how });
  if (face.shape === 'circle') {
    const reach = footprint.kind === 'circle' ? a : Math.sqrt(a * a + b * b);
    const need = 2 * (reach + margin);
    if (face.diameter < need - LAYOUT_EPS_MM) throw tooSmall(need, face.diameter, 'across');
    const rim = face.diameter / 2 - margin;
    // Furthest a centre can go along x is with the pocket's far side on the rim at y = 0.
    const hx = Math.max(0, Math.sqrt(Math.max(0, rim * rim - b * b)) - a);
    const hy = Math.max(0, Math.sqrt(Math.max(0, rim * rim - a * a)) - b);
    const hr = Math.max(0, rim - a);
    return footprint.kind === 'circle'
      ? { minX: -hr, minY: -hr, maxX: hr, maxY: hr }
      : { minX: -hx, minY: -hy, maxX: hx, maxY: hy };
  }
  const box = faceBounds(face);
  const width = box.maxX - box.minX;
  const height = box.maxY - box.minY;
  if (width < 2 * (a + margin) - LAYOUT_EPS_MM) throw tooSmall(2 * (a + margin), width, 'wide');
  if (height < 2 * (b + margin) - LAYOUT_EPS_MM) throw tooSmall(2 * (b + margin), height, 'high');
  const hx = Math.max(0, width / 2 - a - margin);
  const hy = Math.max(0, height / 2 - b - margin);
  const cx = (box.minX + box.maxX) / 2;
  const cy = (box.minY + box.maxY) / 2;
  return { minX: cx - hx, minY: cy - hy, maxX: cx + hx, maxY: cy + hy };
}
