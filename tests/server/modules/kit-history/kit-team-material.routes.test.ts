import { describe, expect, it } from 'vitest';
import JSZip from 'jszip';
import { useAuthApp } from '../../../helpers/auth-app';
import { baseSettings, benchFdm, helmetSettings, libraryTeam } from '../presets/library-helpers';

const face = { shape: 'rect', width: 60, height: 40 } as const;

// supertest collects a binary body only with an explicit parser.
function binary(res: NodeJS.ReadableStream, done: (e: Error | null, b?: Buffer) => void) {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => done(null, Buffer.concat(chunks)));
}
const asBinary = binary as unknown as Parameters<import('supertest').Test['parse']>[0];

async function manifestOf(zipBytes: Buffer) {
  const zip = await JSZip.loadAsync(zipBytes);
  return JSON.parse(await zip.file('manifest.json')!.async('string'));
}

describe('kit history routes with a team material', () => {
  const { app, db } = useAuthApp();

  async function teamWithMaterial(body: Record<string, unknown>) {
    const team = await libraryTeam(app, db);
    const material = await team.editor.agent.post(`${team.base}/materials`).send(body);
    expect(material.status, JSON.stringify(material.body)).toBe(201);
    return { ...team, material: material.body as { id: string } };
  }

  it('applies the team material’s adjustment for the fit class and names it in the derivation', async () => {
    const { base, viewer, owner, material } = await teamWithMaterial({
      name: 'Grey matte PLA',
      baseMaterial: 'PLA',
      clearanceAdjustments: { snug: 0.03, slide: 0.1 },
    });
    const request = { ...helmetSettings, face };
    const plain = await viewer.agent.post(`${base}/kits`).send({ request }).buffer(true).parse(asBinary);
    const tuned = await viewer.agent
      .post(`${base}/kits`)
      .send({ request, teamMaterialId: material.id })
      .buffer(true)
      .parse(asBinary);
    expect(tuned.status, String(tuned.body)).toBe(201);
    const before = await manifestOf(plain.body as Buffer);
    const manifest = await manifestOf(tuned.body as Buffer);
    // PLA snug on FDM: 0.16 mm published default, PLA's built-in adjustment 0 (shared/fit/clearance-defaults.ts,
    // material-adjustments.ts); the team material's snug adjustment adds 0.03 mm.
    expect(before.clearancePerSide).toBeCloseTo(0.16, 6);
    expect(manifest.clearancePerSide).toBeCloseTo(before.clearancePerSide + 0.03, 6);
    expect(manifest.request.materialTuning).toEqual({ name: 'Grey matte PLA', clearanceAdjustment: 0.03 });
    expect(manifest.fit.derivation).toContain('+0.03 mm for Grey matte PLA (a team material based on PLA)');

    const kitId = tuned.headers['x-seamwright-kit-id'] as string;
    const entry = await owner.agent.get(`${base}/kits/${kitId}`);
    expect(entry.body).toMatchObject({
      request: { materialTuning: { name: 'Grey matte PLA', clearanceAdjustment: 0.03 } },
      summary: {
        clearancePerSide: manifest.clearancePerSide,
        teamMaterial: { id: material.id, name: 'Grey matte PLA', clearanceAdjustment: 0.03 },
      },
    });
    expect(entry.body.summary.derivation).toContain('Grey matte PLA (a team material based on PLA)');
    // The stored request carries the tuning, so a rebuild gives the same bytes even if the material changes later.
    await owner.agent.patch(`${base}/materials/${material.id}`).send({ clearanceAdjustments: { snug: 0.2 } });
    expect((await owner.agent.get(`${base}/kits/${kitId}/check`)).body.identical).toBe(true);
  });

  it('replaces the base material’s built-in adjustment and keeps the printer’s calibration', async () => {
    const { base, owner, material } = await teamWithMaterial({
      name: 'Clear PETG',
      baseMaterial: 'PETG',
      clearanceAdjustments: { slide: 0.05 },
    });
    const profile = await owner.agent
      .post(`${base}/printer-profiles`)
      .send({ ...benchFdm, calibration: [{ ...benchFdm.calibration[0], material: 'PETG', fit: 'slide' }] });
    const request = { ...baseSettings, face: { shape: 'rect', width: 90, height: 60 } };
    const send = (extra: Record<string, unknown>) =>
      owner.agent
        .post(`${base}/kits`)
        .send({ request, printerProfileId: profile.body.id, ...extra })
        .buffer(true)
        .parse(asBinary);
    const before = await manifestOf((await send({})).body as Buffer);
    const manifest = await manifestOf((await send({ teamMaterialId: material.id })).body as Buffer);
    // PETG's built-in +0.02 mm (common practice, shared/fit/material-adjustments.ts) gives way to the team's
    // +0.05 mm: 0.03 mm more per side; the profile's −0.03 mm applies in both.
    expect(manifest.clearancePerSide).toBeCloseTo(before.clearancePerSide + 0.03, 6);
    expect(manifest.fit.derivation).not.toMatch(/\+0\.02 mm for PETG/);
    expect(manifest.fit.derivation).toContain('+0.05 mm for Clear PETG (a team material based on PETG)');
    expect(manifest.fit.derivation).toContain('printer profile "Bench FDM"');
  });

  it('refuses a team material based on another material than the kit’s', async () => {
    const { base, viewer, material } = await teamWithMaterial({ name: 'Clear PETG', baseMaterial: 'PETG' });
    const res = await viewer.agent
      .post(`${base}/kits`)
      .send({ request: { ...helmetSettings, face }, teamMaterialId: material.id });
    expect(res.status).toBe(400);
    expect(res.body.error).toEqual({
      code: 'VALIDATION_FAILED',
      message: 'Team material "Clear PETG" is based on PETG, but this kit is for PLA.',
      issues: [{ path: 'teamMaterialId', message: 'Choose a team material based on PLA, or none.' }],
    });
    expect((await viewer.agent.get(`${base}/kits`)).body.total).toBe(0);
  });

  it('answers 404 when the team material is another team’s or unknown, and 400 when it is not an id', async () => {
    const other = await teamWithMaterial({ name: 'Grey matte PLA', baseMaterial: 'PLA' });
    const { base, owner } = await libraryTeam(app, db);
    const request = { ...helmetSettings, face };
    for (const teamMaterialId of [other.material.id, crypto.randomUUID()]) {
      const res = await owner.agent.post(`${base}/kits`).send({ request, teamMaterialId });
      expect(res.status).toBe(404);
      expect(res.body.error).toEqual({
        code: 'NOT_FOUND',
        message: 'There is no such material in this team.',
        issues: [{ path: 'teamMaterialId', message: 'Choose one of this team’s materials, or none.' }],
      });
    }
    const bad = await owner.agent.post(`${base}/kits`).send({ request, teamMaterialId: 'grey' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues).toContainEqual({
      path: 'teamMaterialId',
      message: 'teamMaterialId must be the id of a team material',
    });
    expect((await owner.agent.get(`${base}/kits`)).body.total).toBe(0);
  });
});
