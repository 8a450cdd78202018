import { describe, expect, it } from 'vitest';
import { useAuthApp } from '../../../helpers/auth-app';
import { baseSettings, benchFdm, helmetSettings, libraryTeam } from './library-helpers';

describe('GET /api/teams/:teamId/presets', () => {
  const { app, db } = useAuthApp();

  it('pages, searches, filters and sorts on the server', async () => {
    const { owner, editor, viewer, base } = await libraryTeam(app, db);
    const profile = (await owner.agent.post(`${base}/printer-profiles`).send(benchFdm)).body;
    for (let i = 1; i <= 7; i += 1) {
      const body = {
        name: `Helmet part ${i}`,
        tags: ['helmet'],
        settings: helmetSettings,
        printerProfileId: i <= 2 ? profile.id : null,
      };
      expect((await editor.agent.post(`${base}/presets`).send(body)).status).toBe(201);
    }
    await owner.agent.post(`${base}/presets`).send({
      name: 'Display base',
      description: 'Plinth for a bust, 100% infill',
      tags: ['base'],
      settings: baseSettings,
    });

    const page1 = await viewer.agent.get(`${base}/presets?sort=name&order=asc&pageSize=3`);
    expect(page1.status).toBe(200);
    expect(page1.body).toMatchObject({ total: 8, page: 1, pageSize: 3 });
    expect(page1.body.items.map((p: { name: string }) => p.name)).toEqual([
      'Display base',
      'Helmet part 1',
      'Helmet part 2',
    ]);
    const page3 = await viewer.agent.get(`${base}/presets?sort=name&order=asc&pageSize=3&page=3`);
    expect(page3.body.items.map((p: { name: string }) => p.name)).toEqual(['Helmet part 6', 'Helmet part 7']);
    expect((await viewer.agent.get(`${base}/presets?page=9`)).body.items).toEqual([]);

    const search = await viewer.agent.get(`${base}/presets?q=${encodeURIComponent('100%')}`);
    expect(search.body.items.map((p: { name: string }) => p.name)).toEqual(['Display base']);
    expect((await viewer.agent.get(`${base}/presets?tag=base`)).body.total).toBe(1);
    expect((await viewer.agent.get(`${base}/presets?joint=key`)).body.total).toBe(7);
    expect((await viewer.agent.get(`${base}/presets?material=PETG`)).body.items[0]).toMatchObject({
      name: 'Display base',
      joint: 'dovetail',
      fit: 'slide',
    });
    expect((await viewer.agent.get(`${base}/presets?printer=${profile.id}`)).body.total).toBe(2);
    expect((await viewer.agent.get(`${base}/presets?author=${owner.id}`)).body.total).toBe(1);
    expect((await viewer.agent.get(`${base}/presets?tag=&joint=`)).body.total).toBe(8);
  });

  it('answers 400 for a page size above 100 or an unknown sort', async () => {
    const { viewer, base } = await libraryTeam(app, db);
    expect((await viewer.agent.get(`${base}/presets?pageSize=500`)).status).toBe(400);
    const sort = await viewer.agent.get(`${base}/presets?sort=password`);
    expect(sort.status).toBe(400);
    expect(sort.body.error.message).toMatch(/sort must be one of/);
  });
});
