// `kill -9` of the server in the middle of a stream of saves: no signal handler runs, no pool is closed, the
// transactions in progress die with their connections. The database must hold whole writes only: every
// preset with all its versions and its current fields equal to the last one, every recorded kit with its zip,
// hashes and summary, and every write that was answered with success still there.
import { createHash, randomInt, randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import pg from 'pg';
import JSZip from 'jszip';
import {
  call,
  killLeftoverServers,
  signUpOn,
  startServerProcess,
  type ServerProcess,
} from '../../helpers/server-process';

const ROUNDS = 3;
// Writers running at once: enough to keep several transactions open at the moment of the kill.
const WRITERS = 6;

const presetSettings = (width: number) => ({
  joint: 'key',
  material: 'PLA',
  fit: 'snug',
  key: { shape: 'square', width, depth: 8, count: 6 },
});
const kitRequest = (count: number) => ({
  joint: 'key',
  material: 'PLA',
  fit: 'snug',
  face: { shape: 'rect', width: 60, height: 40 },
  key: { shape: 'square', width: 6, depth: 5, count },
});

/** What one round of writes came to: answered with success, refused (409), cut by the kill, refused after it. */
interface Tally {
  landed: number;
  conflicts: number;
  cut: number;
  refused: number;
}

/** The code under a failed fetch (ECONNREFUSED, ECONNRESET, UND_ERR_SOCKET…). */
function causeOf(error: unknown): string {
  const cause = (error as { cause?: { code?: string; message?: string } }).cause;
  return cause?.code ?? cause?.message ?? String(error);
}

/**
 * Runs `WRITERS` loops of `write` until the server dies, and kills it with SIGKILL a random 20–200 ms after the
 * first write of the round was answered (so the kill always falls in the middle of the stream).
 *
 * @param write - one write by writer `w`, its `n`th; resolves 'landed' or 'conflict', rejects on a network error
 */
async function writeUntilKilled(
  server: ServerProcess,
  write: (w: number, n: number) => Promise<'landed' | 'conflict'>,
): Promise<Tally & { killAfterMs: number }> {
  const tally: Tally = { landed: 0, conflicts: 0, cut: 0, refused: 0 };
  const killAfterMs = randomInt(20, 201);
  let firstLanded: () => void = () => {};
  const first = new Promise<void>((resolve) => (firstLanded = resolve));
  const writers = Array.from({ length: WRITERS }, async (_, w) => {
    for (let n = 0; ; n++) {
      try {
        const outcome = await write(w, n);
        if (outcome === 'landed') {
          tally.landed++;
          firstLanded();
        } else tally.conflicts++;
      } catch (error) {
        // fetch fails with a TypeError when the connection goes; anything else (a failed expect) is a real failure.
        if (!(error instanceof TypeError)) throw error;
        if (causeOf(error) === 'ECONNREFUSED') tally.refused++;
        else tally.cut++;
        return;
      }
    }
  });
  await first;
  await new Promise((r) => setTimeout(r, killAfterMs));
  server.child.kill('SIGKILL');
  expect(await server.exited).toEqual({ code: null, signal: 'SIGKILL' });
  await Promise.all(writers);
  return { ...tally, killAfterMs };
}

/** Runs `read` in one repeatable-read snapshot, so writes committing meanwhile cannot make it look torn. */
async function inSnapshot<T>(db: pg.Client, read: () => Promise<T>): Promise<T> {
  await db.query('begin isolation level repeatable read read only');
  try {
    return await read();
  } finally {
    await db.query('commit');
  }
}

describe('the server killed with SIGKILL while writing', () => {
  let db: pg.Client;

  beforeAll(async () => {
    db = new pg.Client({ connectionString: process.env.DATABASE_URL });
    await db.connect();
  });
  afterAll(async () => {
    await killLeftoverServers();
    await db?.end().catch(() => {});
  });

  /** Starts a server and signs up (first round) or reuses the account: the session lives in the database. */
  async function serverWithAccount(account?: { cookie: string; teamId: string }) {
    const server = await startServerProcess();
    if (account) return { server, account };
    const { cookie } = await signUpOn(server, 'kill-9');
    const me = await call(server, 'GET', '/api/me', { cookie });
    const { teams } = (await me.json()) as { teams: { id: string; role: string }[] };
    expect(teams).toHaveLength(1);
    return { server, account: { cookie, teamId: teams[0]!.id } };
  }

  it('leaves every preset with versions 1…current and its fields equal to the last version', async () => {
    let account: { cookie: string; teamId: string } | undefined;
    // Every save answered with success: the preset and version it made and the description it wrote.
    const acknowledged: { id: string; version: number; description: string }[] = [];
    const rounds: string[] = [];

    for (let round = 1; round <= ROUNDS; round++) {
      const started = await serverWithAccount(account);
      const { server } = started;
      account = started.account;
      const { cookie, teamId } = account;
      const presets = `/api/teams/${teamId}/presets`;

      // Two presets to edit, each by two writers racing on the same versions (one save wins, the other is 409).
      const chains: { id: string; version: number }[] = [];
      for (let i = 0; i < WRITERS / 3; i++) {
        const res = await call(server, 'POST', presets, {
          cookie,
          body: { name: `r${round} edited ${i} ${randomUUID().slice(0, 6)}`, settings: presetSettings(10) },
        });
        expect(res.status).toBe(201);
        const created = (await res.json()) as { id: string; version: number; description: string };
        acknowledged.push(created);
        chains.push({ id: created.id, version: created.version });
      }

      const tally = await writeUntilKilled(server, async (w, n) => {
        const description = `round ${round} writer ${w} save ${n}`;
        if (w >= (WRITERS * 2) / 3) {
          // The last third create new presets.
          const res = await call(server, 'POST', presets, {
            cookie,
            body: {
              name: `r${round} w${w} n${n} ${randomUUID().slice(0, 6)}`,
              description,
              settings: presetSettings(8),
            },
          });
          expect(res.status, await res.clone().text()).toBe(201);
          const body = (await res.json()) as { id: string; version: number };
          acknowledged.push({ id: body.id, version: body.version, description });
          return 'landed';
        }
        const chain = chains[w % chains.length]!;
        const res = await call(server, 'PATCH', `${presets}/${chain.id}`, {
          cookie,
          body: { baseVersion: chain.version, description, settings: presetSettings(6 + ((n * 7 + w) % 40) / 10) },
        });
        if (res.status === 409) {
          const { error } = (await res.json()) as { error: { current: { version: number } } };
          chain.version = Math.max(chain.version, error.current.version);
          return 'conflict';
        }
        expect(res.status, await res.clone().text()).toBe(200);
        const body = (await res.json()) as { id: string; version: number };
        chain.version = Math.max(chain.version, body.version);
        acknowledged.push({ id: body.id, version: body.version, description });
        return 'landed';
      });
      rounds.push(
        `round ${round}: killed ${tally.killAfterMs} ms after the first save; ${tally.landed} saves answered, ` +
          `${tally.conflicts} refused as stale, ${tally.cut} cut by the kill, ${tally.refused} refused after it`,
      );
      // The kill came while writes were going on: some were cut off or found the server gone.
      expect(tally.landed).toBeGreaterThan(0);
      expect(tally.cut + tally.refused).toBe(WRITERS);

      const { presetRows, versionRows } = await inSnapshot(db, async () => ({
        presetRows: (
          await db.query(
            `select id, version, name, description, tags, printer_profile_id, schema_version, settings
               from presets where team_id = $1`,
            [teamId],
          )
        ).rows,
        versionRows: (
          await db.query(
            `select v.preset_id, v.version, v.name, v.description, v.tags, v.printer_profile_id, v.schema_version,
                    v.settings
               from preset_versions v join presets p on p.id = v.preset_id
              where p.team_id = $1 order by v.preset_id, v.version`,
            [teamId],
          )
        ).rows,
      }));

      for (const preset of presetRows) {
        const versions = versionRows.filter((v) => v.preset_id === preset.id);
        expect(
          versions.map((v) => v.version),
          `versions of preset ${preset.id}`,
        ).toEqual(Array.from({ length: preset.version }, (_, i) => i + 1));
        const last = versions.at(-1)!;
        const fields = ({
          name,
          description,
          tags,
          printer_profile_id,
          schema_version,
          settings,
        }: pg.QueryResultRow) => ({
          name,
          description,
          tags,
          printer_profile_id,
          schema_version,
          settings,
        });
        expect(fields(preset), `preset ${preset.id} against its version ${preset.version}`).toEqual(fields(last));
      }
      for (const save of acknowledged) {
        const version = versionRows.find((v) => v.preset_id === save.id && v.version === save.version);
        expect(version?.description, `answered save ${save.id} v${save.version}`).toBe(save.description);
      }
      rounds[rounds.length - 1] += `; ${presetRows.length} presets, ${versionRows.length} versions in the team`;
    }
    console.info(`presets under kill -9:\n${rounds.join('\n')}`);
  }, 90_000);

  it('leaves every recorded kit with its whole zip, the hashes of its STLs and its summary', async () => {
    let account: { cookie: string; teamId: string } | undefined;
    // Every kit answered with success: its history id and the SHA-256 of the zip that was sent.
    const acknowledged = new Map<string, string>();
    const rounds: string[] = [];

    for (let round = 1; round <= ROUNDS; round++) {
      const started = await serverWithAccount(account);
      const { server } = started;
      account = started.account;
      const { cookie, teamId } = account;

      const tally = await writeUntilKilled(server, async (w, n) => {
        const res = await call(server, 'POST', `/api/teams/${teamId}/kits`, {
          cookie,
          body: { request: kitRequest(1 + ((w + n) % 4)) },
        });
        expect(res.status).toBe(201);
        const zip = Buffer.from(await res.arrayBuffer());
        acknowledged.set(res.headers.get('x-seamwright-kit-id')!, createHash('sha256').update(zip).digest('hex'));
        return 'landed';
      });
      rounds.push(
        `round ${round}: killed ${tally.killAfterMs} ms after the first kit; ${tally.landed} kits answered, ` +
          `${tally.cut} cut by the kill, ${tally.refused} refused after it`,
      );
      expect(tally.landed).toBeGreaterThan(0);
      expect(tally.cut + tally.refused).toBe(WRITERS);

      const { rows } = await db.query(
        `select id, zip, files, summary, request, file_name, engine_version from kit_downloads where team_id = $1`,
        [teamId],
      );
      for (const row of rows as {
        id: string;
        zip: Buffer;
        files: { name: string; bytes: number; sha256: string }[];
        summary: { parts: { file: string }[]; clearancePerSide: number };
        request: { joint?: string };
        file_name: string;
        engine_version: string;
      }[]) {
        expect(row.zip.length, `zip of kit ${row.id}`).toBeGreaterThan(0);
        expect(row.files.length, `hashes of kit ${row.id}`).toBeGreaterThan(0);
        expect(row.summary.parts.length, `summary of kit ${row.id}`).toBeGreaterThan(0);
        expect(row.summary.clearancePerSide).toEqual(expect.any(Number));
        expect(row.request.joint).toBe('key');
        expect(row.file_name).toMatch(/\.zip$/);
        expect(row.engine_version).not.toBe('');
        // The zip is whole and is the one the hashes were taken of.
        const zip = await JSZip.loadAsync(row.zip);
        for (const file of row.files) {
          expect(file.sha256).toMatch(/^[0-9a-f]{64}$/);
          const stl = await zip.file(file.name)?.async('uint8array');
          expect(stl?.length, `${file.name} in kit ${row.id}`).toBe(file.bytes);
          expect(createHash('sha256').update(stl!).digest('hex')).toBe(file.sha256);
        }
      }
      const stored = new Map(
        rows.map((r: { id: string; zip: Buffer }) => [r.id, createHash('sha256').update(r.zip).digest('hex')]),
      );
      for (const [id, sha256] of acknowledged) expect(stored.get(id), `answered kit ${id}`).toBe(sha256);
      rounds[rounds.length - 1] += `; ${rows.length} kits in the team's history`;
    }
    console.info(`kit records under kill -9:\n${rounds.join('\n')}`);
  }, 90_000);
});
