import { randomBytes, randomUUID } from 'node:crypto';
import type { Database } from '../../../../server/db/client';
import type { Sessions } from '../../../../server/auth/sessions';
import { SESSION_COOKIE } from '../../../../server/auth/sessions';
import { hashLinkToken, newLinkToken } from '../../../../server/auth/tokens';
import { insertUser } from '../../../../server/modules/accounts/users.repository';
import { insertInvitation } from '../../../../server/modules/invitations/invitations.repository';
import { insertMember } from '../../../../server/modules/teams/teams.repository';
import { createTeamWithOwner } from '../../../../server/modules/teams/teams.service';
import { uniqueEmail } from '../../../helpers/auth-app';
import { buildLibrary, type LibraryIds } from './library-cell';

export const ACTORS = ['anonymous', 'viewer', 'editor', 'owner', 'outsider'] as const;
export type Actor = (typeof ACTORS)[number];

export interface Person {
  id: string;
  email: string;
  name: string;
}

/** What one cell of the matrix works on: a fresh team with an owner, editor, viewer and one more member. */
export interface Cell {
  actor: Actor;
  people: Record<Exclude<Actor, 'anonymous'>, Person>;
  teamId: string;
  /** A plain viewer of the team that role changes and removals act on. */
  otherMemberId: string;
  invitationId: string;
  /** A pending invitation of the team addressed to the acting person (or to nobody in particular). */
  invitationToken: string;
  cookie: string | null;
  /** The team library: one preset, printer profile, team material and recorded kit. */
  library: LibraryIds;
}

/**
 * Builds a cell's team directly through the repositories: a fresh team per cell, so a cell that
 * deletes or changes something never affects the next. The acting person gets a fresh session.
 */
export async function buildCell(db: Database, sessions: Sessions, people: Cell['people'], actor: Actor): Promise<Cell> {
  const owner = people.owner;
  const team = await createTeamWithOwner(db, owner, `Matrix ${randomUUID().slice(0, 8)}`, false);
  await insertMember(db, { teamId: team.id, userId: people.editor.id, role: 'editor' });
  await insertMember(db, { teamId: team.id, userId: people.viewer.id, role: 'viewer' });
  const other = await insertUser(db, {
    email: uniqueEmail('other'),
    name: 'Other Member',
    passwordHash: `not-a-hash-${randomBytes(8).toString('hex')}`,
  });
  if (!other) throw new Error('could not create the other member');
  await insertMember(db, { teamId: team.id, userId: other.id, role: 'viewer' });
  const invitationToken = newLinkToken();
  const invitee = actor === 'anonymous' ? uniqueEmail('invitee') : people[actor].email;
  const invitation = await insertInvitation(db, {
    teamId: team.id,
    email: invitee,
    role: 'viewer',
    tokenHash: hashLinkToken(invitationToken),
    invitedBy: owner.id,
    expiresAt: new Date(Date.now() + 60 * 60_000),
  });
  const library = await buildLibrary(db, team.id, owner);
  const cookie = actor === 'anonymous' ? null : `${SESSION_COOKIE}=${(await sessions.start(people[actor].id)).id}`;
  return {
    actor,
    people,
    teamId: team.id,
    otherMemberId: other.id,
    invitationId: invitation.id,
    invitationToken,
    cookie,
    library,
  };
}
