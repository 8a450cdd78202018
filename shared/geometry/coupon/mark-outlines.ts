import jscad from '@jscad/modeling';
import type { Vec2 } from '../units';

const { vectorText } = jscad.text;

/** Stroke width of engraved marks, mm: two passes of a 0.4 mm nozzle (common practice). */
export const MARK_STROKE_MM = 0.8;
/** Height of engraved digits, mm: legible by eye and printable at a 0.4 mm nozzle (common practice). */
export const MARK_HEIGHT_MM = 5;

/**
 * The outline of a mark's text as stroke quads: each straight piece of JSCAD's single-line vector font becomes
 * a rectangle `stroke` wide, extended by half a stroke at both ends so strokes overlap at their joints. The
 * quads overlap; fill them with a non-zero rule (their union). Centred on `centre`, `height` tall.
 *
 * @param text - the mark, e.g. "3"
 * @param centre - where the text's centre lies on the plate, mm
 * @param height - cap height in mm; default {@link MARK_HEIGHT_MM}
 * @param stroke - stroke width in mm; default {@link MARK_STROKE_MM}
 * @returns counter-clockwise quads [x, y] in mm
 * @example
 * markOutlines('1', [0, 0]).length; // one quad per straight piece of the digit
 */
export function markOutlines(text: string, centre: Vec2, height = MARK_HEIGHT_MM, stroke = MARK_STROKE_MM): Vec2[][] {
  const lines = vectorText({ height, xOffset: 0, yOffset: 0 }, text) as Array<Array<[number, number]>>;
  const points = lines.flat();
  const xs = points.map((p) => p[0]);
  const ys = points.map((p) => p[1]);
  const dx = centre[0] - (Math.min(...xs) + Math.max(...xs)) / 2;
  const dy = centre[1] - (Math.min(...ys) + Math.max(...ys)) / 2;
  const quads: Vec2[][] = [];
  for (const line of lines) {
    for (let i = 0; i + 1 < line.length; i++) {
      const quad = strokeQuad(line[i]!, line[i + 1]!, stroke / 2);
      if (quad) quads.push(quad.map(([x, y]) => [x + dx, y + dy] as Vec2));
    }
  }
  return quads;
}

function strokeQuad(a: readonly [number, number], b: readonly [number, number], half: number): Vec2[] | null {
  const length = Math.hypot(b[0] - a[0], b[1] - a[1]);
  if (length < 1e-9) return null;
  const ux = (b[0] - a[0]) / length;
  const uy = (b[1] - a[1]) / length;
  const [sx, sy] = [a[0] - ux * half, a[1] - uy * half];
  const [ex, ey] = [b[0] + ux * half, b[1] + uy * half];
  const [nx, ny] = [-uy * half, ux * half];
  return [
    [sx - nx, sy - ny],
    [ex - nx, ey - ny],
    [ex + nx, ey + ny],
    [sx + nx, sy + ny],
  ];
}
