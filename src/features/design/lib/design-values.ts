import { zodResolver } from '@hookform/resolvers/zod';
import type { FieldValues, Resolver } from 'react-hook-form';
import type { z } from 'zod';
import type { Face } from '../../../../shared/schemas/face';
import type { FitClass, Material, Process } from '../../../../shared/schemas/joint-options';
import type { dovetailOptionsSchema } from '../../../../shared/schemas/kit-dovetail-options';
import type { keyOptionsSchema } from '../../../../shared/schemas/kit-key-options';
import { kitRequestSchema, type KitRequest } from '../../../../shared/schemas/kit-request';

/**
 * The design form's state: a kit request with both joints' settings and every face shape's sizes kept, so
 * switching back and forth loses nothing. {@link toKitRequest} picks what the chosen joint and shape use.
 * Lengths in mm whatever the display unit.
 */
export interface DesignValues {
  joint: KitRequest['joint'];
  process: Process;
  material: Material;
  fit: FitClass;
  /** "derived": the fit engine chooses; "set": the maker's own clearance per side. */
  clearanceMode: 'derived' | 'set';
  clearance?: number;
  calibrationOffset?: number;
  /** Whose a preset's saved correction was; sent with it while the correction is still that number. */
  calibrationNote?: { offset: number; source: string };
  /** A printer profile of the current team whose calibration replaces the typed correction; '' for none. */
  printerProfileId: string;
  /** A team material based on `material` whose adjustments the fit engine uses; '' for the catalogue's. */
  teamMaterialId: string;
  /** A preset's saved team-material tuning when that material is not in the team (any more): sent as saved. */
  materialTuning?: KitRequest['materialTuning'];
  /** Kept from a preset so that saving it again changes nothing the form does not show. */
  format?: KitRequest['format'];
  chordTolerance?: number;
  face: { shape: Face['shape']; width?: number; height?: number; diameter?: number; points?: Array<[number, number]> };
  key: z.input<typeof keyOptionsSchema>;
  dovetail: z.input<typeof dovetailOptionsSchema>;
}

/** The first reference kit: eight 10 mm square keys on an 80 × 60 mm face, snug in PLA. */
export const DEFAULT_DESIGN: DesignValues = {
  joint: 'key',
  process: 'fdm',
  material: 'PLA',
  fit: 'snug',
  clearanceMode: 'derived',
  clearance: 0.15,
  printerProfileId: '',
  teamMaterialId: '',
  face: {
    shape: 'rect',
    width: 80,
    height: 60,
    diameter: 80,
    points: [
      [-40, -30],
      [40, -30],
      [40, 10],
      [10, 30],
      [-40, 30],
    ],
  },
  key: { shape: 'square', width: 10, depth: 8, count: 8, margin: 2, strategy: 'clearance' },
  dovetail: { rootWidth: 10, height: 6, count: 3, slope: 6, margin: 2, endStop: false },
};

const defined = <T extends object>(o: T): T =>
  Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined && v !== '')) as T;

function faceOf(face: DesignValues['face']): unknown {
  if (face.shape === 'rect') return { shape: 'rect', width: face.width, height: face.height };
  if (face.shape === 'circle') return { shape: 'circle', diameter: face.diameter };
  return { shape: 'polygon', points: face.points ?? [] };
}

function keyOf(k: DesignValues['key']): DesignValues['key'] {
  return defined({
    ...k,
    length: k.shape === 'rect' ? k.length : undefined,
    flat: k.shape === 'round' ? k.flat : undefined,
    scale: k.strategy === 'scale' ? k.scale : undefined,
  });
}

/**
 * The kit request the form describes, as the API takes it: the chosen joint's settings only, the chosen
 * face shape's sizes only, settings that do not apply to the chosen key shape or strategy left out.
 *
 * @example
 * toKitRequest(DEFAULT_DESIGN).key; // { shape: 'square', width: 10, depth: 8, count: 8, margin: 2, strategy: 'clearance' }
 */
export function toKitRequest(v: DesignValues): KitRequest {
  const common = defined({
    process: v.process,
    material: v.material,
    fit: v.fit,
    clearance: v.clearanceMode === 'set' ? v.clearance : undefined,
    // With a printer profile chosen, its calibration entry is applied afterwards (see withProfileCalibration).
    calibrationOffset: v.printerProfileId ? undefined : v.calibrationOffset,
    calibrationSource:
      !v.printerProfileId && v.calibrationNote && v.calibrationNote.offset === v.calibrationOffset
        ? v.calibrationNote.source
        : undefined,
    // With a team material chosen, its tuning is applied afterwards (see withTeamMaterial).
    materialTuning: v.teamMaterialId ? undefined : v.materialTuning,
    format: v.format,
    chordTolerance: v.chordTolerance,
    face: faceOf(v.face),
  });
  const request =
    v.joint === 'key'
      ? { joint: 'key', ...common, key: keyOf(v.key) }
      : { joint: 'dovetail', ...common, dovetail: defined(v.dovetail) };
  return request as KitRequest;
}

const requestResolver = zodResolver(kitRequestSchema) as unknown as Resolver<FieldValues>;

/**
 * react-hook-form's zod resolver on the shared kit schema, run over {@link toKitRequest} of the form, so
 * every error is the schema's own message at the same path as its field (`key.width`, `face.points`, …).
 */
export const designResolver: Resolver<DesignValues> = async (values, context, options) => {
  const result = await requestResolver(toKitRequest(values) as FieldValues, context, options as never);
  return Object.keys(result.errors).length > 0 ? { values: {}, errors: result.errors } : { values, errors: {} };
};
