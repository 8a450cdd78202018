// Request bodies for the route fuzzer: a route's valid example with one thing broken (so the input gets
// past the first checks and into deep validation and the services), wholly wrong JSON, raw texts that are
// not JSON, bodies past the size limit, unsupported charsets and content encodings.
import { gzipSync } from 'node:zlib';
import fc from 'fast-check';
import { OVER_LIMIT_BYTES, extremeNumber, junkValue, nastyStringValue, rawJsonText, toJsonText } from './fuzz-values';

/** What one fuzz case sends: a JSON value, raw bytes with their own headers, or a file in a multipart form. */
export type FuzzBody =
  | { kind: 'none' }
  | { kind: 'json'; value: unknown }
  | { kind: 'raw'; contentType: string; data: string | Buffer; encoding?: string }
  | { kind: 'file'; field: string; fileName: string; data: string };

/** A JSON body sent instead as the file of a multipart upload (field "file"), as the preset import takes it. */
export function asUpload(body: FuzzBody): FuzzBody {
  if (body.kind !== 'json') return body;
  return { kind: 'file', field: 'file', fileName: 'presets.json', data: toJsonText(body.value) };
}

const BOUNDARY = 'fuzzboundary';
/** Multipart bodies that are broken: cut short, no boundary, bad part headers, the wrong field, two files. */
const brokenForms = fc.constantFrom<FuzzBody>(
  { kind: 'raw', contentType: `multipart/form-data; boundary=${BOUNDARY}`, data: `--${BOUNDARY}\r\nbroken` },
  { kind: 'raw', contentType: 'multipart/form-data', data: 'no boundary at all' },
  {
    kind: 'raw',
    contentType: `multipart/form-data; boundary=${BOUNDARY}`,
    data: `--${BOUNDARY}\r\nContent-Disposition: form-data; name="file"; filename="a.json"\r\n\r\n{"format":`,
  },
  { kind: 'raw', contentType: `multipart/form-data; boundary=${BOUNDARY}`, data: `--${BOUNDARY}\r\n\u0000\r\n\r\n` },
  { kind: 'file', field: 'other', fileName: 'presets.json', data: '{}' },
  { kind: 'file', field: 'file', fileName: '\u0000.json', data: '{}' },
  { kind: 'file', field: 'file', fileName: 'presets.json', data: '\u0000\ud800 not json' },
  { kind: 'file', field: 'file', fileName: 'huge.json', data: ' '.repeat(1024 * 1024 + 10) },
);

type Path = (string | number)[];

/** Every path into a JSON value (objects and arrays), the value itself first. */
function pathsOf(value: unknown, prefix: Path = []): Path[] {
  const out: Path[] = [prefix];
  if (Array.isArray(value)) value.forEach((v, i) => out.push(...pathsOf(v, [...prefix, i])));
  else if (typeof value === 'object' && value !== null) {
    for (const [k, v] of Object.entries(value)) out.push(...pathsOf(v, [...prefix, k]));
  }
  return out;
}

/** A copy of `value` with the thing at `path` replaced (or removed when `replacement` is `REMOVE`). */
const REMOVE = Symbol('remove');
function withAt(value: unknown, path: Path, replacement: unknown): unknown {
  if (path.length === 0) return replacement === REMOVE ? undefined : replacement;
  const [head, ...rest] = path as [string | number, ...Path];
  const copy = (Array.isArray(value) ? [...value] : { ...(value as object) }) as Record<string | number, unknown>;
  const next = withAt(copy[head], rest, replacement);
  if (next === undefined && rest.length === 0) delete copy[head];
  else copy[head] = next;
  return copy;
}

/** The paths to the strings and numbers inside a JSON value, with which of the two each is. */
function leavesOf(value: unknown, prefix: Path = []): { path: Path; kind: 'string' | 'number' }[] {
  if (typeof value === 'string') return [{ path: prefix, kind: 'string' }];
  if (typeof value === 'number') return [{ path: prefix, kind: 'number' }];
  if (typeof value !== 'object' || value === null) return [];
  return Object.entries(value).flatMap(([k, v]) => leavesOf(v, [...prefix, Array.isArray(value) ? Number(k) : k]));
}

/** Hostile values of the same type first: a string field gets nasty text more often than a number. */
const junkFor = (kind: 'string' | 'number' | 'other') =>
  kind === 'string'
    ? fc.oneof({ weight: 3, arbitrary: nastyStringValue }, { weight: 2, arbitrary: junkValue })
    : kind === 'number'
      ? fc.oneof({ weight: 3, arbitrary: extremeNumber }, { weight: 2, arbitrary: junkValue })
      : junkValue;

