// Hostile values for the route fuzzer: what a broken client, a script or an attacker may send in a JSON
// field, a raw body, a query string, a path segment or a cookie.
import fc from 'fast-check';

/** Nested arrays `levels` deep: [[[…]]]. */
export function deeplyNested(levels: number): unknown {
  let value: unknown = [];
  for (let i = 0; i < levels; i++) value = [value];
  return value;
}

/**
 * Stands for 5000 nested arrays inside a fuzzed value: JSON.stringify (and fast-check's printer) would
 * overflow the stack on the real thing, so `toJsonText` splices the text in after stringifying.
 */
export const DEEP_MARKER = '@@5000-levels-deep@@';
const DEEP_TEXT = `${'['.repeat(5_000)}${']'.repeat(5_000)}`;

/** The JSON text of a fuzzed value, with every DEEP_MARKER replaced by 5000 nested arrays. */
export function toJsonText(value: unknown): string {
  return JSON.stringify(value).replaceAll(`"${DEEP_MARKER}"`, DEEP_TEXT);
}

const specialNumbers = [
  0,
  -0,
  1,
  -1,
  0.5,
  1e308,
  -1e308,
  5e-324,
  2 ** 31 - 1,
  2 ** 31,
  2 ** 32,
  2 ** 53,
  2 ** 53 + 2,
  2 ** 63,
  -(2 ** 63),
  99_999_999_999,
  Number.MAX_VALUE,
];

const specialStrings = [
  '',
  ' ',
  '\u0000',
  'name\u0000with NUL',
  '\u0007\u0008\u001b[31mred',
  'tab\tand\nnew line\r',
  '\ud800',
  'lone \udfff low',
  '\uffff\ufffe',
  '\u202eright to left',
  '\u200b',
  'NaN',
  'Infinity',
  '-Infinity',
  '1e308',
  '99999999999',
  '9223372036854775808',
  '__proto__',
  "'; drop table users; --",
  '%00',
  '%E0%A4%A',
  '../../etc/passwd',
  'x'.repeat(5_000),
  '\u00ff'.repeat(3_000),
];

/** Control characters, lone surrogates and ordinary text mixed. */
const nastyText = fc.string({
  unit: fc.oneof(
    fc.integer({ min: 0, max: 0x1f }).map((c) => String.fromCharCode(c)),
    fc.integer({ min: 0xd800, max: 0xdfff }).map((c) => String.fromCharCode(c)),
    fc.constantFrom('a', 'Z', '7', ' ', '-', 'é', '😀', '\u007f', '\u0085', '\u2028'),
  ),
  maxLength: 40,
});

/** A number past what a field or a column holds: out of 32-bit or safe-integer range, huge, tiny, -0. */
export const extremeNumber: fc.Arbitrary<unknown> = fc.oneof(
  fc.constantFrom<unknown>(...specialNumbers),
  fc.integer({ min: 2 ** 31, max: Number.MAX_SAFE_INTEGER }),
  fc.double({ noNaN: true }),
);

/** Text a string field may be sent: NUL and other control characters, lone surrogates, huge text. */
export const nastyStringValue: fc.Arbitrary<unknown> = fc.oneof(fc.constantFrom<unknown>(...specialStrings), nastyText);

/** One hostile JSON value: wrong types, extreme numbers, nasty strings, huge or deep structures. */
export const junkValue: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 4, arbitrary: fc.constantFrom<unknown>(...specialNumbers) },
  { weight: 4, arbitrary: fc.constantFrom<unknown>(...specialStrings) },
  { weight: 3, arbitrary: nastyText },
  { weight: 2, arbitrary: fc.constantFrom<unknown>(null, true, false, [], {}, [null], { '': null }) },
  { weight: 2, arbitrary: fc.integer() },
  { weight: 2, arbitrary: fc.double() }, // NaN and ±Infinity arrive as null once sent as JSON
  { weight: 1, arbitrary: fc.bigInt({ min: -(2n ** 70n), max: 2n ** 70n }).map(String) },
  { weight: 1, arbitrary: fc.jsonValue({ maxDepth: 3 }) },
  { weight: 1, arbitrary: fc.constantFrom<unknown>(DEEP_MARKER, { a: DEEP_MARKER }, deeplyNested(200)) },
  // A large list that still fits the 256 kB body limit.
  { weight: 1, arbitrary: fc.constantFrom<unknown>(new Array(20_000).fill(1), new Array(3_000).fill('abcdefgh')) },
);

/**
 * Raw JSON-ish texts sent as application/json: invalid JSON (NaN, Infinity, truncated), numbers JSON.parse
 * turns into Infinity or 0, deep nesting, a byte-order mark, prototype keys.
 */
