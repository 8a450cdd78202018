// Every route of the real app, found by walking its routers (a new route is fuzzed without touching this
// file), gets hostile bodies, query strings, path parameters and cookies. No answer may be a 5xx, and every
// 4xx must be {"error":{"code","message","issues"?}} with a message. The seed is fixed
// (tests/helpers/fast-check-seed.ts); FC_SEED=random explores, FUZZ_RUNS=<n> digs deeper.
import { createServer, type Server } from 'node:http';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { SESSION_COOKIE } from '../../../server/auth/sessions';
import { useAuthApp } from '../../helpers/auth-app';
import { listApiRoutes } from '../../helpers/list-routes';
import { asUpload, bodyFor, knownBodies, type FuzzBody } from './fuzz-bodies';
import { buildFuzzWorld, type FuzzWorld } from './fuzz-fixture';
import { sendCase } from './fuzz-request';
import { junkCookie, junkCookies, junkQuery, junkSegment, junkSegments, knownQueries } from './fuzz-values';

// Random cases per route, on top of the known ones: about a minute for the whole file on two cores.
const RUNS = Number(process.env.FUZZ_RUNS ?? 30);

// Routes that end or replace the session they are sent with run on a spare account's fresh session.
const SESSION_ROUTES = /\/auth\/(sign-in|sign-out|sign-out-everywhere|password-reset\/confirm)$|\/account\/password$/;

// Deleting runs last (the team itself at the very end), so the other routes meet the real ids alive.
const rank = (route: string) => (route === 'DELETE /api/teams/:teamId' ? 2 : route.startsWith('DELETE ') ? 1 : 0);

type Cookie = string | 'fresh-spare' | null;
interface Case {
  path: string;
  query: string;
  body: FuzzBody;
  cookie: Cookie;
}

/** The path with every parameter a real id, except `junk` (parameter name → segment) where given. */
function filled(template: string, world: FuzzWorld, junk: Record<string, string> = {}): string {
  return template.replace(/:(\w+)/g, (_, name: string) => junk[name] ?? world.ids[name] ?? 'no-such-id');
}

/** A path with each `:param` filled by a real id (mostly) or by junk. */
function pathFor(template: string, world: FuzzWorld): fc.Arbitrary<string> {
  const parts = template.split('/').map((part): fc.Arbitrary<string> => {
    if (!part.startsWith(':')) return fc.constant(part);
    const real = world.ids[part.slice(1)];
    if (!real) return junkSegment;
    return fc.oneof(
      { weight: 8, arbitrary: fc.constant(real) },
      { weight: 1, arbitrary: fc.constant(real.toUpperCase()) },
      { weight: 3, arbitrary: junkSegment },
    );
  });
  return fc.tuple(...parts).map((p) => p.join('/'));
}

/** The cookie a case is sent with: mostly a live session, sometimes none or a broken one. */
function cookieFor(route: string, world: FuzzWorld): fc.Arbitrary<Cookie> {
  return fc.oneof(
    { weight: 16, arbitrary: fc.constant(liveCookie(route, world)) },
    { weight: 1, arbitrary: fc.constant(null) },
    { weight: 3, arbitrary: junkCookie },
  );
}

const liveCookie = (route: string, world: FuzzWorld): Cookie =>
  SESSION_ROUTES.test(route) ? 'fresh-spare' : world.cookie;

/**
 * The cases every route meets whatever the seed: each string and number of its example broken (NUL, lone
 * surrogate, past 2^31…), each query key alone with such a value (GET), each path parameter given each
 * junk segment, and each broken session cookie.
 */
function knownCases(route: string, world: FuzzWorld): Case[] {
  const [method, template] = route.split(' ') as [string, string];
  const example = world.examples[route];
  const base = { path: filled(template, world), query: '', cookie: liveCookie(route, world) };
  const upload = (b: FuzzBody) => (world.uploads.has(route) ? asUpload(b) : b);
  const body = upload(example === undefined ? { kind: 'none' } : { kind: 'json', value: example });
  const params = [...template.matchAll(/:(\w+)/g)].map((m) => m[1] as string);
  return [
    ...knownBodies(example).map((b) => ({ ...base, body: upload(b) })),
    ...(method === 'GET' ? knownQueries.map((query) => ({ ...base, query, body })) : []),
    ...params.flatMap((p) => junkSegments.map((s) => ({ ...base, path: filled(template, world, { [p]: s }), body }))),
    ...junkCookies.map((cookie) => ({ ...base, cookie, body })),
  ];
}

/** A seed of its own per route (from the fixed one), so routes of the same shape do not all get the same cases. */
function seedFor(route: string): number {
  let hash = fc.readConfigureGlobal().seed ?? 0;
  for (const ch of route) hash = (Math.imul(hash, 31) + ch.charCodeAt(0)) | 0;
  return hash;
}

describe('API routes under fuzzing', () => {
  const { app, db, sessions, mail } = useAuthApp();
  const routes = listApiRoutes(app).sort((a, b) => rank(a) - rank(b));
  let world: FuzzWorld;
  let server: Server;

  beforeAll(async () => {
    server = createServer(app).listen(0, '127.0.0.1');
    world = await buildFuzzWorld(app, db, sessions, mail);
  });
  afterAll(() => new Promise<void>((resolve) => server.close(() => resolve())));

  it('finds the routes to fuzz when walking the app', () => {
    expect(routes.length).toBeGreaterThan(40);
    expect(routes).toContain('POST /api/teams/:teamId/presets');
  });

  for (const route of routes) {
    it(`answers below 500 and every 4xx in the error shape at ${route}`, { timeout: 180_000 }, async () => {
      const [method, template] = route.split(' ') as [string, string];
      const failures: string[] = [];
      const cases = fc.record({
        path: pathFor(template, world),
        query: junkQuery,
        body: bodyFor(world.examples[route], world.uploads.has(route)),
        cookie: cookieFor(route, world),
      });
      const send = async ({ path, query, body, cookie }: Case) => {
        const sessionCookie =
          cookie === 'fresh-spare' ? `${SESSION_COOKIE}=${(await sessions.start(world.spare.id)).id}` : cookie;
        // Failures are collected rather than thrown: one run lists every cause, and fast-check would print
        // (and choke on) 5000-level values.
        const failure = await sendCase(server, { method, url: path + query, body, cookie: sessionCookie }).catch(
          (e: Error) => `the test itself failed: ${e.stack?.slice(0, 600)}`,
        );
        if (failure) failures.push(failure);
      };
      const known = knownCases(route, world);
      // numRuns counts the known cases too: RUNS random ones follow them.
      await fc.assert(fc.asyncProperty(cases, send), {
        numRuns: RUNS + known.length,
        seed: seedFor(route),
        examples: known.map((c): [Case] => [c]),
      });
      expect(failures).toEqual([]);
    });
  }
});
