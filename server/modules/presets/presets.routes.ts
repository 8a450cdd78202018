import { Router, type Request } from 'express';
import { MAX_VERSION } from '../../../shared/schemas/library-fields';
import type { AppContext } from '../../app-context';
import { AppError } from '../../errors/app-error';
import { requireUser } from '../../http/current-user';
import { parseWith } from '../../http/parse';
import { uuidParam } from '../../http/params';
import {
  presetDuplicateSchema,
  presetInputSchema,
  presetListQuerySchema,
  presetPatchSchema,
  presetRestoreSchema,
} from '../../../shared/schemas/preset';
import * as service from './presets.service';
import * as versions from './preset-versions.service';

const base = '/teams/:teamId/presets';

const ids = (req: Request) => ({ teamId: uuidParam(req, 'teamId', 'team'), id: uuidParam(req, 'presetId', 'preset') });

function versionParam(req: Request): number {
  const n = Number(req.params.version);
  // Past the column's range no version can exist: say so before any query runs.
  if (!Number.isInteger(n) || n < 1 || n > MAX_VERSION) throw new AppError('NOT_FOUND', 'There is no such version.');
  return n;
}

/**
 * Presets of a team. Members: GET …/presets (search, filters, sort, paging), GET …/:presetId,
 * GET …/:presetId/versions and …/versions/:version. Editors and owners: POST …/presets,
 * PATCH …/:presetId {baseVersion, …}, POST …/versions/:version/restore {baseVersion}, POST …/duplicate,
 * POST …/archive and …/unarchive. Owners: DELETE …/:presetId. Export and import: preset-transfer.routes.ts.
 */
export function presetsRoutes(ctx: AppContext): Router {
  const router = Router();
  router.get(base, async (req, res) => {
    const user = requireUser(req);
    const teamId = uuidParam(req, 'teamId', 'team');
    res.json(await service.listPresets(ctx, user, teamId, parseWith(presetListQuerySchema, req.query, 'query')));
  });
  router.post(base, async (req, res) => {
    const user = requireUser(req);
    const teamId = uuidParam(req, 'teamId', 'team');
    const input = parseWith(presetInputSchema, req.body, 'preset');
    res.status(201).json(await service.createPreset(ctx, user, teamId, input));
  });
  router.get(`${base}/:presetId`, async (req, res) => {
    const { teamId, id } = ids(req);
    res.json(await service.getPreset(ctx, requireUser(req), teamId, id));
  });
  router.patch(`${base}/:presetId`, async (req, res) => {
    const user = requireUser(req);
    const { teamId, id } = ids(req);
    res.json(await service.updatePreset(ctx, user, teamId, id, parseWith(presetPatchSchema, req.body, 'preset')));
  });
  router.delete(`${base}/:presetId`, async (req, res) => {
    const user = requireUser(req);
    const { teamId, id } = ids(req);
    await service.deletePreset(ctx, user, teamId, id);
    res.status(204).end();
  });
  router.post(`${base}/:presetId/duplicate`, async (req, res) => {
    const user = requireUser(req);
    const { teamId, id } = ids(req);
    const { name } = parseWith(presetDuplicateSchema, req.body ?? {}, 'duplicate');
    res.status(201).json(await service.duplicatePreset(ctx, user, teamId, id, name));
  });
  for (const action of ['archive', 'unarchive'] as const) {
    router.post(`${base}/:presetId/${action}`, async (req, res) => {
      const user = requireUser(req);
      const { teamId, id } = ids(req);
      res.json(await service.setPresetArchived(ctx, user, teamId, id, action === 'archive'));
    });
  }
  router.get(`${base}/:presetId/versions`, async (req, res) => {
    const { teamId, id } = ids(req);
    res.json(await versions.listPresetVersions(ctx, requireUser(req), teamId, id));
  });
  router.get(`${base}/:presetId/versions/:version`, async (req, res) => {
    const { teamId, id } = ids(req);
    res.json(await versions.getPresetVersion(ctx, requireUser(req), teamId, id, versionParam(req)));
  });
  router.post(`${base}/:presetId/versions/:version/restore`, async (req, res) => {
    const user = requireUser(req);
    const { teamId, id } = ids(req);
    const { baseVersion } = parseWith(presetRestoreSchema, req.body, 'restore');
    res.json(await versions.restorePresetVersion(ctx, user, teamId, id, versionParam(req), baseVersion));
  });
  return router;
}
