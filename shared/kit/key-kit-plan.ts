import { clearanceForKeyScale, keyScaleForClearance, resolveClearance } from '../fit';
import { keyOnBed } from '../geometry/key-on-bed';
import { keyPin } from '../geometry/key-pin';
import { placeKeys } from '../geometry/layout';
import { pocketCutter } from '../geometry/pocket-cutter';
import { keySection } from '../geometry/section/key-section';
import { mergeSolids } from '../geometry/solid/merge-solids';
import { keyLengthOf } from '../schemas/kit-key-options';
import type { ResolvedKeyKitRequest } from '../schemas/kit-request';
import { keyFootprint, keyLabel } from './key-footprint';
import { keyPrintNotes, keyWarnings } from './key-kit-notes';
import type { KitPartPlan, KitPlan } from './kit-part-plan';

/**
 * Plans a key kit: the clearance (fit engine, or the key scale for strategy "scale"), the layout of the
 * pockets on the face, one key to print `count` times, and one pocket cutter per half holding every pocket
 * in place. Pure: the same request gives the same solids.
 *
 * @param request - a resolved kit request with `joint: 'key'`
 * @returns the kit's files as solids plus its manifest numbers, see {@link KitPlan}
 * @throws GeometryError when the keys do not fit on the face (numbers in the message)
 * @example
 * keyKitPlan(kitRequestSchema.parse({ joint: 'key', material: 'PLA', fit: 'snug',
 *   face: { shape: 'rect', width: 80, height: 60 }, key: { shape: 'square', width: 10, depth: 8, count: 8 } }))
 *   .parts[0].quantity; // 8
 */
export function keyKitPlan(request: ResolvedKeyKitRequest): KitPlan {
  const k = request.key;
  const fit = resolveClearance({ process: request.process, material: request.material, fit: request.fit, calibrationOffset: request.calibrationOffset, clearance: request.clearance });
  const scaled = k.strategy === 'scale';
  const keyScale = !scaled ? 1 : (k.scale ?? keyScaleForClearance(k.width, fit.clearancePerSide));
  const clearancePerSide = scaled ? clearanceForKeyScale(k.width, keyScale) : fit.clearancePerSide;
  const pocketGrowth = scaled ? 0 : clearancePerSide;
  const sectionParams = { shape: k.shape, width: k.width, length: k.length, flat: k.flat, chordTolerance: request.chordTolerance };
  const section = keySection(sectionParams);
  const keyLength = keyLengthOf(k);
  const pocketDepth = keyLength / 2 + k.bottomGap;
  const footprint = keyFootprint(section, pocketGrowth + k.entryChamfer, k.shape === 'round');
  const positions = placeKeys({ face: request.face, footprint, margin: k.margin, count: k.count, keyLabel: keyLabel(k) });
  const key = keyOnBed(keyPin({ ...sectionParams, keyLength, chamfer: k.chamfer, scale: keyScale }));
  const cutter = (half: 'A' | 'B') =>
    mergeSolids(positions.map((position) => pocketCutter({ section, clearance: pocketGrowth, depth: pocketDepth, entryChamfer: k.entryChamfer, half, position })));
  const n = positions.length;
  const parts: KitPartPlan[] = [
    { file: 'key.stl', role: 'key', quantity: n, solid: key, note: `print ${n} of this key lying down as it is in the file; each key goes half into a pocket of half A and half into the matching pocket of half B` },
    { file: 'pocket-cutter-A.stl', role: 'pocket-cutter', half: 'A', quantity: 1, solid: cutter('A'), positions, note: `subtract from half A (below the cut face): ${n} pockets ${round(pocketDepth)} mm deep` },
    { file: 'pocket-cutter-B.stl', role: 'pocket-cutter', half: 'B', quantity: 1, solid: cutter('B'), positions, note: `subtract from half B (above the cut face): ${n} pockets ${round(pocketDepth)} mm deep` },
  ];
  const derived: Record<string, number> = { keyCount: n, keyLength: round(keyLength * keyScale), pocketDepth: round(pocketDepth), pocketGrowthPerSide: pocketGrowth };
  return {
    parts,
    clearancePerSide,
    ...(scaled ? { keyScale } : {}),
    derivation: fit.derivation,
    steps: fit.steps,
    warnings: [...fit.warnings, ...keyWarnings(k, keyScale, clearancePerSide)],
    derived,
    printNotes: keyPrintNotes(k, n, keyScale),
  };
}

function round(mm: number): number {
  return Math.round(mm * 1000) / 1000;
}
