import fc from 'fast-check';

/**
 * Values a hostile or broken client sends where a well-formed one sends a field (ASVS 1.2.x, 2.2.1, 15.3.6):
 * wrong types, huge and odd strings, control and unpaired characters, markup and SQL fragments, odd dates and numbers.
 */
const ODD_STRINGS = [
  '',
  ' ',
  '\u0000',
  'a\u0000b',
  '\uD800',
  'x\uDFFFy',
  '\uFEFFbom',
  '\u202Eevil',
  '\r\n\t',
  '🐠🦐🪸',
  'Ω≈ç√∫',
  'e\u0301\u0301\u0301',
  '<script>alert(1)</script>',
  '"><img src=x onerror=alert(1)>',
  "' OR '1'='1",
  "1'; DROP TABLE tank; --",
  '$1',
  '%s%n%x',
  '../../etc/passwd',
  '%00',
  '${7*7}',
  '{{7*7}}',
  '=HYPERLINK("x")',
  '@SUM(1)',
  'null',
  'undefined',
  'NaN',
  'Infinity',
  '-0',
  '1e309',
  '0x10',
  'true',
  '[]',
  '{}',
  '__proto__',
  'constructor',
  'prototype',
];
const ODD_DATES = [
  '2025-02-30',
  '2025-13-01',
  '0000-00-00',
  '0000-01-01T00:00:00Z',
  '9999-12-31T23:59:59Z',
  '+275760-09-13T00:00:00.000Z',
  '+275760-09-13T00:00:00.001Z',
  '-271821-04-20T00:00:00.000Z',
  '2025-01-01T25:61:61Z',
  '1970-01-01',
  '2025-06-01T12:00:00+99:00',
  '2100-01-01T00:00:00Z',
  'yesterday',
  '1735689600',
];
const ODD_NUMBERS = [
  0,
  -0,
  -1,
  0.5,
  1.5,
  -273.15,
  1e308,
  -1e308,
  Number.MAX_SAFE_INTEGER + 2,
  Number.MIN_VALUE,
  2 ** 31,
  -(2 ** 31) - 1,
  1e21,
  123456789012,
];

export const hostileString: fc.Arbitrary<string> = fc.oneof(
  { weight: 4, arbitrary: fc.constantFrom(...ODD_STRINGS, ...ODD_DATES) },
  { weight: 2, arbitrary: fc.string({ unit: 'binary', maxLength: 40 }) },
  { weight: 2, arbitrary: fc.string({ unit: 'grapheme', maxLength: 40 }) },
  { weight: 1, arbitrary: fc.integer({ min: 10_000, max: 60_000 }).map((n) => 'x'.repeat(n)) },
  { weight: 1, arbitrary: fc.integer({ min: 1_000, max: 12_000 }).map((n) => '🐠\u0000'.repeat(n)) },
);

export const hostileNumber: fc.Arbitrary<number> = fc.oneof(
  fc.constantFrom(...ODD_NUMBERS),
  fc.integer(),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
);

/** Nested `depth` levels of arrays or objects: parsers and validators that recurse meet their limits. */
export const deepNesting: fc.Arbitrary<unknown> = fc
  .tuple(fc.integer({ min: 50, max: 3_000 }), fc.boolean())
  .map(([depth, arrays]) => {
    let value: unknown = 'bottom';
    for (let i = 0; i < depth; i++) value = arrays ? [value] : { a: value };
    return value;
  });

/** Keys that reach Object.prototype or mass-assign fields a client must never set. */
export const POLLUTION_KEYS = [
  '__proto__',
  'constructor',
  'prototype',
  'toString',
  'hasOwnProperty',
  '__defineGetter__',
];
const MASS_ASSIGNMENT_KEYS = [
  'id',
  'ownerId',
  'clubId',
  'userId',
  'role',
  'isAdmin',
  'createdAt',
  'version',
  'passwordHash',
];
export const hostileKey: fc.Arbitrary<string> = fc.oneof(
  fc.constantFrom(...POLLUTION_KEYS, ...MASS_ASSIGNMENT_KEYS),
  fc.string({ unit: 'binary', maxLength: 12 }),
);

/** An object with `key` as an own enumerable property, so JSON.stringify writes it even when it is `__proto__`. */
export function withOwnKey(
  target: Record<string, unknown>,
  key: string,
  value: unknown,
): Record<string, unknown> {
  Object.defineProperty(target, key, { value, enumerable: true, writable: true, configurable: true });
  return target;
}

export const pollutingObject: fc.Arbitrary<Record<string, unknown>> = fc
  .tuple(
    fc.constantFrom(...POLLUTION_KEYS),
    fc.constantFrom<unknown>({ polluted: 'yes' }, { prototype: { polluted: 'yes' } }, 'yes'),
  )
  .map(([key, value]) => withOwnKey({}, key, value));

