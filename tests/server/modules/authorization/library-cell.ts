import type { Database } from '../../../../server/db/client';
import { kitRequestSchema } from '../../../../shared/schemas/kit-request';
import { printerProfileInputSchema } from '../../../../shared/schemas/printer-profile';
import { teamMaterialInputSchema } from '../../../../shared/schemas/material';
import { insertProfile } from '../../../../server/modules/printer-profiles/printer-profiles.repository';
import { insertMaterial } from '../../../../server/modules/materials/materials.repository';
import { createWithFirstVersion } from '../../../../server/modules/presets/preset-writes';
import { insertKitDownload } from '../../../../server/modules/kit-history/kit-history.repository';
import { buildKit } from '../../../../shared/kit/build-kit';
import { stlHashes, zipKit } from '../../../../server/modules/kit-history/kit-bytes';
import { summaryOf } from '../../../../server/modules/kit-history/record-kit.service';
import { withoutFace } from '../../../../shared/schemas/preset-settings';
import { insertFitTest } from '../../../../server/modules/fit-tests/fit-tests.repository';

/** A small key kit request: builds in well under a second. */
export const smallKitRequest = {
  joint: 'key',
  material: 'PLA',
  fit: 'snug',
  face: { shape: 'rect', width: 40, height: 30 },
  key: { shape: 'square', width: 6, depth: 5, count: 2 },
} as const;

const resolved = kitRequestSchema.parse(smallKitRequest);
// Built once per file: every cell records the same kit.
let built: Promise<{ kit: ReturnType<typeof buildKit>; zip: Buffer }> | undefined;
const kitOnce = () =>
  (built ??= (async () => {
    const kit = buildKit(resolved);
    return { kit, zip: await zipKit(kit) };
  })());

export interface LibraryIds {
  presetId: string;
  printerProfileId: string;
  materialId: string;
  kitId: string;
  fitTestId: string;
}

/** Pocket answers of a clean PLA coupon (0.00–0.20 mm in 0.05 mm steps). */
export const matrixFitAnswers = [
  { mark: '1', clearancePerSide: 0, outcome: 'no-entry' },
  { mark: '2', clearancePerSide: 0.05, outcome: 'forced' },
  { mark: '3', clearancePerSide: 0.1, outcome: 'snug' },
  { mark: '4', clearancePerSide: 0.15, outcome: 'free' },
  { mark: '5', clearancePerSide: 0.2, outcome: 'wobbly' },
] as const;

/**
 * One preset, printer profile (with one fit test), team material and recorded kit in the team, written
 * through the repositories.
 */
export async function buildLibrary(
  db: Database,
  teamId: string,
  owner: { id: string; name: string; email: string },
): Promise<LibraryIds> {
  const printerProfileId = await insertProfile(
    db,
    teamId,
    owner.id,
    printerProfileInputSchema.parse({
      name: 'Matrix FDM',
      process: 'fdm',
      buildVolume: { x: 220, y: 220, z: 250 },
      nozzleDiameter: 0.4,
      layerHeight: 0.2,
    }),
  );
  const materialId = await insertMaterial(
    db,
    teamId,
    owner.id,
    teamMaterialInputSchema.parse({ name: 'Matrix PLA', baseMaterial: 'PLA' }),
  );
  const presetId = await createWithFirstVersion(db, { ...owner, emailVerified: true }, teamId, {
    name: 'Matrix preset',
    description: '',
    tags: ['matrix'],
    printerProfileId,
    schemaVersion: 1,
    settings: withoutFace(resolved) as Record<string, unknown>,
  });
  const { kit, zip } = await kitOnce();
  const kitId = await insertKitDownload(db, {
    teamId,
    userId: owner.id,
    userName: owner.name,
    request: resolved as Record<string, unknown>,
    summary: summaryOf(kit.manifest, null),
    files: stlHashes(kit.files),
    fileName: 'matrix-kit.zip',
    engineVersion: 'matrix',
    zip,
  });
  const fitTestId = await insertFitTest(db, {
    teamId,
    printerProfileId,
    material: 'PLA',
    joint: 'key',
    coupon: { clearanceFrom: 0, clearanceTo: 0.2, clearanceStep: 0.05 },
    answers: [...matrixFitAnswers],
    best: { press: { clearancePerSide: 0.05, mark: '2' }, snug: { clearancePerSide: 0.1, mark: '3' } },
    notes: [],
    createdBy: owner.id,
  });
  return { presetId, printerProfileId, materialId, kitId, fitTestId };
}