export const rawJsonText = fc.constantFrom(
  '{"a":NaN}',
  '{"width":Infinity}',
  '{"a":-Infinity}',
  '{"a":1',
  '',
  'null',
  '"text"',
  '12',
  '\u0000',
  '"\\u0000"',
  '{"name":"\\u0000"}',
  '{"name":"\\ud800"}',
  '{"a":1e400}',
  '{"a":-1e400,"b":1e-400}',
  '\ufeff{}',
  '{"__proto__":{"polluted":true}}',
  '{"constructor":{"prototype":{"polluted":true}}}',
  '{"a":1,"a":2}',
  DEEP_TEXT,
  `${'{"a":'.repeat(5_000)}1${'}'.repeat(5_000)}`,
  '['.repeat(100_000),
);

/** The JSON body limit of the app (256 kB): a body past it must answer 413. */
export const OVER_LIMIT_BYTES = 300 * 1024;

/** Percent-encodes text; a lone surrogate (which encodeURIComponent refuses) goes as its raw UTF-16 escape. */
function encodeLoosely(text: string): string {
  return [...text]
    .map((ch) => {
      try {
        return encodeURIComponent(ch);
      } catch {
        return `%u${ch.charCodeAt(0).toString(16)}`;
      }
    })
    .join('');
}

const queryValues = [
  '1',
  '0',
  '-1',
  '-0',
  '1e308',
  'NaN',
  'Infinity',
  '99999999999',
  '9223372036854775808',
  '2147483648',
  '1.5',
  '%00',
  'a%00b',
  '%E0%A4%A',
  '%FF',
  '%',
  '%ud800',
  'x'.repeat(2_000),
  'asc',
  'desc',
  'name',
  '__proto__',
];

/** A query value: numbers out of range, NUL and malformed escapes (sent unencoded), long text. */
const queryValue = fc.oneof(fc.constantFrom(...queryValues), nastyText.map(encodeLoosely));

// What the list routes read (search, filters, paging, the audit cursor, the download variant), and junk.
const queryKeys = [
  'q',
  'page',
  'pageSize',
  'sort',
  'order',
  'before',
  'limit',
  'variant',
  'tag',
  'joint',
  'material',
  'printer',
  'author',
  'preset',
  'archived',
  'process',
  'base',
];
const oddKeys = ['page[]', 'q[a]', '__proto__', 'q[]'];

/** A query string ("" or "?k=v&…"), values not re-encoded so malformed escapes reach the parser. */
export const junkQuery: fc.Arbitrary<string> = fc.oneof(
  { weight: 1, arbitrary: fc.constant('') },
  // One hostile value among sane ones gets past the other checks to the one it breaks.
  {
    weight: 4,
    arbitrary: fc.tuple(fc.constantFrom(...queryKeys), queryValue).map(([k, v]) => `?${k}=${v}`),
  },
  {
    weight: 2,
    arbitrary: fc
      .array(fc.tuple(fc.constantFrom(...queryKeys, ...oddKeys), queryValue), { minLength: 2, maxLength: 5 })
      .map((pairs) => `?${pairs.map(([k, v]) => `${k}=${v}`).join('&')}`),
  },
);

/** Query strings every route meets: each key alone with NUL, a lone surrogate, or numbers past 2^31 and 2^63. */
export const knownQueries: string[] = queryKeys.flatMap((k) =>
  ['%00', 'a%00b', '%ud800', '%ED%A0%80', '2147483648', '9223372036854775808', '1e308'].map((v) => `?${k}=${v}`),
);

/** Path segments that name nothing: huge numbers, NUL, long text, malformed escapes, a foreign uuid. */
export const junkSegments = [
  '99999999999',
  '2147483648',
  '9223372036854775808',
  '-1',
  '0',
  '1e308',
  'NaN',
  '%00',
  'a%00b',
  '%E0%A4%A',
  '%FF%FE',
  '%',
  'x'.repeat(3_000),
  'not-a-uuid',
  '00000000-0000-0000-0000-000000000000',
  'ffffffff-ffff-ffff-ffff-ffffffffffff',
  '%2e%2e',
  '%20',
  '%C3%A9',
];
export const junkSegment = fc.constantFrom(...junkSegments);

/** Session cookies that are not a session: malformed escapes, NUL once decoded, far too long, unknown. */
export const junkCookies = [
  'seamwright_session=%E0%A4%A',
  'seamwright_session=%',
  'seamwright_session=%00',
  'seamwright_session=abc%00def',
  'seamwright_session=%ud800',
  `seamwright_session=${'a'.repeat(4_000)}`,
  'seamwright_session=',
  'seamwright_session=unknownsessionid0000000000000000000000',
  'seamwright_session="quoted"',
  'seamwright_session=a;seamwright_session=b',
  'other=1; seamwright_session=%FF',
];
export const junkCookie = fc.constantFrom(...junkCookies);
