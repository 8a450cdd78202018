import type { Express } from 'express';
import type { Database } from '../../../../server/db/client';
import { insertMember } from '../../../../server/modules/teams/teams.repository';
import { signUp } from '../../../helpers/auth-app';

/** Key settings of a helmet seam preset (a kit request without its face). */
export const helmetSettings = {
  joint: 'key',
  material: 'PLA',
  fit: 'snug',
  key: { shape: 'square', width: 10, depth: 8, count: 6 },
} as const;

/** Dovetail settings of a display base preset. */
export const baseSettings = {
  joint: 'dovetail',
  material: 'PETG',
  fit: 'slide',
  dovetail: { rootWidth: 12, height: 6, slope: 6, count: 2 },
} as const;

/** An FDM printer profile body with one calibration entry (PLA snug −0.03 mm). */
export const benchFdm = {
  name: 'Bench FDM',
  process: 'fdm',
  buildVolume: { x: 256, y: 256, z: 256 },
  nozzleDiameter: 0.4,
  layerHeight: 0.2,
  calibration: [{ material: 'PLA', fit: 'snug', offsetMm: -0.03, measuredOn: '2026-01-12', source: 'fit test' }],
} as const;

/**
 * A team with an owner (their personal team) plus an editor and a viewer added directly, each with a
 * signed-in agent.
 */
export async function libraryTeam(app: Express, db: Database) {
  const [owner, editor, viewer] = await Promise.all([
    signUp(app, 'owner', 'Lib Owner'),
    signUp(app, 'editor', 'Lib Editor'),
    signUp(app, 'viewer', 'Lib Viewer'),
  ]);
  const teamId = owner!.personalTeamId;
  await insertMember(db, { teamId, userId: editor!.id, role: 'editor' });
  await insertMember(db, { teamId, userId: viewer!.id, role: 'viewer' });
  return { teamId, owner: owner!, editor: editor!, viewer: viewer!, base: `/api/teams/${teamId}` };
}
