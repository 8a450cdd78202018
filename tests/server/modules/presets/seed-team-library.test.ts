import { describe, expect, it } from 'vitest';
import { seedTeamLibrary } from '../../../../server/db/seed/seed-team-library';
import { useAuthApp } from '../../../helpers/auth-app';
import { libraryTeam } from './library-helpers';

describe('seedTeamLibrary', () => {
  const { app, db } = useAuthApp();

  it('gives the studio two printers, five presets (one archived, one at version 2) and three recorded kits, once', async () => {
    const { teamId, owner, editor, viewer, base } = await libraryTeam(app, db);
    const as = (p: typeof owner) => ({ id: p.id, email: p.email, name: p.name, emailVerified: true });
    const people = { owner: as(owner), editor: as(editor) };
    await db.transaction((tx) => seedTeamLibrary(tx, teamId, people));
    await db.transaction((tx) => seedTeamLibrary(tx, teamId, people));

    const printers = (await viewer.agent.get(`${base}/printer-profiles?sort=name&order=asc`)).body;
    expect(printers.items.map((p: { process: string }) => p.process)).toEqual(['fdm', 'resin']);
    const all = (await viewer.agent.get(`${base}/presets?archived=all&sort=name&order=asc`)).body;
    expect(all.total).toBe(5);
    expect(all.items.find((p: { name: string }) => p.name === 'Helmet crown seam').version).toBe(2);
    expect((await viewer.agent.get(`${base}/presets`)).body.total).toBe(4);
    const kits = (await viewer.agent.get(`${base}/kits`)).body;
    expect(kits.total).toBe(3);
    expect(kits.items[0].presetName).toBe('Long wing spar');
    const helmetKit = kits.items.find((k: { presetName: string }) => k.presetName === 'Helmet crown seam');
    expect(helmetKit).toMatchObject({
      presetVersion: 2,
      printerProfileName: 'Big bench FDM',
      calibration: { offsetMm: -0.03 },
    });
    const check = await viewer.agent.get(`${base}/kits/${helmetKit.id}/check`);
    expect(check.body.identical).toBe(true);
    expect((await viewer.agent.get(`${base}/materials`)).body.total).toBe(2);
  });
});
