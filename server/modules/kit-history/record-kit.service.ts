import type { Executor } from '../../db/executor';
import type { SessionUser } from '../../auth/sessions';
import { AppError } from '../../errors/app-error';
import type { KitManifest } from '../../../shared/kit/kit-manifest';
import type { KitSummary, ParsedRecordKitInput } from '../../../shared/schemas/kit-history';
import type { PrinterProfile } from '../../../shared/schemas/printer-profile';
import { kitRequestSchema } from '../../../shared/schemas/kit-request';
import { requireTeamRole } from '../teams/team-access';
import { kitFileName } from '../kits/kits.service';
import { asBuffer } from '../kits/kit-zip';
import { findPreset } from '../presets/presets.repository';
import { findVersion } from '../presets/preset-versions.repository';
import { findProfile } from '../printer-profiles/printer-profiles.repository';
import { findMaterial } from '../materials/materials.repository';
import { applyCalibration, namedDerivation, type CalibratedRequest } from './kit-calibration';
import { applyTeamMaterial } from './kit-material';
import type { Geometry } from '../../geometry/geometry';
import { ENGINE_VERSION } from './engine-version';
import { insertKitDownload } from './kit-history.repository';

const notOurs = (path: string, what: string) =>
  new AppError('VALIDATION_FAILED', `The ${what} chosen is not one of this team’s.`, [
    { path, message: `Choose one of this team’s ${what}s, or none.` },
  ]);

/**
 * The manifest summary the history keeps (the full manifest stays inside the original zip).
 *
 * @param teamMaterialId - the team material chosen with the kit, null when the request carried its own tuning
 */
export function summaryOf(
  manifest: KitManifest,
  calibration: CalibratedRequest['calibration'],
  teamMaterialId: string | null = null,
): KitSummary {
  const r = manifest.request;
  const tuning = r.materialTuning;
  return {
    joint: r.joint,
    process: r.process,
    material: r.material,
    fit: r.fit,
    clearancePerSide: manifest.clearancePerSide,
    ...(manifest.keyScale !== undefined ? { keyScale: manifest.keyScale } : {}),
    derivation: namedDerivation(manifest.fit.derivation, calibration),
    ...(tuning ? { teamMaterial: { id: teamMaterialId, ...tuning } } : {}),
    warnings: manifest.warnings,
    parts: manifest.parts.map(({ file, role, half, quantity, triangles, volumeMm3 }) => ({
      file,
      role,
      half,
      quantity,
      triangles,
      volumeMm3,
    })),
  };
}

async function presetOf(db: Executor, teamId: string, input: ParsedRecordKitInput) {
  if (!input.presetId) return null;
  const preset = await findPreset(db, teamId, input.presetId);
  if (!preset) throw notOurs('presetId', 'preset');
  const version = input.presetVersion ?? preset.version;
  if (input.presetVersion !== null && !(await findVersion(db, preset.id, version))) {
    throw new AppError('VALIDATION_FAILED', `Preset "${preset.name}" has no version ${version}.`, [
      { path: 'presetVersion', message: `There is no version ${version}.` },
    ]);
  }
  return { id: preset.id, name: preset.name, version, printerProfileId: preset.printerProfileId };
}

// Another team's material, or an unknown id, is not found: its existence elsewhere is none of this team's business.
async function teamMaterialOf(db: Executor, teamId: string, id: string | null) {
  if (!id) return null;
  const material = await findMaterial(db, teamId, id);
  if (!material) {
    throw new AppError('NOT_FOUND', 'There is no such material in this team.', [
      { path: 'teamMaterialId', message: 'Choose one of this team’s materials, or none.' },
    ]);
  }
  return material;
}

/**
 * Builds a kit for a signed-in member and records it in the team's history: who, when, the full request,
 * the preset and version, the printer profile whose calibration the fit engine used, the team material it is
 * printed in (as the request's `materialTuning` and in the summary), the manifest summary, a SHA-256 per STL
 * and the zip itself. Any member may (viewers download kits too).
 *
 * @param db - the database, or the seed's transaction
 * @param geometry - where the kit is built: the server's worker threads, or inline for the seed
 * @returns the history id, the download name, the zip and the clearance per side it was built with
 */
export async function recordKit(
  db: Executor,
  geometry: Geometry,
  user: SessionUser,
  teamId: string,
  input: ParsedRecordKitInput,
) {
  await requireTeamRole(db, teamId, user, 'viewer');
  const preset = await presetOf(db, teamId, input);
  // An explicit null means "no printer", as the design screen's preview showed; only a missing field defers to
  // the preset's printer.
  const profileId = input.printerProfileId === undefined ? (preset?.printerProfileId ?? null) : input.printerProfileId;
  let profile: PrinterProfile | null = null;
  if (profileId) {
    profile = await findProfile(db, teamId, profileId);
    if (!profile) throw notOurs('printerProfileId', 'printer profile');
  }
  const teamMaterial = await teamMaterialOf(db, teamId, input.teamMaterialId);
  const calibrated = applyCalibration(applyTeamMaterial(input.request, teamMaterial), profile);
  const calibration = calibrated.calibration;
  // Parsed once more so the keys come in the schema's order: jsonb keeps no key order, and a rebuild from the
  // stored request must write the very same manifest.json (a resolved request parses again to itself).
  const request = kitRequestSchema.parse(calibrated.request);
  const kit = await geometry.kitZip(request);
  // The thread hands back a plain Uint8Array; the bytea column wants a Buffer (same bytes, no copy).
  const zip = asBuffer(kit.zip);
  const fileName = kitFileName(request);
  const id = await insertKitDownload(db, {
    teamId,
    userId: user.id,
    userName: user.name,
    presetId: preset?.id ?? null,
    presetName: preset?.name ?? null,
    presetVersion: preset?.version ?? null,
    printerProfileId: profile?.id ?? null,
    printerProfileName: profile?.name ?? null,
    calibration,
    request: request as Record<string, unknown>,
    summary: summaryOf(kit.manifest, calibration, teamMaterial?.id ?? null),
    files: kit.hashes,
    fileName,
    engineVersion: ENGINE_VERSION,
    zip,
  });
  return { id, fileName, zip, clearancePerSide: kit.manifest.clearancePerSide };
}
