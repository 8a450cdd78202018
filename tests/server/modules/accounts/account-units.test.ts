import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { accountSchema } from '../../../../shared/schemas/account';
import { PASSWORD, signUp, useAuthApp } from '../../../helpers/auth-app';

describe('PATCH /api/account', () => {
  const { app } = useAuthApp();

  it('starts every new account in millimetres', async () => {
    const user = await signUp(app, 'units-default');
    const res = await user.agent.get('/api/account');
    expect(res.status).toBe(200);
    expect(accountSchema.parse(res.body).units).toBe('mm');
  });

  it('remembers inches for the account when the owner chooses them', async () => {
    const user = await signUp(app, 'units-inches');
    const patched = await user.agent.patch('/api/account').send({ units: 'in' });
    expect(patched.status).toBe(200);
    expect(accountSchema.parse(patched.body)).toMatchObject({ id: user.id, email: user.email, units: 'in' });
    expect((await user.agent.get('/api/account')).body.units).toBe('in');

    // A second device signed in as the same person sees the same choice.
    const laptop = request.agent(app);
    await laptop.post('/api/auth/sign-in').send({ email: user.email, password: PASSWORD });
    expect((await laptop.get('/api/account')).body.units).toBe('in');

    expect((await user.agent.patch('/api/account').send({ units: 'mm' })).body.units).toBe('mm');
    expect((await laptop.get('/api/account')).body.units).toBe('mm');
  });

  it('leaves other accounts alone when one account changes its units', async () => {
    const [ada, bo] = await Promise.all([signUp(app, 'units-ada'), signUp(app, 'units-bo')]);
    await ada.agent.patch('/api/account').send({ units: 'in' });
    expect((await bo.agent.get('/api/account')).body.units).toBe('mm');
  });

  it('answers 400 with a plain message when the units are not mm or in', async () => {
    const user = await signUp(app, 'units-bad');
    for (const body of [{ units: 'cm' }, { units: 'IN' }, { units: 25.4 }, {}]) {
      const res = await user.agent.patch('/api/account').send(body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.body.error).toMatchObject({
        code: 'VALIDATION_FAILED',
        issues: [{ path: 'units', message: 'units must be "mm" or "in"' }],
      });
      expect(res.body.error.message).toContain('units must be "mm" or "in"');
    }
    expect((await user.agent.get('/api/account')).body.units).toBe('mm');
  });

  it('answers 401 when nobody is signed in', async () => {
    const res = await request(app).patch('/api/account').send({ units: 'in' });
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('UNAUTHENTICATED');
  });

  it('refuses a change sent from another site, with 403', async () => {
    const user = await signUp(app, 'units-origin');
    const res = await user.agent.patch('/api/account').set('Origin', 'https://elsewhere.example').send({ units: 'in' });
    expect(res.status).toBe(403);
    expect((await user.agent.get('/api/account')).body.units).toBe('mm');
  });

  it('keeps GET /api/me to its fixed contract when the units change', async () => {
    const user = await signUp(app, 'units-me');
    await user.agent.patch('/api/account').send({ units: 'in' });
    const me = await user.agent.get('/api/me');
    expect(Object.keys(me.body.user).sort()).toEqual(['email', 'id', 'name']);
  });
});
