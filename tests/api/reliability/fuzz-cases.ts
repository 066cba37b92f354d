import fc from 'fast-check';
import {
  hostileId,
  hostileKey,
  hostileString,
  hostileValue,
  POLLUTION_KEYS,
  rawBody,
  withOwnKey,
  type RawBody,
} from '../../helpers/hostile-values';

export type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

/** One hostile request: a well-formed request of the route with exactly one thing made wrong (`mutation`). */
export interface FuzzCase {
  route: string;
  method: Method;
  /** Path under /api, already percent-encoded, with its query. */
  path: string;
  body: { json: unknown } | { raw: RawBody } | undefined;
  headers: Record<string, string>;
  sendCsrf: boolean;
  mutation: string;
  /** The body field that was made wrong (dotted), when the mutation aimed at one. */
  field?: string;
}

export interface ValidRequest {
  route: string;
  path: string;
  body?: unknown;
}

/** Every query parameter some route reads, plus keys that aim at the query parser. */
const QUERY_KEYS = [
  'status',
  'state',
  'limit',
  'before',
  'cursor',
  'unreadOnly',
  'urgentOnly',
  'cycling',
  'unanswered',
  'tankId',
  'waterTestId',
  'eventId',
  'token',
  'kind',
  'a[b]',
  'limit[]',
  ...POLLUTION_KEYS,
];

/** Percent-encodes the UTF-8 bytes (encodeURIComponent throws on unpaired surrogates, which we want to send). */
export function percentEncode(s: string): string {
  let out = '';
  for (const byte of Buffer.from(s, 'utf8')) {
    const c = String.fromCharCode(byte);
    out += /[A-Za-z0-9\-_.~]/.test(c) ? c : `%${byte.toString(16).toUpperCase().padStart(2, '0')}`;
  }
  return out;
}

/** Broken percent-encodings, sent as they are. */
const RAW_ESCAPES = ['%', '%zz', '%E0%A4%A', '%FF%FE', '%C0%AF', '%00'];

/** Dotted paths of every value inside a JSON body (objects and arrays), so one of them can be made wrong. */
function fieldPaths(value: unknown, prefix = ''): string[] {
  if (value === null || typeof value !== 'object') return [];
  const out: string[] = [];
  for (const [k, v] of Object.entries(value)) {
    const p = prefix ? `${prefix}.${k}` : k;
    out.push(p, ...fieldPaths(v, p));
  }
  return out;
}

const clone = (v: unknown): unknown => (v === undefined ? undefined : JSON.parse(JSON.stringify(v)));

function setAt(
  body: unknown,
  path: string,
  update: (parent: Record<string, unknown>, key: string) => void,
): unknown {
  const copy = clone(body) as Record<string, unknown>;
  const keys = path.split('.');
  let parent = copy;
  for (const k of keys.slice(0, -1)) parent = parent[k] as Record<string, unknown>;
  update(parent, keys[keys.length - 1]!);
  return copy;
}

const valueAt = (root: unknown, path: string): unknown =>
  path.split('.').reduce<unknown>((o, k) => (o as Record<string, unknown>)?.[k], root);

const queryPair = fc.tuple(
  fc.constantFrom(...QUERY_KEYS),
  fc.oneof(
    { weight: 4, arbitrary: hostileString.map(percentEncode) },
    { weight: 1, arbitrary: fc.constantFrom(...RAW_ESCAPES) },
  ),
);

const headerTrouble = fc.constantFrom<{ label: string; headers: Record<string, string>; sendCsrf: boolean }>(
  { label: 'no CSRF token', headers: {}, sendCsrf: false },
  { label: 'huge CSRF token', headers: { 'X-CSRF-Token': 'A'.repeat(20_000) }, sendCsrf: false },
  {
    label: 'forged session cookie',
    headers: { Cookie: 'shoalwise.sid=s%3Aforged.c2lnbmF0dXJl; __proto__=x' },
    sendCsrf: false,
  },
  {
    label: 'forwarded-for junk',
    headers: { 'X-Forwarded-For': '1.2.3.4, <script>, ::ffff:999.1.1.1' },
    sendCsrf: true,
  },
  { label: 'gzip that is not gzip', headers: { 'Content-Encoding': 'gzip' }, sendCsrf: true },
  { label: 'unknown content encoding', headers: { 'Content-Encoding': 'x-unknown' }, sendCsrf: true },
  { label: 'odd accept', headers: { Accept: 'text/html;q=0.1, */*;q=nonsense' }, sendCsrf: true },
);

