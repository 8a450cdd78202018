import { keyOnBed } from '../geometry/key-on-bed';
import { keyPin } from '../geometry/key-pin';
import { placeKeys } from '../geometry/layout';
import { pocketCutter, type PocketCutterParams } from '../geometry/pocket-cutter';
import type { KeySectionParams } from '../geometry/section/key-section';
import { pocketSection } from '../geometry/section/pocket-section';
import { mergeSolids } from '../geometry/solid/merge-solids';
import type { Vec2 } from '../geometry/units';
import { keyLengthOf } from '../schemas/kit-key-options';
import type { ResolvedKeyKitRequest } from '../schemas/kit-request';
import { keyFootprint, keyLabel } from './key-footprint';
import { keyKitFit } from './key-kit-fit';
import { keyPrintNotes, keyWarnings } from './key-kit-notes';
import type { KitPartPlan, KitPlan } from './kit-part-plan';

const round = (mm: number) => Math.round(mm * 1000) / 1000;

/**
 * Plans a key kit: the clearance (fit engine, or the key scale for strategy "scale"), the layout of the
 * pockets on the face, one key to print `count` times, and one pocket cutter per half holding every pocket
 * in place. Pure: the same request gives the same solids.
 *
 * @param request - a resolved kit request with `joint: 'key'`
 * @returns the kit's files as solids plus its manifest numbers, see {@link KitPlan}
 * @throws GeometryError when the keys do not fit on the face, or KEY_TOO_SMALL when strategy "scale" would
 *   print the key below half size (numbers in the message)
 * @example
 * keyKitPlan(kitRequestSchema.parse({ joint: 'key', material: 'PLA', fit: 'snug',
 *   face: { shape: 'rect', width: 80, height: 60 }, key: { shape: 'square', width: 10, depth: 8, count: 8 } }))
 *   .parts[0].quantity; // 8
 */
export function keyKitPlan(request: ResolvedKeyKitRequest): KitPlan {
  const k = request.key;
  const fit = keyKitFit(request);
  const sectionParams: KeySectionParams = { ...k, chordTolerance: request.chordTolerance };
  // The key is keySection (a round one inscribed in its circle), the pocket pocketSection (a round one
  // circumscribing it), so no gap is below the clearance; square, rect and hex use the key's section.
  const outline = pocketSection(sectionParams);
  const keyLength = keyLengthOf(k);
  const pocket = {
    section: outline,
    clearance: fit.pocketGrowth,
    depth: keyLength / 2 + k.bottomGap,
    entryChamfer: k.entryChamfer,
  };
  const footprint = keyFootprint(outline, fit.pocketGrowth + k.entryChamfer, k.shape === 'round');
  const positions = placeKeys({
    face: request.face,
    footprint,
    margin: k.margin,
    count: k.count,
    keyLabel: keyLabel(k),
  });
  const key = keyOnBed(keyPin({ ...sectionParams, keyLength, chamfer: k.chamfer, scale: fit.keyScale }));
  const n = positions.length;
  return {
    parts: [keyPart(key, n), cutterPart('A', pocket, positions), cutterPart('B', pocket, positions)],
    clearancePerSide: fit.clearancePerSide,
    ...(k.strategy === 'scale' ? { keyScale: fit.keyScale } : {}),
    derivation: fit.derivation,
    steps: fit.steps,
    warnings: [...fit.warnings, ...keyWarnings(k, fit.keyScale, fit.clearancePerSide)],
    derived: {
      keyCount: n,
      keyLength: round(keyLength * fit.keyScale),
      pocketDepth: round(pocket.depth),
      pocketGrowthPerSide: fit.pocketGrowth,
    },
    printNotes: keyPrintNotes(k, n, fit.keyScale),
  };
}

function keyPart(solid: KitPartPlan['solid'], n: number): KitPartPlan {
  const note = `print ${n} of this key lying down as it is in the file; each key goes half into a pocket of half A and half into the matching pocket of half B`;
  return { file: 'key.stl', role: 'key', quantity: n, solid, note };
}

/** One half's cutter file: every pocket in place, merged without booleans (the layout keeps them apart). */
function cutterPart(
  half: 'A' | 'B',
  pocket: Omit<PocketCutterParams, 'half' | 'position'>,
  positions: Vec2[],
): KitPartPlan {
  const solid = mergeSolids(positions.map((position) => pocketCutter({ ...pocket, half, position })));
  const where = half === 'A' ? 'below' : 'above';
  const note = `subtract from half ${half} (${where} the cut face): ${positions.length} pockets ${round(pocket.depth)} mm deep`;
  const copy = positions.map(([x, y]) => [x, y] as [number, number]);
  return { file: `pocket-cutter-${half}.stl`, role: 'pocket-cutter', half, quantity: 1, solid, positions: copy, note };
}
