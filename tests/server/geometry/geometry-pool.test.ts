import { execFileSync } from 'node:child_process';
import { afterAll, describe, expect, it } from 'vitest';
import { createGeometryPool } from '../../../server/geometry/geometry-pool';
import { inlineGeometry } from '../../../server/geometry/inline-geometry';
import { GeometryError } from '../../../shared/geometry/geometry-error';
import { kitRequestSchema } from '../../../shared/schemas/kit-request';
import { couponRequestSchema } from '../../../shared/schemas/coupon-request';

const request = kitRequestSchema.parse({
  joint: 'key',
  material: 'PLA',
  fit: 'snug',
  face: { shape: 'rect', width: 80, height: 60 },
  key: { shape: 'round', width: 8, depth: 8, count: 6 },
});

describe('createGeometryPool', () => {
  const pool = createGeometryPool({ threads: 2, maxQueue: 4 });
  afterAll(() => pool.close());

  it('builds on worker threads exactly what the calling thread builds, byte for byte', async () => {
    const [threaded, inline] = await Promise.all([pool.kitZip(request), inlineGeometry.kitZip(request)]);
    expect(Buffer.from(threaded.zip).equals(Buffer.from(inline.zip))).toBe(true);
    expect(threaded.hashes).toEqual(inline.hashes);
    expect(threaded.manifest).toEqual(inline.manifest);
    expect(pool.stats().completed).toBeGreaterThanOrEqual(1);
  });

  it.runIf(process.platform === 'linux')('runs its threads at a lower priority than the event loop', async () => {
    await pool.kitSummary(request);
    const nice = execFileSync('ps', ['-L', '-o', 'ni=', '-p', String(process.pid)], { encoding: 'utf8' })
      .split('\n')
      .map((v) => Number(v.trim()));
    expect(nice).toContain(10);
    expect(nice).toContain(0);
  });

  it('hands back a GeometryError with its code and numbers when the geometry is impossible', async () => {
    const tooMany = kitRequestSchema.parse({ ...request, face: { shape: 'rect', width: 20, height: 20 } });
    const error = await pool.kitSummary(tooMany).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(GeometryError);
    expect((error as GeometryError).message).toMatch(/\d/);
  });

  it('refuses a kit over the work budget before any thread builds it', async () => {
    const huge = kitRequestSchema.parse({
      ...request,
      face: { shape: 'rect', width: 1000, height: 1000 },
      key: { shape: 'round', width: 60, depth: 8, count: 64 },
      chordTolerance: 0.001,
      format: 'ascii',
    });
    const before = pool.stats().completed;
    const error = await pool.kitZip(huge).catch((e: unknown) => e);
    expect((error as GeometryError).code).toBe('WORK_LIMIT');
    expect(pool.stats().completed).toBe(before);
  });

  it('answers 503 once more tasks wait than the queue holds, and still finishes those it took', async () => {
    const coupon = couponRequestSchema.parse({
      joint: 'key',
      material: 'PLA',
      key: { shape: 'round', width: 8, depth: 4 },
    });
    const results = await Promise.allSettled(Array.from({ length: 12 }, () => pool.couponZip(coupon)));
    const refused = results.filter((r) => r.status === 'rejected');
    expect(refused.length).toBeGreaterThan(0);
    for (const r of refused) expect((r as PromiseRejectedResult).reason).toMatchObject({ status: 503 });
    expect(results.filter((r) => r.status === 'fulfilled').length).toBeGreaterThanOrEqual(4);
  });
});
