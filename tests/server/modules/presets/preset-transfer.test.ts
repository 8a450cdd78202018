import { describe, expect, it } from 'vitest';
import { useAuthApp } from '../../../helpers/auth-app';
import { baseSettings, benchFdm, helmetSettings, libraryTeam } from './library-helpers';

const fileOf = (presets: unknown[]) =>
  Buffer.from(JSON.stringify({ format: 'seamwright-presets', formatVersion: 1, presets }));
const item = (name: string, settings: object = helmetSettings) => ({
  name,
  tags: ['imported'],
  schemaVersion: 1,
  settings,
});

describe('preset export and import', () => {
  const { app, db } = useAuthApp();

  it('exports the team’s presets as one file that imports into another team', async () => {
    const a = await libraryTeam(app, db);
    await a.owner.agent.post(`${a.base}/printer-profiles`).send(benchFdm);
    const profiles = (await a.owner.agent.get(`${a.base}/printer-profiles`)).body.items;
    await a.editor.agent
      .post(`${a.base}/presets`)
      .send({ name: 'Helmet seam', tags: ['helmet'], printerProfileId: profiles[0].id, settings: helmetSettings });
    await a.editor.agent.post(`${a.base}/presets`).send({ name: 'Display base', settings: baseSettings });

    const exported = await a.viewer.agent.get(`${a.base}/presets/export`);
    expect(exported.status).toBe(200);
    expect(exported.headers['content-disposition']).toMatch(
      /^attachment; filename="?lib-owner-s-workshop-presets\.json"?$/,
    );
    const file = JSON.parse(exported.text);
    expect(file).toMatchObject({ format: 'seamwright-presets', formatVersion: 1 });
    expect(file.presets.map((p: { name: string }) => p.name)).toEqual(['Helmet seam', 'Display base']);
    expect(file.presets[0]).toMatchObject({ printerProfile: 'Bench FDM', schemaVersion: 1 });

    const b = await libraryTeam(app, db);
    await b.editor.agent.post(`${b.base}/presets`).send({ name: 'Helmet seam', settings: helmetSettings });
    const imported = await b.editor.agent
      .post(`${b.base}/presets/import`)
      .attach('file', Buffer.from(exported.text), 'studio-presets.json');
    expect(imported.status, JSON.stringify(imported.body)).toBe(201);
    expect(imported.body).toMatchObject({ written: true, added: 1, renamed: 1, refused: 0 });
    expect(imported.body.items[0]).toMatchObject({
      outcome: 'renamed',
      savedAs: 'Helmet seam (2)',
      reason: 'this team already has a preset named "Helmet seam"',
      notes: ['this team has no printer profile "Bench FDM": imported without one'],
    });
    const list = await b.viewer.agent.get(`${b.base}/presets?sort=name&order=asc`);
    expect(list.body.items.map((p: { name: string }) => p.name)).toEqual([
      'Display base',
      'Helmet seam',
      'Helmet seam (2)',
    ]);
    const id = list.body.items[2].id;
    const versions = await b.viewer.agent.get(`${b.base}/presets/${id}/versions`);
    expect(versions.body.items[0].changes).toEqual(['imported from studio-presets.json']);
  });

  it('writes nothing when one preset in the middle is broken, and reports each item', async () => {
    const { editor, base } = await libraryTeam(app, db);
    const broken = { ...helmetSettings, key: { shape: 'square', width: 10, depth: 0.5 } };
    const file = fileOf([
      item('First'),
      item('Second', broken),
      { name: 'Third', schemaVersion: 99, settings: helmetSettings },
      item('Fourth'),
    ]);
    const res = await editor.agent.post(`${base}/presets/import`).attach('file', file, 'mixed.json');
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe(
      'Nothing was imported: 2 of 4 presets were refused. Fix them and import the file again.',
    );
    const report = res.body.error.report;
    expect(report).toMatchObject({ written: false, added: 2, renamed: 0, refused: 2 });
    expect(report.items.map((i: { outcome: string }) => i.outcome)).toEqual(['added', 'refused', 'refused', 'added']);
    expect(report.items[1].reason).toMatch(/^settings\.key\.depth: key depth must be at least 1 mm/);
    expect(report.items[2].reason).toMatch(/saved by a later Seamwright \(schemaVersion 99\)/);
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toEqual(['presets.1', 'presets.2']);
    expect((await editor.agent.get(`${base}/presets`)).body.total).toBe(0);
  });

  it('renames clashes inside the file itself', async () => {
    const { editor, base } = await libraryTeam(app, db);
    const res = await editor.agent
      .post(`${base}/presets/import`)
      .attach('file', fileOf([item('Spar'), item('spar')]), 'dupes.json');
    expect(res.status).toBe(201);
    expect(res.body.items.map((i: { savedAs: string }) => i.savedAs)).toEqual(['Spar', 'spar (2)']);
  });

  it('refuses a file that is not JSON, not a presets file, or larger than 1 MiB', async () => {
    const { editor, viewer, base } = await libraryTeam(app, db);
    const notJson = await editor.agent.post(`${base}/presets/import`).attach('file', Buffer.from('{oops'), 'x.json');
    expect(notJson.status).toBe(400);
    expect(notJson.body.error.message).toBe('The presets file is not valid JSON.');
    const other = await editor.agent
      .post(`${base}/presets/import`)
      .attach('file', Buffer.from('{"format":"other"}'), 'x.json');
    expect(other.status).toBe(400);
    expect(other.body.error.message).toMatch(/not a Seamwright presets file/);
    const big = await editor.agent
      .post(`${base}/presets/import`)
      .attach('file', Buffer.alloc(1024 * 1024 + 1, 32), 'big.json');
    expect(big.status).toBe(413);
    expect(big.body.error.code).toBe('PAYLOAD_TOO_LARGE');
    const asViewer = await viewer.agent.post(`${base}/presets/import`).attach('file', fileOf([item('X')]), 'x.json');
    expect(asViewer.status).toBe(403);
  });
});
