import { describe, expect, it } from 'vitest';
import express from 'express';
import request from 'supertest';
import { z } from 'zod';
import { errorHandler } from '../../../server/http/error-handler';
import { parseWith } from '../../../server/http/parse';
import { AppError } from '../../../server/errors/app-error';
import { GeometryError } from '../../../shared/geometry/geometry-error';
import { useTestApp } from '../../helpers/test-app';

// A tiny app with routes that fail on purpose, behind the real error middleware.
function failingApp() {
  const app = express();
  app.use(express.json({ limit: '1kb' }));
  app.get('/boom', () => {
    throw new Error('secret internal detail at /srv/db.ts:12');
  });
  app.get('/async-boom', async () => {
    await Promise.resolve();
    throw new AppError('CONFLICT', 'This preset changed since you opened it.');
  });
  app.post('/parse', (req, res) => {
    const body = parseWith(z.object({ size: z.object({ width: z.number().positive() }), name: z.string() }), req.body);
    res.json(body);
  });
  app.get('/geometry', () => {
    throw new GeometryError(
      'FACE_TOO_SMALL',
      'a 10 mm key with 3 mm walls needs a face at least 16.4 mm wide; this one is 12 mm',
    );
  });
  app.use(errorHandler);
  return app;
}

describe('errorHandler', () => {
  const app = failingApp();

  it('answers 500 without leaking the stack or message when a handler throws', async () => {
    const res = await request(app).get('/boom');
    expect(res.status).toBe(500);
    expect(res.body.error.code).toBe('INTERNAL');
    expect(JSON.stringify(res.body)).not.toContain('/srv/db.ts');
    expect(JSON.stringify(res.body)).not.toContain('secret');
  });

  it('passes an AppError from a rejected async handler through with its status', async () => {
    const res = await request(app).get('/async-boom');
    expect(res.status).toBe(409);
    expect(res.body).toEqual({ error: { code: 'CONFLICT', message: 'This preset changed since you opened it.' } });
  });

  it('answers 400 with one issue per path when zod rejects the body', async () => {
    const res = await request(app)
      .post('/parse')
      .send({ size: { width: -2 } });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
    const paths = res.body.error.issues.map((i: { path: string }) => i.path).sort();
    expect(paths).toEqual(['name', 'size.width']);
  });

  it('answers 400 when the body is not JSON', async () => {
    const res = await request(app).post('/parse').set('Content-Type', 'application/json').send('{"size":');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('BAD_REQUEST');
  });

  it('answers 413 when the body is over the limit', async () => {
    const res = await request(app)
      .post('/parse')
      .send({ name: 'x'.repeat(5000) });
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('PAYLOAD_TOO_LARGE');
  });

  it('answers 422 with the numbers when geometry is impossible', async () => {
    const res = await request(app).get('/geometry');
    expect(res.status).toBe(422);
    expect(res.body.error.message).toContain('16.4 mm');
  });
});

describe('unknown API routes', () => {
  const { app } = useTestApp();

  it('answers 404 in the error shape', async () => {
    const res = await request(app).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('NOT_FOUND');
    expect(res.body.error.message).toContain('/api/no-such-thing');
  });

  it('sets security headers and a request id', async () => {
    const res = await request(app).get('/api/health');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
    expect(res.headers['x-request-id']).toMatch(/^[\w-]+$/);
  });
});
