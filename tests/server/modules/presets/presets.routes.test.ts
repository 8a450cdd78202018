import { describe, expect, it } from 'vitest';
import { useAuthApp } from '../../../helpers/auth-app';
import { baseSettings, benchFdm, helmetSettings, libraryTeam } from './library-helpers';

describe('presets routes', () => {
  const { app, db } = useAuthApp();

  it('creates a preset at version 1 and reads it back with id and version', async () => {
    const { owner, base } = await libraryTeam(app, db);
    const created = await owner.agent
      .post(`${base}/presets`)
      .send({ name: 'Helmet crown seam', tags: ['Helmet', 'helmet', 'cosplay'], settings: helmetSettings });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    expect(created.body).toMatchObject({
      name: 'Helmet crown seam',
      version: 1,
      tags: ['helmet', 'cosplay'],
      schemaVersion: 1,
      archived: false,
    });
    expect(created.body.settings).toMatchObject({ joint: 'key', process: 'fdm', key: { width: 10, chamfer: 0.4 } });
    expect(created.body.settings.face).toBeUndefined();
    const read = await owner.agent.get(`${base}/presets/${created.body.id}`);
    expect(read.status).toBe(200);
    expect(read.body).toEqual(created.body);
  });

  it('answers 400 with the kit request’s own message when the settings are invalid', async () => {
    const { editor, base } = await libraryTeam(app, db);
    const res = await editor.agent
      .post(`${base}/presets`)
      .send({ name: 'Bad', settings: { ...helmetSettings, key: { shape: 'square', width: -3, depth: 8 } } });
    expect(res.status).toBe(400);
    expect(res.body.error.issues).toContainEqual({
      path: 'settings.key.width',
      message: expect.stringMatching(/key width must be at least 1 mm/),
    });
  });

  it('answers 409 when the team already has a preset of that name, in any case', async () => {
    const { editor, base } = await libraryTeam(app, db);
    await editor.agent.post(`${base}/presets`).send({ name: 'Wing spar', settings: baseSettings });
    const again = await editor.agent.post(`${base}/presets`).send({ name: 'WING SPAR', settings: baseSettings });
    expect(again.status).toBe(409);
    expect(again.body.error.message).toContain('WING SPAR');
  });

  it('saves each edit as a new version and lists what changed in plain words', async () => {
    const { editor, owner, base } = await libraryTeam(app, db);
    const profile = await owner.agent.post(`${base}/printer-profiles`).send(benchFdm);
    const { body: v1 } = await editor.agent
      .post(`${base}/presets`)
      .send({ name: 'Helmet seam', settings: helmetSettings });
    const v2 = await editor.agent.patch(`${base}/presets/${v1.id}`).send({
      baseVersion: 1,
      name: 'Helmet crown seam',
      tags: ['helmet'],
      printerProfileId: profile.body.id,
      settings: { ...helmetSettings, key: { ...helmetSettings.key, width: 12 } },
    });
    expect(v2.status, JSON.stringify(v2.body)).toBe(200);
    expect(v2.body).toMatchObject({
      id: v1.id,
      version: 2,
      name: 'Helmet crown seam',
      printerProfileName: 'Bench FDM',
    });
    const versions = await owner.agent.get(`${base}/presets/${v1.id}/versions`);
    expect(versions.status).toBe(200);
    expect(versions.body.items.map((v: { version: number }) => v.version)).toEqual([2, 1]);
    expect(versions.body.items[0].author).toEqual({ id: editor.id, name: 'Lib Editor' });
    expect(versions.body.items[0].changes).toEqual(
      expect.arrayContaining([
        'name "Helmet seam" → "Helmet crown seam"',
        'tags added: helmet',
        'printer profile none → "Bench FDM"',
        'key width 10 mm → 12 mm',
      ]),
    );
    expect(versions.body.items[1].changes).toEqual(['created']);
  });

  it('refuses a save based on an older version with 409 and the current version, and keeps the newer save', async () => {
    const { editor, owner, base } = await libraryTeam(app, db);
    const { body: v1 } = await editor.agent
      .post(`${base}/presets`)
      .send({ name: 'Display base', settings: baseSettings });
    const first = await owner.agent
      .patch(`${base}/presets/${v1.id}`)
      .send({ baseVersion: 1, description: 'Owner’s edit' });
    expect(first.body.version).toBe(2);
    const stale = await editor.agent
      .patch(`${base}/presets/${v1.id}`)
      .send({ baseVersion: 1, description: 'Editor’s edit' });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('CONFLICT');
    expect(stale.body.error.message).toMatch(/version 2 by Lib Owner/);
    expect(stale.body.error.current).toMatchObject({ id: v1.id, version: 2, description: 'Owner’s edit' });
    const now = await editor.agent.get(`${base}/presets/${v1.id}`);
    expect(now.body).toMatchObject({ version: 2, description: 'Owner’s edit' });
  });

  it('lets only one of two simultaneous saves of the same version win', async () => {
    const { editor, owner, base } = await libraryTeam(app, db);
    const { body: v1 } = await editor.agent.post(`${base}/presets`).send({ name: 'Race', settings: baseSettings });
    const [a, b] = await Promise.all([
      owner.agent.patch(`${base}/presets/${v1.id}`).send({ baseVersion: 1, description: 'A' }),
      editor.agent.patch(`${base}/presets/${v1.id}`).send({ baseVersion: 1, description: 'B' }),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    expect((await owner.agent.get(`${base}/presets/${v1.id}/versions`)).body.items).toHaveLength(2);
  });

  it('restores an old version as a new version, based on the current one', async () => {
    const { editor, base } = await libraryTeam(app, db);
    const { body: v1 } = await editor.agent.post(`${base}/presets`).send({ name: 'Spar', settings: helmetSettings });
    await editor.agent
      .patch(`${base}/presets/${v1.id}`)
      .send({ baseVersion: 1, settings: { ...helmetSettings, fit: 'press' } });
    const stale = await editor.agent.post(`${base}/presets/${v1.id}/versions/1/restore`).send({ baseVersion: 1 });
    expect(stale.status).toBe(409);
    const restored = await editor.agent.post(`${base}/presets/${v1.id}/versions/1/restore`).send({ baseVersion: 2 });
    expect(restored.status).toBe(200);
    expect(restored.body).toMatchObject({ version: 3, settings: { fit: 'snug' } });
    const { body: versions } = await editor.agent.get(`${base}/presets/${v1.id}/versions`);
    expect(versions.items[0]).toMatchObject({
      version: 3,
      restoredFrom: 1,
      changes: ['restored version 1', 'fit press → snug'],
    });
    const old = await editor.agent.get(`${base}/presets/${v1.id}/versions/2`);
    expect(old.body).toMatchObject({ version: 2, settings: { fit: 'press' } });
    expect((await editor.agent.get(`${base}/presets/${v1.id}/versions/9`)).status).toBe(404);
  });

  it('does not add a version when a save changes nothing', async () => {
    const { editor, base } = await libraryTeam(app, db);
    const { body: v1 } = await editor.agent.post(`${base}/presets`).send({ name: 'Same', settings: helmetSettings });
    const same = await editor.agent.patch(`${base}/presets/${v1.id}`).send({ baseVersion: 1, name: 'Same' });
    expect(same.body.version).toBe(1);
  });

  it('duplicates, archives and unarchives a preset', async () => {
    const { editor, base } = await libraryTeam(app, db);
    const { body: v1 } = await editor.agent
      .post(`${base}/presets`)
      .send({ name: 'Shield rim', settings: helmetSettings });
    const copy = await editor.agent.post(`${base}/presets/${v1.id}/duplicate`).send({});
    expect(copy.status).toBe(201);
    expect(copy.body).toMatchObject({ name: 'Shield rim (copy)', version: 1, settings: v1.settings });
    const second = await editor.agent.post(`${base}/presets/${v1.id}/duplicate`).send({});
    expect(second.body.name).toBe('Shield rim (copy) (2)');
    const archived = await editor.agent.post(`${base}/presets/${v1.id}/archive`);
    expect(archived.body.archived).toBe(true);
    const active = await editor.agent.get(`${base}/presets`);
    expect(active.body.items.map((p: { name: string }) => p.name)).not.toContain('Shield rim');
    const onlyArchived = await editor.agent.get(`${base}/presets?archived=archived`);
    expect(onlyArchived.body.items.map((p: { name: string }) => p.name)).toEqual(['Shield rim']);
    expect((await editor.agent.post(`${base}/presets/${v1.id}/unarchive`)).body.archived).toBe(false);
  });

  it('answers 404 for another team’s preset, through its own team’s path or the other’s', async () => {
    const a = await libraryTeam(app, db);
    const b = await libraryTeam(app, db);
    const { body: theirs } = await b.owner.agent
      .post(`${b.base}/presets`)
      .send({ name: 'Theirs', settings: helmetSettings });
    expect((await a.owner.agent.get(`${a.base}/presets/${theirs.id}`)).status).toBe(404);
    expect(
      (await a.owner.agent.patch(`${a.base}/presets/${theirs.id}`).send({ baseVersion: 1, name: 'Mine' })).status,
    ).toBe(404);
    expect((await a.owner.agent.delete(`${a.base}/presets/${theirs.id}`)).status).toBe(404);
    expect((await a.owner.agent.get(`${b.base}/presets/${theirs.id}`)).status).toBe(404);
  });

  it('refuses a printer profile of another team', async () => {
    const a = await libraryTeam(app, db);
    const b = await libraryTeam(app, db);
    const { body: theirs } = await b.owner.agent.post(`${b.base}/printer-profiles`).send(benchFdm);
    const res = await a.owner.agent
      .post(`${a.base}/presets`)
      .send({ name: 'X', printerProfileId: theirs.id, settings: helmetSettings });
    expect(res.status).toBe(400);
    expect(res.body.error.issues[0].path).toBe('printerProfileId');
  });
});
