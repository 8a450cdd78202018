import { describe, expect, it } from 'vitest';
import { useAuthApp } from '../../../helpers/auth-app';
import { materialAdjustments, shrinkageDefaults } from '../../../../shared/fit';
import { libraryTeam } from '../presets/library-helpers';

describe('material routes', () => {
  const { app, db } = useAuthApp();

  it('answers the built-in catalogue with the fit engine’s numbers and their sources', async () => {
    const { viewer, base } = await libraryTeam(app, db);
    const res = await viewer.agent.get(`${base}/materials/catalogue`);
    expect(res.status).toBe(200);
    expect(res.body.items).toHaveLength(8);
    const petg = res.body.items.find((m: { id: string }) => m.id === 'PETG');
    expect(petg).toEqual({
      id: 'PETG',
      process: 'fdm',
      shrinkagePercent: shrinkageDefaults.PETG.percent,
      shrinkageSource: shrinkageDefaults.PETG.source,
      clearanceAdjustmentMm: materialAdjustments.PETG.mm,
      clearanceAdjustmentSource: 'common practice',
    });
    expect(res.body.items.find((m: { id: string }) => m.id === 'resin-tough').process).toBe('resin');
  });

  it('creates, edits, lists and (as owner) deletes team materials', async () => {
    const { editor, owner, base } = await libraryTeam(app, db);
    const created = await editor.agent.post(`${base}/materials`).send({
      name: 'Bone-white PLA',
      baseMaterial: 'PLA',
      shrinkagePercent: 0.3,
      clearanceAdjustments: { snug: 0.02 },
    });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    expect(created.body).toMatchObject({
      process: 'fdm',
      shrinkagePercent: 0.3,
      clearanceAdjustments: { press: 0, snug: 0.02, slide: 0 },
    });
    await editor.agent.post(`${base}/materials`).send({ name: 'Grey tough resin', baseMaterial: 'resin-tough' });
    const clash = await editor.agent.post(`${base}/materials`).send({ name: 'bone-white pla', baseMaterial: 'PLA' });
    expect(clash.status).toBe(409);
    const tooMuch = await editor.agent
      .post(`${base}/materials`)
      .send({ name: 'X', baseMaterial: 'PLA', shrinkagePercent: 9 });
    expect(tooMuch.body.error.issues[0]).toEqual({
      path: 'shrinkagePercent',
      message: 'shrinkage must be at most 5 %; it is 9 %',
    });
    const edited = await editor.agent
      .patch(`${base}/materials/${created.body.id}`)
      .send({ notes: 'From the March batch' });
    expect(edited.body).toMatchObject({ notes: 'From the March batch', shrinkagePercent: 0.3 });
    expect(
      (await editor.agent.get(`${base}/materials?base=resin-tough`)).body.items.map((m: { name: string }) => m.name),
    ).toEqual(['Grey tough resin']);
    expect((await editor.agent.delete(`${base}/materials/${created.body.id}`)).status).toBe(403);
    expect((await owner.agent.delete(`${base}/materials/${created.body.id}`)).status).toBe(204);
    expect((await owner.agent.get(`${base}/materials`)).body.total).toBe(1);
  });

  it('lets editors change clearance adjustments, puts bounds errors at the field and refuses viewers', async () => {
    const { editor, viewer, base } = await libraryTeam(app, db);
    const created = await editor.agent.post(`${base}/materials`).send({ name: 'Grey matte PLA', baseMaterial: 'PLA' });
    const url = `${base}/materials/${created.body.id}`;
    const edited = await editor.agent.patch(url).send({ clearanceAdjustments: { press: -0.02, snug: 0.03, slide: 0 } });
    expect(edited.status).toBe(200);
    expect(edited.body.clearanceAdjustments).toEqual({ press: -0.02, snug: 0.03, slide: 0 });
    // Naming one fit class changes that one only.
    const slideOnly = await editor.agent.patch(url).send({ clearanceAdjustments: { slide: 0.05 } });
    expect(slideOnly.body.clearanceAdjustments).toEqual({ press: -0.02, snug: 0.03, slide: 0.05 });
    const tooMuch = await editor.agent.patch(url).send({ clearanceAdjustments: { press: 0, snug: 0.6, slide: 0 } });
    expect(tooMuch.status).toBe(400);
    expect(tooMuch.body.error.issues).toEqual([
      { path: 'clearanceAdjustments.snug', message: 'snug clearance adjustment must be at most 0.5 mm; it is 0.6 mm' },
    ]);
    expect((await viewer.agent.patch(url).send({ notes: 'mine' })).status).toBe(403);
  });
});
