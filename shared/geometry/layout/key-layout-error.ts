import { GeometryError } from '../geometry-error';
import { formatMm } from './format-mm';
import type { Footprint } from './footprint';

/** Why a key layout is impossible, with the numbers the message needs (lengths in mm). */
export type KeyLayoutFailure =
  | { kind: 'too-small'; keyLabel: string; margin: number; need: number; have: number; how: 'wide' | 'high' | 'across' }
  | { kind: 'no-spot'; keyLabel: string; margin: number; footprint: Footprint; bestWall: number }
  | { kind: 'too-many'; keyLabel: string; margin: number; footprint: Footprint; fit: number; asked: number }
  | { kind: 'over-cap'; cap: number; asked: number }
  | { kind: 'one-line'; keyLabel: string; margin: number; asked: number; room: number; needed: number };

/**
 * Builds the user-facing error for an impossible key layout. Needs are rounded up and what the
 * face has is rounded down, so the two numbers never look equal when the layout failed.
 *
 * @param failure - what went wrong and its numbers
 * @returns the GeometryError to throw (FACE_TOO_SMALL, TOO_MANY_KEYS or NO_ROOM_FOR_KEYS)
 * @example
 * keyLayoutError({ kind: 'too-small', keyLabel: 'a 10 mm key', margin: 3, need: 16.4, have: 12, how: 'wide' }).message;
 * // "a 10 mm key with 3 mm walls needs a face at least 16.4 mm wide; this one is 12 mm"
 */
export function keyLayoutError(failure: KeyLayoutFailure): GeometryError {
  const up = (mm: number) => formatMm(mm, 'up');
  const down = (mm: number) => formatMm(mm, 'down');
  switch (failure.kind) {
    case 'too-small': {
      const { keyLabel, margin, need, have, how } = failure;
      return new GeometryError(
        'FACE_TOO_SMALL',
        `${keyLabel} with ${formatMm(margin)} mm walls needs a face at least ${up(need)} mm ${how}; this one is ${down(have)} mm`,
      );
    }
    case 'no-spot':
      return new GeometryError('FACE_TOO_SMALL', noSpotMessage(failure));
    case 'too-many': {
      const { keyLabel, margin, footprint, fit, asked } = failure;
      const fits = fit === 1 ? '1 key fits' : `${fit} keys fit`;
      return new GeometryError(
        'TOO_MANY_KEYS',
        `only ${fits} on this face with ${formatMm(margin)} mm walls (${keyLabel}, ${pocketText(footprint)} pocket); ${asked} were asked for`,
      );
    }
    case 'over-cap':
      return new GeometryError(
        'TOO_MANY_KEYS',
        `at most ${failure.cap} keys can be placed on one face; ${failure.asked} were asked for`,
      );
    case 'one-line':
      return new GeometryError('NO_ROOM_FOR_KEYS', oneLineMessage(failure));
  }
}

function noSpotMessage(f: Extract<KeyLayoutFailure, { kind: 'no-spot' }>): string {
  const walls = `${f.keyLabel} with ${formatMm(f.margin)} mm walls`;
  if (f.footprint.kind === 'circle') {
    const r = f.footprint.diameter / 2;
    return (
      `${walls} needs a spot at least ${formatMm(r + f.margin, 'up')} mm from every edge of the face; ` +
      `the roomiest spot found on this face is ${formatMm(Math.max(0, f.bestWall + r), 'down')} mm from its nearest edge`
    );
  }
  const need = `${walls} needs room for its ${pocketText(f.footprint)} pocket with ${formatMm(f.margin)} mm of wall all round`;
  return f.bestWall < 0
    ? `${need}; the pocket does not fit anywhere on this face`
    : `${need}; the roomiest spot found on this face leaves ${formatMm(f.bestWall, 'down')} mm`;
}

function oneLineMessage(f: Extract<KeyLayoutFailure, { kind: 'one-line' }>): string {
  const head = `${f.asked} keys (${f.keyLabel} with ${formatMm(f.margin)} mm walls) would all sit on one line`;
  const tail = 'ask for 2 keys or use a wider face';
  return f.room < f.needed
    ? `${head}: this face leaves ${formatMm(f.room, 'down')} mm across that line to stagger them, at least ${formatMm(f.needed)} mm is needed; ${tail}`
    : `${head}: no staggered layout with at least ${formatMm(f.needed)} mm between the line and a key was found; ${tail}`;
}

function pocketText(footprint: Footprint): string {
  return footprint.kind === 'circle'
    ? `${formatMm(footprint.diameter)} mm round`
    : `${formatMm(footprint.width)} × ${formatMm(footprint.height)} mm`;
}