/** Hostile variants of one valid request. Deterministic for a given fast-check seed. */
export function fuzzCaseArbitrary(valid: ValidRequest): fc.Arbitrary<FuzzCase> {
  const [methodUpper, pattern] = valid.route.split(' ') as [string, string];
  const method = methodUpper.toLowerCase() as Method;
  const [pathOnly, validQuery] = valid.path.split('?') as [string, string | undefined];
  const patternSegments = pattern.split('/');
  const segments = pathOnly.split('/');
  const paramPositions = patternSegments.flatMap((s, i) => (s.startsWith(':') ? [i] : []));
  const body = valid.body;
  const fields = fieldPaths(body);
  const strings = fields.filter((f) => typeof valueAt(body, f) === 'string');
  const objects = fields.filter((f) => {
    const v = valueAt(body, f);
    return v !== null && typeof v === 'object' && !Array.isArray(v);
  });

  const build = (
    over: Partial<FuzzCase> & { mutation: string; segments?: string[]; extraQuery?: string },
  ): FuzzCase => {
    const query = [validQuery, over.extraQuery].filter(Boolean).join('&');
    return {
      route: valid.route,
      method,
      path: `/api${(over.segments ?? segments).join('/')}${query ? `?${query}` : ''}`,
      body: 'body' in over ? over.body : body === undefined ? undefined : { json: body },
      headers: over.headers ?? {},
      sendCsrf: over.sendCsrf ?? true,
      mutation: over.mutation,
      ...(over.field ? { field: over.field } : {}),
    };
  };

  const choices: { weight: number; arbitrary: fc.Arbitrary<FuzzCase> }[] = [];
  const hasBody = method !== 'get';

  if (paramPositions.length) {
    choices.push({
      weight: hasBody ? 3 : 6,
      arbitrary: fc
        .tuple(
          fc.constantFrom(...paramPositions),
          fc.oneof(
            { weight: 5, arbitrary: hostileId.map(percentEncode) },
            { weight: 1, arbitrary: fc.constantFrom(...RAW_ESCAPES) },
          ),
        )
        .map(([at, id]) =>
          build({
            mutation: `path ${patternSegments[at]} = ${id.slice(0, 40)}`,
            segments: segments.map((s, i) => (i === at ? id : s)),
          }),
        ),
    });
  }
  choices.push({
    weight: hasBody ? 2 : 6,
    arbitrary: fc.array(queryPair, { minLength: 1, maxLength: 4 }).map((pairs) =>
      build({
        mutation: `query ${pairs.map(([k]) => k).join(',')}`,
        extraQuery: pairs.map(([k, v]) => `${percentEncode(k)}=${v}`).join('&'),
      }),
    ),
  });
  choices.push({
    weight: 1,
    arbitrary: headerTrouble.map((h) =>
      build({ mutation: `header: ${h.label}`, headers: h.headers, sendCsrf: h.sendCsrf }),
    ),
  });
  choices.push({
    weight: hasBody ? 3 : 1,
    arbitrary: rawBody.map((raw) =>
      build({
        mutation: `raw body ${raw.contentType}: ${raw.bytes.subarray(0, 30).toString('latin1')}`,
        body: { raw },
      }),
    ),
  });
  choices.push({
    weight: hasBody ? 2 : 1,
    arbitrary: hostileValue.map((json) => build({ mutation: 'whole body replaced', body: { json } })),
  });
  choices.push({
    weight: hasBody ? 3 : 1,
    arbitrary: fc.tuple(fc.constantFrom('', ...objects), hostileKey, hostileValue).map(([at, key, value]) => {
      const target = (clone(body) ?? {}) as Record<string, unknown>;
      const parent = at ? (valueAt(target, at) as Record<string, unknown>) : target;
      withOwnKey(parent, key, value);
      return build({
        mutation: `extra key ${JSON.stringify(key)}${at ? ` in ${at}` : ''}`,
        body: { json: target },
      });
    }),
  });
  if (fields.length) {
    choices.push({
      weight: 8,
      arbitrary: fc.tuple(fc.constantFrom(...fields), hostileValue).map(([field, value]) =>
        build({
          mutation: `field ${field} set`,
          field,
          body: { json: setAt(body, field, (parent, key) => (parent[key] = value)) },
        }),
      ),
    });
    choices.push({
      weight: 2,
      arbitrary: fc.constantFrom(...fields).map((field) =>
        build({
          mutation: `field ${field} dropped`,
          field,
          body: { json: setAt(body, field, (parent, key) => delete parent[key]) },
        }),
      ),
    });
  }
  if (strings.length) {
    // Hostile text inside a valid string (a CSV cell, a note), so parsers past the schema see it too.
    choices.push({
      weight: 3,
      arbitrary: fc.tuple(fc.constantFrom(...strings), hostileString, fc.nat()).map(([field, inserted, at]) =>
        build({
          mutation: `field ${field} spliced`,
          field,
          body: {
            json: setAt(body, field, (parent, key) => {
              const s = parent[key] as string;
              const i = s.length ? at % s.length : 0;
              parent[key] = s.slice(0, i) + inserted + s.slice(i);
            }),
          },
        }),
      ),
    });
  }
  return fc.oneof(...choices);
}