/** The example with one field replaced by a hostile value, removed, or joined by an unexpected one. */
function mutated(example: unknown): fc.Arbitrary<unknown> {
  // The body itself is left out: replacing all of it is what the wholly-junk bodies do.
  const paths = pathsOf(example).filter((p) => p.length > 0);
  if (paths.length === 0) return junkValue;
  const leaves = leavesOf(example);
  const at = fc.constantFrom(...paths);
  const atLeaf =
    leaves.length > 0 ? fc.constantFrom(...leaves) : fc.constant({ path: [] as Path, kind: 'other' as const });
  const replaceLeaf = atLeaf.chain(({ path, kind }) => junkFor(kind).map((v) => withAt(example, path, v)));
  return fc.oneof(
    { weight: 6, arbitrary: replaceLeaf },
    { weight: 2, arbitrary: fc.tuple(at, junkValue).map(([p, v]) => withAt(example, p, v)) },
    { weight: 1, arbitrary: at.map((p) => withAt(example, p, REMOVE) ?? {}) },
    {
      weight: 1,
      arbitrary: fc
        .tuple(at, fc.constantFrom('__proto__', 'constructor', 'extra', ''), junkValue)
        .map(([p, k, v]) => withAt(example, [...p, k], v)),
    },
    // Two fields broken at once.
    { weight: 2, arbitrary: fc.tuple(replaceLeaf, at, junkValue).map(([m, p, v]) => withAt(m, p, v)) },
  );
}

/**
 * The cases every route meets whatever the seed: each string of its example with a NUL or a lone
 * surrogate in it, each number of it past the 32-bit and safe-integer ranges, at 1e308 and at -0.
 *
 * @param example - a valid body of the route, or undefined when it takes none
 */
export function knownBodies(example: unknown): FuzzBody[] {
  if (example === undefined) return [];
  return leavesOf(example).flatMap(({ path, kind }) =>
    (kind === 'string' ? ['\u0000', 'a\u0000b', 'a\ud800b'] : [2 ** 31, 2 ** 53 + 2, 1e308, -0]).map((v): FuzzBody => ({
      kind: 'json',
      value: withAt(example, path, v),
    })),
  );
}

const oversized = (): FuzzBody => ({
  kind: 'raw',
  contentType: 'application/json',
  data: JSON.stringify({ name: 'x'.repeat(OVER_LIMIT_BYTES) }),
});

/** Bodies whose headers lie or ask for something the server does not read. */
const oddEnvelopes = (example: unknown): fc.Arbitrary<FuzzBody> => {
  const text = JSON.stringify(example ?? {});
  return fc.constantFrom<FuzzBody>(
    { kind: 'raw', contentType: 'application/json; charset=latin1', data: text },
    { kind: 'raw', contentType: 'application/json; charset=utf-16', data: text },
    { kind: 'raw', contentType: 'application/json; charset=nonsense', data: text },
    { kind: 'raw', contentType: 'application/json', data: text, encoding: 'br' },
    { kind: 'raw', contentType: 'application/json', data: text, encoding: 'x-unknown' },
    { kind: 'raw', contentType: 'application/json', data: text, encoding: 'gzip' }, // not gzip at all
    { kind: 'raw', contentType: 'application/json', data: gzipSync(text), encoding: 'gzip' },
    // A gzip bomb: small on the wire, past the limit once inflated.
    {
      kind: 'raw',
      contentType: 'application/json',
      data: gzipSync(' '.repeat(2 * OVER_LIMIT_BYTES)),
      encoding: 'gzip',
    },
    { kind: 'raw', contentType: 'text/plain', data: text },
    { kind: 'raw', contentType: 'application/x-www-form-urlencoded', data: 'name=a&name=b&settings[joint]=key' },
    { kind: 'raw', contentType: 'multipart/form-data; boundary=zzz', data: '--zzz\r\nbroken' },
    { kind: 'raw', contentType: 'application/vnd.api+json', data: text },
  );
};

/**
 * The bodies fuzzed at one route: mostly its valid example mutated, the example itself, hostile values in
 * place of the whole body, raw non-JSON texts, a body over the limit and odd envelopes.
 *
 * @param example - a valid body of the route, or undefined when it takes none
 */
export function bodyFor(example: unknown, upload = false): fc.Arbitrary<FuzzBody> {
  const json = (value: unknown): FuzzBody => ({ kind: 'json', value });
  const base = example ?? {};
  if (upload)
    return fc.oneof({ weight: 4, arbitrary: bodyFor(example).map(asUpload) }, { weight: 1, arbitrary: brokenForms });
  return fc.oneof(
    // A route that reads no body is fuzzed mostly through its path, query and cookie.
    { weight: example === undefined ? 0 : 10, arbitrary: mutated(base).map(json) },
    { weight: example === undefined ? 8 : 1, arbitrary: fc.constant(json(base)) },
    { weight: 2, arbitrary: junkValue.map(json) },
    {
      weight: 2,
      arbitrary: rawJsonText.map((data): FuzzBody => ({ kind: 'raw', contentType: 'application/json', data })),
    },
    { weight: 1, arbitrary: fc.constant(oversized()) },
    { weight: 2, arbitrary: oddEnvelopes(base) },
    { weight: 1, arbitrary: fc.constant<FuzzBody>({ kind: 'none' }) },
  );
}
