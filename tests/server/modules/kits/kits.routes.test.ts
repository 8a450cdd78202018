import { describe, expect, it } from 'vitest';
import request from 'supertest';
import JSZip from 'jszip';
import { useTestApp } from '../../../helpers/test-app';
import { binaryBody } from '../../../helpers/binary-body';

const keyKit = {
  joint: 'key',
  material: 'PLA',
  fit: 'snug',
  face: { shape: 'rect', width: 80, height: 60 },
  key: { shape: 'square', width: 10, depth: 8, count: 8 },
};

const dovetailKit = {
  joint: 'dovetail',
  material: 'PETG',
  fit: 'slide',
  face: { shape: 'rect', width: 90, height: 60 },
  dovetail: { rootWidth: 12, height: 6, slope: 6, count: 3 },
};

describe('POST /api/kits', () => {
  const { app } = useTestApp();

  it('answers a zip of STLs, manifest.json and README.txt for a key kit, without sign-in', async () => {
    const res = await request(app).post('/api/kits').send(keyKit).buffer(true).parse(binaryBody);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/zip');
    expect(res.headers['content-disposition']).toMatch(
      /^attachment; filename="?seamwright-key-kit-[0-9a-f]{8}\.zip"?$/,
    );
    const zip = await JSZip.loadAsync(res.body as Buffer);
    const names = Object.keys(zip.files).sort();
    expect(names).toEqual(['README.txt', 'key.stl', 'manifest.json', 'pocket-cutter-A.stl', 'pocket-cutter-B.stl']);
    const manifest = JSON.parse(await zip.file('manifest.json')!.async('string'));
    expect(manifest.units).toBe('mm');
    const key = manifest.parts.find((p: { role: string }) => p.role === 'key');
    expect(key.quantity).toBe(8);
    for (const part of manifest.parts) {
      const stl = await zip.file(part.file)!.async('uint8array');
      // Binary STL size = 84 + 50·N (StereoLithography Interface Specification, 3D Systems 1989).
      expect(stl.byteLength).toBe(84 + 50 * part.triangles);
    }
    const readme = await zip.file('README.txt')!.async('string');
    expect(readme).toMatch(/ventilat/i);
  });

  it('gives byte-identical zips for the same request', async () => {
    const a = await request(app).post('/api/kits').send(dovetailKit).buffer(true).parse(binaryBody);
    const b = await request(app).post('/api/kits').send(dovetailKit).buffer(true).parse(binaryBody);
    expect(a.status).toBe(200);
    expect(Buffer.compare(a.body as Buffer, b.body as Buffer)).toBe(0);
    const zip = await JSZip.loadAsync(a.body as Buffer);
    const manifest = JSON.parse(await zip.file('manifest.json')!.async('string'));
    expect(manifest.parts.map((p: { role: string }) => p.role).sort()).toEqual(['rail', 'slot-cutter']);
  });

  it('answers 400 with a path per problem when the body is invalid', async () => {
    const res = await request(app)
      .post('/api/kits')
      .send({ ...keyKit, material: 'unobtainium', key: { ...keyKit.key, width: -3, depth: 'deep' } });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
    const paths = res.body.error.issues.map((i: { path: string }) => i.path);
    expect(paths).toEqual(expect.arrayContaining(['material', 'key.width', 'key.depth']));
  });

  it('answers 422 with the numbers when the keys cannot fit the face', async () => {
    const res = await request(app)
      .post('/api/kits')
      .send({
        ...keyKit,
        face: { shape: 'rect', width: 12, height: 60 },
        key: { shape: 'square', width: 10, depth: 8, margin: 3 },
      });
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('GEOMETRY_IMPOSSIBLE');
    expect(res.body.error.message).toMatch(/\d+(\.\d+)? mm/);
    expect(res.headers['content-disposition']).toBeUndefined();
  });

  it('answers 400, not a hang, for a 10,000-point polygon face', async () => {
    const points = Array.from({ length: 10_000 }, (_, i) => {
      const a = (2 * Math.PI * i) / 10_000;
      return [40 * Math.cos(a), 40 * Math.sin(a)];
    });
    const res = await request(app)
      .post('/api/kits')
      .send({ ...keyKit, face: { shape: 'polygon', points } });
    expect([400, 413]).toContain(res.status);
    expect(res.body.error.message).toMatch(/points|larger/);
  });

  it('answers 422 for a self-intersecting polygon face', async () => {
    const bowTie = [
      [-20, -20],
      [20, 20],
      [20, -20],
      [-20, 20],
    ];
    const res = await request(app)
      .post('/api/kits')
      .send({ ...keyKit, face: { shape: 'polygon', points: bowTie } });
    expect([400, 422]).toContain(res.status);
    expect(res.body.error.message).toMatch(/cross|intersect/i);
  });
});

describe('POST /api/kits/summary', () => {
  const { app } = useTestApp();

  it('answers the same manifest as the zip holds, as JSON', async () => {
    const summary = await request(app).post('/api/kits/summary').send(keyKit);
    expect(summary.status).toBe(200);
    const zipped = await request(app).post('/api/kits').send(keyKit).buffer(true).parse(binaryBody);
    const zip = await JSZip.loadAsync(zipped.body as Buffer);
    const manifest = JSON.parse(await zip.file('manifest.json')!.async('string'));
    expect(summary.body).toEqual(manifest);
    expect(summary.body.clearancePerSide).toBeGreaterThan(0);
    expect(
      summary.body.parts.find((p: { role: string; half?: string }) => p.role === 'pocket-cutter' && p.half === 'A')
        .positions,
    ).toHaveLength(8);
  });
});

describe('POST /api/kits work budget', () => {
  const { app } = useTestApp();

  it('refuses a kit over the work budget up front with 422 and the numbers', async () => {
    const res = await request(app)
      .post('/api/kits')
      .send({
        ...keyKit,
        face: { shape: 'rect', width: 1000, height: 1000 },
        key: { shape: 'round', width: 60, depth: 8, count: 64 },
        chordTolerance: 0.001,
        format: 'ascii',
      });
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('GEOMETRY_IMPOSSIBLE');
    expect(res.body.error.message).toMatch(/could be up to [\d.]+ MB of STL .* a kit may be at most 50\.0 MB/);
  });
});
