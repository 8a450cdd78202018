// Failures from below the services (PostgreSQL, body-parser, the router, multer) reach the error middleware
// as they are; each must leave as a 4xx or 503 in the error shape, never as a 500.
import { describe, expect, it } from 'vitest';
import express from 'express';
import multer from 'multer';
import request from 'supertest';
import { errorHandler } from '../../../server/http/error-handler';
import { fromPostgres, isDatabaseUnavailable } from '../../../server/errors/from-postgres';

/** A driver error as node-postgres builds it: a message and the SQLSTATE in `code`. */
const pgError = (code: string, message = 'pg says no') => Object.assign(new Error(message), { code });
/** Drizzle's wrapper around the driver's error. */
const drizzleWrapped = (cause: unknown) => Object.assign(new Error('Failed query: select 1\nparams: '), { cause });

function throwing(err: unknown) {
  const app = express();
  app.get('/fail', () => {
    throw err;
  });
  app.use(errorHandler);
  return app;
}

describe('fromPostgres', () => {
  it.each([
    ['a NUL character in text (22021)', '22021'],
    ['an integer out of range (22003)', '22003'],
    ['malformed input for a type (22P02)', '22P02'],
    ['an unsupported Unicode escape in jsonb (22P05)', '22P05'],
  ])('answers 400 for %s', (_, code) => {
    expect(fromPostgres(drizzleWrapped(pgError(code)))?.status).toBe(400);
  });

  it.each([
    ['a refused connection', Object.assign(new Error('connect ECONNREFUSED 127.0.0.1:5544'), { code: 'ECONNREFUSED' })],
    ['a reset connection', Object.assign(new Error('read ECONNRESET'), { code: 'ECONNRESET' })],
    ['every address refused', new AggregateError([Object.assign(new Error('x'), { code: 'ECONNREFUSED' })])],
    ['a connection lost mid-query', new Error('Connection terminated unexpectedly')],
    ['the pool giving up', new Error('timeout exceeded when trying to connect')],
    ['an administrator shutdown (57P01)', pgError('57P01', 'terminating connection due to administrator command')],
    ['a server still starting (57P03)', pgError('57P03', 'the database system is starting up')],
    ['a connection exception (08006)', pgError('08006')],
  ])('answers 503 for %s', (_, err) => {
    expect(isDatabaseUnavailable(drizzleWrapped(err))).toBe(true);
    expect(fromPostgres(drizzleWrapped(err))?.code).toBe('SERVICE_UNAVAILABLE');
  });

  it('leaves other failures to be a 500 when the error is a bug', () => {
    expect(fromPostgres(drizzleWrapped(pgError('42P01', 'relation "nope" does not exist')))).toBeNull();
    expect(fromPostgres(new TypeError('x is undefined'))).toBeNull();
  });
});

describe('errorHandler', () => {
  it('answers 503 with Retry-After when the database is out of reach', async () => {
    const res = await request(throwing(drizzleWrapped(pgError('57P01')))).get('/fail');
    expect(res.status).toBe(503);
    expect(res.headers['retry-after']).toBe('5');
    expect(res.body.error).toEqual({
      code: 'SERVICE_UNAVAILABLE',
      message: 'The database is not answering right now; nothing was saved. Please try again in a moment.',
    });
  });

  it('answers 400 when PostgreSQL refuses a value of the request', async () => {
    const res = await request(throwing(drizzleWrapped(pgError('22021')))).get('/fail');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('BAD_REQUEST');
  });

  it('answers 400 for a malformed %-escape in a path parameter', async () => {
    const app = express();
    app.get('/teams/:teamId', (_req, res) => res.end());
    app.use(errorHandler);
    const res = await request(app).get('/teams/%E0%A4%A');
    expect(res.status).toBe(400);
    expect(res.body.error.message).toContain('%-escape');
  });

  it.each([
    ['an unsupported charset', 'application/json; charset=latin1', undefined, 415],
    ['an unsupported content encoding', 'application/json', 'x-unknown', 415],
    ['a gzip body that does not inflate', 'application/json', 'gzip', 400],
  ])('answers %s in the error shape', async (_, type, encoding, status) => {
    const app = express();
    app.use(express.json());
    app.post('/body', (_req, res) => res.end());
    app.use(errorHandler);
    let test = request(app).post('/body').set('Content-Type', type);
    if (encoding) test = test.set('Content-Encoding', encoding);
    const res = await test.send('{"a":1}');
    expect(res.status).toBe(status);
    expect(res.body.error.message).not.toBe('');
  });

  it('answers 400 for a multipart body that is cut short or has no boundary', async () => {
    const app = express();
    app.post('/upload', multer({ storage: multer.memoryStorage() }).single('file'), (_req, res) => res.end());
    app.use(errorHandler);
    const cut = await request(app)
      .post('/upload')
      .set('Content-Type', 'multipart/form-data; boundary=zzz')
      .send('--zzz\r\nContent-Disposition: form-data; name="file"; filename="a.json"\r\n\r\n{"a":');
    expect(cut.status).toBe(400);
    const noBoundary = await request(app).post('/upload').set('Content-Type', 'multipart/form-data').send('x');
    expect(noBoundary.status).toBe(400);
  });
});
