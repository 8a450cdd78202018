import { describe, expect, it } from 'vitest';
import { useAuthApp } from '../../../helpers/auth-app';
import { benchFdm, libraryTeam } from '../presets/library-helpers';

describe('printer profile routes', () => {
  const { app, db } = useAuthApp();

  it('creates an FDM profile with its calibration table and reads it back', async () => {
    const { editor, viewer, base } = await libraryTeam(app, db);
    const created = await editor.agent.post(`${base}/printer-profiles`).send(benchFdm);
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    expect(created.body).toMatchObject({
      name: 'Bench FDM',
      process: 'fdm',
      buildVolume: { x: 256, y: 256, z: 256 },
      nozzleDiameter: 0.4,
      updatedBy: { name: 'Lib Editor' },
    });
    expect(created.body.calibration).toEqual([
      { material: 'PLA', fit: 'snug', offsetMm: -0.03, measuredOn: '2026-01-12', source: 'fit test' },
    ]);
    expect((await viewer.agent.get(`${base}/printer-profiles/${created.body.id}`)).body).toEqual(created.body);
  });

  it('refuses a resin profile with a nozzle, an FDM one without, a filament on resin and a repeated entry', async () => {
    const { editor, base } = await libraryTeam(app, db);
    const resinNozzle = await editor.agent
      .post(`${base}/printer-profiles`)
      .send({ ...benchFdm, process: 'resin', calibration: [] });
    expect(resinNozzle.body.error.issues).toContainEqual({
      path: 'nozzleDiameter',
      message: 'A resin printer has no nozzle: leave the nozzle diameter empty.',
    });
    const { nozzleDiameter: _n, ...noNozzle } = benchFdm;
    expect((await editor.agent.post(`${base}/printer-profiles`).send(noNozzle)).body.error.issues[0].path).toBe(
      'nozzleDiameter',
    );
    const entry = benchFdm.calibration[0];
    const twice = await editor.agent
      .post(`${base}/printer-profiles`)
      .send({ ...benchFdm, calibration: [entry, { ...entry, offsetMm: 0.02 }] });
    expect(twice.body.error.issues[0]).toMatchObject({
      path: 'calibration.1.fit',
      message: 'PLA snug is calibrated twice: keep one entry per material and fit.',
    });
    const resin = {
      name: 'Vat',
      process: 'resin',
      buildVolume: { x: 120, y: 70, z: 150 },
      layerHeight: 0.05,
      calibration: [entry],
    };
    expect((await editor.agent.post(`${base}/printer-profiles`).send(resin)).body.error.issues[0].path).toBe(
      'calibration.0.material',
    );
  });

  it('checks an edit against the whole merged profile', async () => {
    const { editor, base } = await libraryTeam(app, db);
    const { body } = await editor.agent.post(`${base}/printer-profiles`).send(benchFdm);
    const toResin = await editor.agent.patch(`${base}/printer-profiles/${body.id}`).send({ process: 'resin' });
    expect(toResin.status).toBe(400);
    const edited = await editor.agent
      .patch(`${base}/printer-profiles/${body.id}`)
      .send({ notes: 'Hardened nozzle since March', layerHeight: 0.16 });
    expect(edited.body).toMatchObject({
      notes: 'Hardened nozzle since March',
      layerHeight: 0.16,
      calibration: body.calibration,
    });
  });

  it('lists with search, process filter and paging', async () => {
    const { editor, base } = await libraryTeam(app, db);
    await editor.agent.post(`${base}/printer-profiles`).send(benchFdm);
    await editor.agent.post(`${base}/printer-profiles`).send({ ...benchFdm, name: 'Big FDM', notes: 'cosplay armour' });
    await editor.agent
      .post(`${base}/printer-profiles`)
      .send({ name: 'Vat', process: 'resin', buildVolume: { x: 120, y: 70, z: 150 }, layerHeight: 0.05 });
    expect(
      (await editor.agent.get(`${base}/printer-profiles?process=resin`)).body.items.map(
        (p: { name: string }) => p.name,
      ),
    ).toEqual(['Vat']);
    expect((await editor.agent.get(`${base}/printer-profiles?q=armour`)).body.total).toBe(1);
    const page = await editor.agent.get(`${base}/printer-profiles?sort=name&order=asc&pageSize=2&page=2`);
    expect(page.body).toMatchObject({ total: 3, items: [{ name: 'Vat' }] });
  });
});
