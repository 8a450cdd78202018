import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { PASSWORD, signUp, tokenFrom, useAuthApp } from '../../../helpers/auth-app';

// The whole path a studio takes, through the real app, database and SMTP catcher.
describe('team flow', () => {
  const { app, mail } = useAuthApp();

  it('runs sign-up → verify → sign-in → invite → accept → role change → removal, and logs it', async () => {
    const owner = await signUp(app, 'owner', 'Isa Owner');
    const verifyMail = await mail.waitFor(owner.email, /Confirm your e-mail/);
    expect(verifyMail.html).toContain('Confirm my address');
    expect((await owner.agent.post('/api/auth/verify-email').send({ token: tokenFrom(verifyMail) })).status).toBe(200);
    expect((await owner.agent.get('/api/account')).body.emailVerified).toBe(true);

    // Sign in again on a new device: a new session next to the first.
    const device = request.agent(app);
    const signIn = await device.post('/api/auth/sign-in').send({ email: owner.email, password: PASSWORD });
    expect(signIn.status).toBe(200);
    expect(signIn.body).toEqual({
      user: { id: owner.id, email: owner.email, name: 'Isa Owner' },
      teams: [{ id: owner.personalTeamId, name: "Isa Owner's workshop", role: 'owner' }],
    });

    const created = await device.post('/api/teams').send({ name: 'Seam Bench' });
    expect(created.status).toBe(201);
    const teamId = created.body.id as string;

    const invitee = await signUp(app, 'invitee', 'Ned Invitee');
    const invite = await device.post(`/api/teams/${teamId}/invitations`).send({ email: invitee.email, role: 'viewer' });
    expect(invite.status).toBe(201);
    const inviteMail = await mail.waitFor(invitee.email, /invited you to Seam Bench/);
    const token = tokenFrom(inviteMail);

    // Not yet confirmed: accepting is refused until the invitee confirms their own address.
    const early = await invitee.agent.post('/api/invitations/accept').send({ token });
    expect(early.status).toBe(403);
    expect(early.body.error.code).toBe('EMAIL_UNVERIFIED');
    const inviteeVerify = await mail.waitFor(invitee.email, /Confirm your e-mail/);
    await invitee.agent.post('/api/auth/verify-email').send({ token: tokenFrom(inviteeVerify) });

    const preview = await request(app).post('/api/invitations/preview').send({ token });
    expect(preview.body).toMatchObject({ teamName: 'Seam Bench', role: 'viewer', invitedBy: 'Isa Owner' });
    const accepted = await invitee.agent.post('/api/invitations/accept').send({ token });
    expect(accepted.status).toBe(200);
    expect(accepted.body).toEqual({ id: teamId, name: 'Seam Bench', role: 'viewer' });
    expect((await invitee.agent.post('/api/invitations/accept').send({ token })).status).toBe(404); // single use

    // The viewer reads but cannot manage.
    expect((await invitee.agent.get(`/api/teams/${teamId}/members`)).status).toBe(200);
    expect((await invitee.agent.patch(`/api/teams/${teamId}`).send({ name: 'Mine now' })).status).toBe(403);

    const promote = await device.patch(`/api/teams/${teamId}/members/${invitee.id}`).send({ role: 'editor' });
    expect(promote.body.role).toBe('editor');
    const me = await invitee.agent.get('/api/me');
    expect(me.body.teams).toContainEqual({ id: teamId, name: 'Seam Bench', role: 'editor' });

    expect((await device.delete(`/api/teams/${teamId}/members/${invitee.id}`)).status).toBe(204);
    expect((await invitee.agent.get(`/api/teams/${teamId}`)).status).toBe(404);

    const audit = await device.get(`/api/teams/${teamId}/audit`);
    const actions = audit.body.events.map((e: { action: string }) => e.action).reverse();
    expect(actions).toEqual([
      'team.created',
      'invitation.created',
      'member.joined',
      'member.role_changed',
      'member.removed',
    ]);
    const roleChange = audit.body.events.find((e: { action: string }) => e.action === 'member.role_changed');
    expect(roleChange).toMatchObject({
      actorName: 'Isa Owner',
      subject: invitee.email,
      detail: { from: 'viewer', to: 'editor' },
    });
    const personalLog = await device.get(`/api/teams/${owner.personalTeamId}/audit`);
    expect(personalLog.body.events.map((e: { action: string }) => e.action)).toContain('member.signed_in');
  });

  it('keeps at least one owner when the last owner tries to step down or leave', async () => {
    const owner = await signUp(app, 'solo');
    const teamId = (await owner.agent.post('/api/teams').send({ name: 'Solo' })).body.id;
    const demote = await owner.agent.patch(`/api/teams/${teamId}/members/${owner.id}`).send({ role: 'viewer' });
    expect(demote.status).toBe(409);
    expect(demote.body.error.message).toMatch(/at least one owner/);
    expect((await owner.agent.delete(`/api/teams/${teamId}/members/${owner.id}`)).status).toBe(409);
    expect((await owner.agent.delete(`/api/teams/${owner.personalTeamId}`)).status).toBe(409);
    expect((await owner.agent.delete(`/api/teams/${teamId}`)).status).toBe(204);
  });

  it("answers 404 for another team's resources, even when reached through one's own team", async () => {
    const a = await signUp(app, 'a');
    const b = await signUp(app, 'b');
    await b.agent.post('/api/auth/verify-email').send({ token: tokenFrom(await mail.waitFor(b.email, /Confirm/)) });
    const bInvite = await b.agent
      .post(`/api/teams/${b.personalTeamId}/invitations`)
      .send({ email: 'guest@quillmoss.example', role: 'viewer' });
    expect(bInvite.status).toBe(201);
    const aTeam = `/api/teams/${a.personalTeamId}`;
    expect((await a.agent.delete(`${aTeam}/invitations/${bInvite.body.id}`)).status).toBe(404);
    expect((await a.agent.patch(`${aTeam}/members/${b.id}`).send({ role: 'viewer' })).status).toBe(404);
    expect((await a.agent.delete(`${aTeam}/members/${b.id}`)).status).toBe(404);
    expect((await a.agent.get(`/api/teams/${b.personalTeamId}/members`)).status).toBe(404);
    expect((await a.agent.delete(`/api/teams/${b.personalTeamId}/invitations/${bInvite.body.id}`)).status).toBe(404);
    expect((await a.agent.get('/api/teams/not-a-uuid')).status).toBe(404);
  });

  it('refuses invitations from an owner whose address is not confirmed, and a mismatched acceptance', async () => {
    const owner = await signUp(app, 'unverified');
    const res = await owner.agent
      .post(`/api/teams/${owner.personalTeamId}/invitations`)
      .send({ email: 'someone@quillmoss.example', role: 'viewer' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('EMAIL_UNVERIFIED');

    await owner.agent
      .post('/api/auth/verify-email')
      .send({ token: tokenFrom(await mail.waitFor(owner.email, /Confirm/)) });
    const intended = 'intended@quillmoss.example';
    await owner.agent.post(`/api/teams/${owner.personalTeamId}/invitations`).send({ email: intended, role: 'editor' });
    const token = tokenFrom(await mail.waitFor(intended, /invited you/));
    const stranger = await signUp(app, 'stranger');
    await stranger.agent
      .post('/api/auth/verify-email')
      .send({ token: tokenFrom(await mail.waitFor(stranger.email, /Confirm/)) });
    const wrong = await stranger.agent.post('/api/invitations/accept').send({ token });
    expect(wrong.status).toBe(403);
    expect(wrong.body.error.message).toContain(intended);
  });

  it('stops a revoked invitation from working', async () => {
    const owner = await signUp(app, 'revoker');
    await owner.agent
      .post('/api/auth/verify-email')
      .send({ token: tokenFrom(await mail.waitFor(owner.email, /Confirm/)) });
    const invitee = await signUp(app, 'revoked');
    const created = await owner.agent
      .post(`/api/teams/${owner.personalTeamId}/invitations`)
      .send({ email: invitee.email, role: 'viewer' });
    const token = tokenFrom(await mail.waitFor(invitee.email, /invited you/));
    const list = await owner.agent.get(`/api/teams/${owner.personalTeamId}/invitations`);
    expect(list.body.map((i: { id: string }) => i.id)).toContain(created.body.id);
    expect((await owner.agent.delete(`/api/teams/${owner.personalTeamId}/invitations/${created.body.id}`)).status).toBe(
      204,
    );
    expect((await request(app).post('/api/invitations/preview').send({ token })).status).toBe(404);
  });
});
