import { Router } from 'express';
import type { AppContext } from '../../app-context';
import { requireUser } from '../../http/current-user';
import { parseWith } from '../../http/parse';
import { uuidParam } from '../../http/params';
import { createInvitationSchema, invitationTokenSchema } from '../../../shared/schemas/invitation';
import { inviteMember, listInvitations, revokeInvitation } from './invitations.service';
import { acceptInvitation, previewInvitation } from './accept-invitation.service';

/**
 * Team side (owners): GET/POST /api/teams/:teamId/invitations, DELETE …/invitations/:invitationId.
 * Invitee side: POST /api/invitations/preview {token} (anyone holding the link),
 * POST /api/invitations/accept {token} (signed in, confirmed, invited address).
 * Tokens travel in bodies, never in URLs, so they stay out of logs.
 */
export function invitationsRoutes(ctx: AppContext): Router {
  const router = Router();
  router.get('/teams/:teamId/invitations', async (req, res) => {
    const user = requireUser(req);
    res.json(await listInvitations(ctx, user, uuidParam(req, 'teamId', 'team')));
  });
  router.post('/teams/:teamId/invitations', async (req, res) => {
    const user = requireUser(req);
    const teamId = uuidParam(req, 'teamId', 'team');
    const input = parseWith(createInvitationSchema, req.body);
    res.status(201).json(await inviteMember(ctx, user, teamId, input));
  });
  router.delete('/teams/:teamId/invitations/:invitationId', async (req, res) => {
    const user = requireUser(req);
    const teamId = uuidParam(req, 'teamId', 'team');
    await revokeInvitation(ctx, user, teamId, uuidParam(req, 'invitationId', 'invitation'));
    res.status(204).end();
  });
  router.post('/invitations/preview', async (req, res) => {
    const { token } = parseWith(invitationTokenSchema, req.body);
    res.json(await previewInvitation(ctx, token));
  });
  router.post('/invitations/accept', async (req, res) => {
    const user = requireUser(req);
    const { token } = parseWith(invitationTokenSchema, req.body);
    res.json(await acceptInvitation(ctx, user, token));
  });
  return router;
}
