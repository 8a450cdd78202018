import type { AppContext } from '../../app-context';
import type { SessionUser } from '../../auth/sessions';
import { hashLinkToken } from '../../auth/tokens';
import { AppError } from '../../errors/app-error';
import type { InvitationPreview } from '../../../shared/schemas/invitation';
import type { TeamSummary } from '../../../shared/schemas/team';
import { recordAudit } from '../audit/audit.service';
import { insertMember } from '../teams/teams.repository';
import { findTeamOfMember } from '../teams/teams.repository';
import { findPendingByTokenHash, markInvitationAccepted } from './invitations.repository';
import { requireVerified } from './invitations.service';

const GONE = 'This invitation has expired, was revoked or was already used. Ask the team owner for a new one.';

/** What an invitation link offers, shown before the invitee signs in or accepts. */
export async function previewInvitation(ctx: AppContext, token: string): Promise<InvitationPreview> {
  const found = await findPendingByTokenHash(ctx.db, hashLinkToken(token));
  if (!found) throw new AppError('NOT_FOUND', GONE);
  const { teamName, role, email, invitedBy, expiresAt } = found;
  return { teamName, role, email, invitedBy: invitedBy ?? null, expiresAt: expiresAt.toISOString() };
}

/**
 * Joins the team the invitation is for. The signed-in account must have confirmed the very address
 * that was invited; the invitation is locked while it is used, so it works exactly once.
 */
export async function acceptInvitation(ctx: AppContext, user: SessionUser, token: string): Promise<TeamSummary> {
  requireVerified(user, 'accepting an invitation');
  return ctx.db.transaction(async (tx) => {
    const invitation = await findPendingByTokenHash(tx, hashLinkToken(token), true);
    if (!invitation) throw new AppError('NOT_FOUND', GONE);
    if (invitation.email.toLowerCase() !== user.email.toLowerCase()) {
      throw new AppError(
        'FORBIDDEN',
        `This invitation is for ${invitation.email}, but you are signed in as ${user.email}. Sign in with the invited address.`,
      );
    }
    const joined = await insertMember(tx, { teamId: invitation.teamId, userId: user.id, role: invitation.role });
    await markInvitationAccepted(tx, invitation.id);
    if (joined) await recordAudit(tx, invitation.teamId, user, 'member.joined', user.email, { role: invitation.role });
    const team = await findTeamOfMember(tx, invitation.teamId, user.id);
    if (!team) throw new Error('membership missing right after it was created');
    return { id: team.id, name: team.name, role: team.role };
  });
}
