import { Router, type Request, type Response } from 'express';
import multer from 'multer';
import type { AppContext } from '../../app-context';
import { AppError } from '../../errors/app-error';
import { requireUser } from '../../http/current-user';
import { uuidParam } from '../../http/params';
import { MAX_PRESETS_FILE_BYTES } from '../../../shared/schemas/preset-transfer';
import { checkMayImport, exportPresets, importPresets } from './preset-transfer.service';

// Held in memory: the file is at most 1 MiB and is parsed at once; nothing touches the disk.
const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: MAX_PRESETS_FILE_BYTES, files: 1, fields: 4, parts: 5 },
}).single('file');

function receiveFile(req: Request, res: Response): Promise<void> {
  return new Promise((resolve, reject) => {
    upload(req, res, (err: unknown) => {
      if (!err) return resolve();
      if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE') {
        return reject(
          new AppError(
            'PAYLOAD_TOO_LARGE',
            `The presets file is larger than the ${MAX_PRESETS_FILE_BYTES / 1024 / 1024} MiB allowed.`,
          ),
        );
      }
      if (err instanceof multer.MulterError) {
        return reject(
          new AppError(
            'BAD_REQUEST',
            `The upload was refused (${err.message}): send one file in a field named "file".`,
          ),
        );
      }
      reject(err);
    });
  });
}

/**
 * GET /api/teams/:teamId/presets/export → the team's presets as one JSON file (members).
 * POST /api/teams/:teamId/presets/import, multipart field "file" (≤ 1 MiB) → the per-item report (editors,
 * owners); 201 when all were written, 400 with the report when any was refused and nothing was written.
 */
export function presetTransferRoutes(ctx: AppContext): Router {
  const router = Router();
  router.get('/teams/:teamId/presets/export', async (req, res) => {
    const user = requireUser(req);
    const { fileName, file } = await exportPresets(ctx, user, uuidParam(req, 'teamId', 'team'));
    res
      .attachment(fileName)
      .type('application/json')
      .send(`${JSON.stringify(file, null, 2)}\n`);
  });
  router.post('/teams/:teamId/presets/import', async (req, res) => {
    const user = requireUser(req);
    const teamId = uuidParam(req, 'teamId', 'team');
    // Roles first, so a viewer's upload is refused before it is read.
    await checkMayImport(ctx, user, teamId);
    await receiveFile(req, res);
    res.status(201).json(await importPresets(ctx, user, teamId, req.file));
  });
  return router;
}