export const hostileValue: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 6, arbitrary: hostileString },
  { weight: 3, arbitrary: hostileNumber },
  { weight: 1, arbitrary: fc.boolean() },
  { weight: 1, arbitrary: fc.constant(null) },
  { weight: 1, arbitrary: fc.array(hostileString, { maxLength: 4 }) },
  { weight: 1, arbitrary: fc.array(fc.constant({}), { minLength: 500, maxLength: 5_000 }) },
  { weight: 1, arbitrary: pollutingObject },
  { weight: 1, arbitrary: deepNesting },
  { weight: 1, arbitrary: fc.dictionary(hostileKey, hostileString, { maxKeys: 4 }) },
);

/** Ids as a path or a field carries them, wrong in every way a UUID can be. */
export const hostileId: fc.Arbitrary<string> = fc.oneof(
  fc.constantFrom(
    'not-a-uuid',
    '00000000-0000-0000-0000-000000000000',
    'FFFFFFFF-FFFF-FFFF-FFFF-FFFFFFFFFFFF',
    '1',
    '-1',
    '0',
    '1e3',
    '9999999999999999999',
    '__proto__',
    'constructor',
    'null',
    'undefined',
    "' OR 1=1 --",
    '🐠',
    '.',
    '%2e%2e',
    '%00',
    'a%00b',
  ),
  fc.uuid(),
  fc.uuid().map((u) => `${u}x`),
  fc.uuid().map((u) => u.toUpperCase()),
  fc.integer({ min: 500, max: 5_000 }).map((n) => 'a'.repeat(n)),
  fc.string({ unit: 'grapheme', minLength: 1, maxLength: 20 }),
);

/** Bodies no well-behaved client sends: broken JSON, JSON's forbidden numbers, invalid UTF-8, the wrong media type. */
export interface RawBody {
  contentType: string;
  bytes: Buffer;
}
export const rawBody: fc.Arbitrary<RawBody> = fc.oneof(
  fc.constantFrom<RawBody>(
    { contentType: 'application/json', bytes: Buffer.from('{"name": ') },
    { contentType: 'application/json', bytes: Buffer.from('{"value": NaN, "count": Infinity}') },
    { contentType: 'application/json', bytes: Buffer.from('{"value": 1e999, "count": -1e999}') },
    {
      contentType: 'application/json',
      bytes: Buffer.from([0x7b, 0x22, 0x6e, 0x22, 0x3a, 0x22, 0xff, 0xfe, 0xc3, 0x28, 0x22, 0x7d]),
    },
    { contentType: 'application/json', bytes: Buffer.from('\uFEFF{"a":1}') },
    { contentType: 'application/json', bytes: Buffer.from('"just a string"') },
    { contentType: 'application/json', bytes: Buffer.from('null') },
    {
      contentType: 'application/json',
      bytes: Buffer.from(
        '{"__proto__": {"polluted": "yes"}, "constructor": {"prototype": {"polluted": "yes"}}}',
      ),
    },
    { contentType: 'application/json', bytes: Buffer.from('{"a":1,"a":2,"a":{"b":3}}') },
    { contentType: 'application/json; charset=utf-16', bytes: Buffer.from('{"a":1}', 'utf16le') },
    { contentType: 'application/json; charset=latin1', bytes: Buffer.from('{"a":1}') },
    { contentType: 'text/plain', bytes: Buffer.from('name=tank') },
    {
      contentType: 'application/x-www-form-urlencoded',
      bytes: Buffer.from('__proto__[polluted]=yes&constructor[prototype][polluted]=yes&a[b][c]=d'),
    },
    {
      contentType: 'multipart/form-data; boundary=x',
      bytes: Buffer.from(
        '--x\r\nContent-Disposition: form-data; name="photos"; filename="../../a.png"\r\n\r\nnot an image\r\n--x--\r\n',
      ),
    },
    { contentType: 'multipart/form-data; boundary=x', bytes: Buffer.from('--x\r\nbroken') },
    { contentType: 'multipart/form-data', bytes: Buffer.from('no boundary') },
    {
      contentType: 'application/xml',
      bytes: Buffer.from(
        '<?xml version="1.0"?><!DOCTYPE a [<!ENTITY x SYSTEM "file:///etc/passwd">]><a>&x;</a>',
      ),
    },
  ),
  // Just over the JSON limit (200 kB), and a long run of open brackets.
  fc.constant<RawBody>({
    contentType: 'application/json',
    bytes: Buffer.from(JSON.stringify({ note: 'x'.repeat(210 * 1024) })),
  }),
  fc
    .integer({ min: 1_000, max: 50_000 })
    .map((n): RawBody => ({ contentType: 'application/json', bytes: Buffer.from('['.repeat(n)) })),
);
