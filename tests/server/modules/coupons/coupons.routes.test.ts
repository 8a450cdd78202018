import { describe, expect, it } from 'vitest';
import request from 'supertest';
import JSZip from 'jszip';
import { useTestApp } from '../../../helpers/test-app';
import { binaryBody } from '../../../helpers/binary-body';

describe('POST /api/coupons', () => {
  const { app } = useTestApp();

  it('answers a zip with the plate, the keys, README.txt and a manifest listing every graded pocket', async () => {
    const res = await request(app)
      .post('/api/coupons')
      .send({
        joint: 'key',
        material: 'PLA',
        key: { shape: 'square', width: 8, depth: 4 },
        clearanceFrom: 0,
        clearanceTo: 0.4,
        clearanceStep: 0.05,
      })
      .buffer(true)
      .parse(binaryBody);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/zip');
    const zip = await JSZip.loadAsync(res.body as Buffer);
    expect(Object.keys(zip.files).sort()).toEqual(['README.txt', 'coupon-plate.stl', 'key.stl', 'manifest.json']);
    const manifest = JSON.parse(await zip.file('manifest.json')!.async('string'));
    expect(manifest.pockets).toHaveLength(9);
    expect(manifest.pockets[4]).toMatchObject({ mark: '5', clearancePerSide: 0.2 });
    expect(manifest.pockets[4].position).toHaveLength(2);
  });

  it('answers 400 with the field and the numbers for a bad range', async () => {
    const res = await request(app)
      .post('/api/coupons')
      .send({
        joint: 'dovetail',
        material: 'PLA',
        dovetail: { rootWidth: 8, height: 5 },
        clearanceFrom: 0.5,
        clearanceTo: 0.2,
      });
    expect(res.status).toBe(400);
    expect(res.body.error.issues[0].path).toBe('clearanceTo');
  });
});
