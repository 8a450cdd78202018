import type { AppContext } from '../../app-context';
import type { SessionUser } from '../../auth/sessions';
import { hashLinkToken, newLinkToken } from '../../auth/tokens';
import { AppError } from '../../errors/app-error';
import { invitationMail } from '../../mail/messages/invitation';
import type { Invitation } from '../../../shared/schemas/invitation';
import type { Role } from '../../../shared/schemas/team';
import { recordAudit } from '../audit/audit.service';
import { requireTeamRole } from '../teams/team-access';
import { findMemberByEmail } from '../teams/members.repository';
import * as repo from './invitations.repository';

/** How long an invitation link works. */
export const INVITATION_LIFETIME_MS = 7 * 24 * 60 * 60 * 1000;

/** Inviting needs a confirmed address: otherwise anyone could send mail in Seamwright's name. */
export function requireVerified(user: SessionUser, doing: string): void {
  if (!user.emailVerified) {
    throw new AppError(
      'EMAIL_UNVERIFIED',
      `Confirm your e-mail address before ${doing}. Check your inbox for the link.`,
    );
  }
}

const toInvitation = (r: Awaited<ReturnType<typeof repo.listPendingInvitations>>[number]): Invitation => ({
  ...r,
  invitedBy: r.invitedBy ?? null,
  expiresAt: r.expiresAt.toISOString(),
  createdAt: r.createdAt.toISOString(),
});

/** The team's pending invitations (owners). */
export async function listInvitations(ctx: AppContext, user: SessionUser, teamId: string): Promise<Invitation[]> {
  await requireTeamRole(ctx.db, teamId, user, 'owner');
  return (await repo.listPendingInvitations(ctx.db, teamId)).map(toInvitation);
}

/**
 * Invites an address into the team (owners with a confirmed address) and mails the link. A newer
 * invitation for the same address replaces the older one.
 */
export async function inviteMember(
  ctx: AppContext,
  user: SessionUser,
  teamId: string,
  input: { email: string; role: Role },
): Promise<Invitation> {
  const team = await requireTeamRole(ctx.db, teamId, user, 'owner');
  requireVerified(user, 'inviting people');
  if (await findMemberByEmail(ctx.db, teamId, input.email)) {
    throw new AppError('CONFLICT', `${input.email} is already a member of this team.`);
  }
  const token = newLinkToken();
  const row = await ctx.db.transaction(async (tx) => {
    await repo.revokePendingForEmail(tx, teamId, input.email);
    const expiresAt = new Date(Date.now() + INVITATION_LIFETIME_MS);
    const values = { teamId, ...input, tokenHash: hashLinkToken(token), invitedBy: user.id, expiresAt };
    const inserted = await repo.insertInvitation(tx, values);
    await recordAudit(tx, teamId, user, 'invitation.created', input.email, { role: input.role });
    return inserted;
  });
  const mail = invitationMail({
    to: input.email,
    inviterName: user.name,
    teamName: team.name,
    role: input.role,
    url: ctx.links.invitation(token),
  });
  try {
    await ctx.mailer.send(mail);
  } catch (error) {
    ctx.logger.error({ err: error }, 'the invitation e-mail could not be sent');
    throw new AppError('SERVICE_UNAVAILABLE', 'The invitation is saved, but the e-mail could not be sent. Try again.');
  }
  return toInvitation({ ...row, invitedBy: user.name });
}

/** Revokes a pending invitation (owners); its link stops working at once. */
export async function revokeInvitation(ctx: AppContext, user: SessionUser, teamId: string, invitationId: string) {
  await requireTeamRole(ctx.db, teamId, user, 'owner');
  await ctx.db.transaction(async (tx) => {
    const email = await repo.revokeInvitation(tx, teamId, invitationId);
    if (email === null) throw new AppError('NOT_FOUND', 'There is no such pending invitation in this team.');
    await recordAudit(tx, teamId, user, 'invitation.revoked', email);
  });
}
