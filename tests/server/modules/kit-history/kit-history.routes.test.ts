import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import JSZip from 'jszip';
import { eq } from 'drizzle-orm';
import { kitDownloads } from '../../../../server/db/schema';
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

async function stlHashesOf(zipBytes: Buffer): Promise<Record<string, string>> {
  const zip = await JSZip.loadAsync(zipBytes);
  const out: Record<string, string> = {};
  for (const name of Object.keys(zip.files).filter((n) => n.endsWith('.stl'))) {
    out[name] = createHash('sha256')
      .update(await zip.file(name)!.async('uint8array'))
      .digest('hex');
  }
  return out;
}

describe('kit history routes', () => {
  const { app, db } = useAuthApp();

  async function recordedKit() {
    const team = await libraryTeam(app, db);
    const profile = (await team.owner.agent.post(`${team.base}/printer-profiles`).send(benchFdm)).body;
    const preset = (
      await team.editor.agent
        .post(`${team.base}/presets`)
        .send({ name: 'Helmet crown seam', printerProfileId: profile.id, settings: helmetSettings })
    ).body;
    const res = await team.viewer.agent
      .post(`${team.base}/kits`)
      .send({ request: { ...helmetSettings, face }, presetId: preset.id })
      .buffer(true)
      .parse(asBinary);
    expect(res.status, String(res.body)).toBe(201);
    return { ...team, profile, preset, res, kitId: res.headers['x-seamwright-kit-id'] as string };
  }

  it('uses no printer when the body says null, even when the preset names one', async () => {
    const { base, viewer, preset } = await recordedKit();
    const res = await viewer.agent
      .post(`${base}/kits`)
      .send({ request: { ...helmetSettings, face }, presetId: preset.id, printerProfileId: null });
    expect(res.status).toBe(201);
    const entry = await viewer.agent.get(`${base}/kits/${res.headers['x-seamwright-kit-id']}`);
    expect(entry.body).toMatchObject({ presetName: 'Helmet crown seam', printerProfileId: null, calibration: null });
  });

  it('records who, when, the request, preset version and the printer’s calibration, and returns the zip', async () => {
    const { res, kitId, base, viewer, owner } = await recordedKit();
    expect(res.headers['content-type']).toBe('application/zip');
    expect(res.headers.location).toBe(`${base}/kits/${kitId}`);
    const zip = await JSZip.loadAsync(res.body as Buffer);
    const manifest = JSON.parse(await zip.file('manifest.json')!.async('string'));
    // PLA snug on FDM: 0.16 mm published default (shared/fit/clearance-defaults.ts), −0.03 mm from the profile.
    expect(manifest.request.calibrationOffset).toBe(-0.03);
    expect(manifest.clearancePerSide).toBeCloseTo(0.13, 6);

    const entry = await owner.agent.get(`${base}/kits/${kitId}`);
    expect(entry.status).toBe(200);
    expect(entry.body).toMatchObject({
      user: { id: viewer.id, name: 'Lib Viewer' },
      presetName: 'Helmet crown seam',
      presetVersion: 1,
      printerProfileName: 'Bench FDM',
      calibration: { offsetMm: -0.03 },
      summary: { joint: 'key', material: 'PLA', fit: 'snug', clearancePerSide: manifest.clearancePerSide },
      request: { face, calibrationOffset: -0.03 },
    });
    expect(entry.body.summary.derivation).toContain(
      'the calibration of printer profile "Bench FDM" (PLA snug, fit test on 2026-01-12) −0.03 mm',
    );
    expect(entry.body.files.map((f: { name: string }) => f.name).sort()).toEqual([
      'key.stl',
      'pocket-cutter-A.stl',
      'pocket-cutter-B.stl',
    ]);
    expect(
      Object.fromEntries(entry.body.files.map((f: { name: string; sha256: string }) => [f.name, f.sha256])),
    ).toEqual(await stlHashesOf(res.body as Buffer));
  });

  it('re-downloads a recorded kit byte for byte and says so', async () => {
    const { res, kitId, base, editor } = await recordedKit();
    const check = await editor.agent.get(`${base}/kits/${kitId}/check`);
    expect(check.status).toBe(200);
    expect(check.body).toMatchObject({ identical: true, original: true });
    expect(check.body.message).toMatch(/all 3 STL files are byte-identical to the original download/);
    expect(check.body.files.every((f: { status: string }) => f.status === 'same')).toBe(true);

    const again = await editor.agent.get(`${base}/kits/${kitId}/download`).buffer(true).parse(asBinary);
    expect(again.status).toBe(200);
    expect(again.headers['x-seamwright-identical']).toBe('true');
    expect(await stlHashesOf(again.body as Buffer)).toEqual(await stlHashesOf(res.body as Buffer));
    // The zip itself is stamped with a fixed date, so the whole file matches too.
    expect(Buffer.compare(again.body as Buffer, res.body as Buffer)).toBe(0);
  });

  it('says in plain words when this version builds different geometry, and offers both', async () => {
    const { res, kitId, base, editor } = await recordedKit();
    // Stand in for a kit recorded by an older Seamwright whose key came out differently.
    const [row] = await db.select({ files: kitDownloads.files }).from(kitDownloads).where(eq(kitDownloads.id, kitId));
    const files = row!.files.map((f) => (f.name === 'key.stl' ? { ...f, sha256: '0'.repeat(64) } : f));
    await db.update(kitDownloads).set({ files, engineVersion: '0.0.9' }).where(eq(kitDownloads.id, kitId));

    const check = await editor.agent.get(`${base}/kits/${kitId}/check`);
    expect(check.body.identical).toBe(false);
    expect(check.body.message).toMatch(
      /builds this kit differently from the one that built it \(0\.0\.9\): key\.stl has different geometry\. Both are offered/,
    );
    expect(check.body.files.find((f: { name: string }) => f.name === 'key.stl').status).toBe('changed');

    const current = await editor.agent
      .get(`${base}/kits/${kitId}/download?variant=current`)
      .buffer(true)
      .parse(asBinary);
    expect(current.headers['x-seamwright-identical']).toBe('false');
    expect(current.headers['content-disposition']).toMatch(/-rebuilt-/);
    const original = await editor.agent
      .get(`${base}/kits/${kitId}/download?variant=original`)
      .buffer(true)
      .parse(asBinary);
    expect(Buffer.compare(original.body as Buffer, res.body as Buffer)).toBe(0);
  });

  it('refuses a printer profile of the other process', async () => {
    const { owner, base } = await libraryTeam(app, db);
    const resin = await owner.agent
      .post(`${base}/printer-profiles`)
      .send({ name: 'Vat', process: 'resin', buildVolume: { x: 120, y: 70, z: 150 }, layerHeight: 0.05 });
    const res = await owner.agent
      .post(`${base}/kits`)
      .send({ request: { ...helmetSettings, face }, printerProfileId: resin.body.id });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('Printer profile "Vat" is a resin printer, but this kit is for FDM.');
  });

  it('lists the history with search, filters and paging', async () => {
    const { kitId, preset, base, owner, viewer } = await recordedKit();
    const other = await owner.agent.post(`${base}/kits`).send({ request: { ...baseSettings, face } });
    expect(other.status).toBe(201);
    const all = await viewer.agent.get(`${base}/kits`);
    expect(all.body.total).toBe(2);
    expect(all.body.items[0].summary.joint).toBe('dovetail'); // newest first
    expect((await viewer.agent.get(`${base}/kits?joint=key`)).body.items.map((i: { id: string }) => i.id)).toEqual([
      kitId,
    ]);
    expect((await viewer.agent.get(`${base}/kits?preset=${preset.id}`)).body.total).toBe(1);
    expect((await viewer.agent.get(`${base}/kits?author=${owner.id}`)).body.total).toBe(1);
    expect((await viewer.agent.get(`${base}/kits?q=crown`)).body.total).toBe(1);
    expect((await viewer.agent.get(`${base}/kits?material=PETG&pageSize=1`)).body).toMatchObject({
      total: 1,
      pageSize: 1,
    });
  });
});
