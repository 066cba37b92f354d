import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { isoDate, toMs } from '@shared/care/time';

// toMs reads toISOString's own shape by hand; it must give exactly what Date.parse gives (ECMAScript's
// date-time string format), and refuse what Date.parse refuses.
function viaDateParse(iso: string): number | 'throws' {
  const ms = Date.parse(iso);
  return Number.isNaN(ms) ? 'throws' : ms;
}
function viaToMs(iso: string): number | 'throws' {
  try {
    return toMs(iso);
  } catch {
    return 'throws';
  }
}

describe('toMs', () => {
  it('equals Date.parse for every instant toISOString writes (years 0000–9999)', () => {
    fc.assert(
      fc.property(
        fc.integer({
          min: Date.parse('0000-01-01T00:00:00.000Z'),
          max: Date.parse('9999-12-31T23:59:59.999Z'),
        }),
        (ms) => {
          const iso = new Date(ms).toISOString();
          expect(toMs(iso)).toBe(Date.parse(iso));
          expect(toMs(iso)).toBe(ms);
        },
      ),
      { seed: 20260601, numRuns: 5000 },
    );
  });

  it('equals Date.parse (or refuses alike) for canonical-looking strings with any digits', () => {
    const two = (max: number) => fc.integer({ min: 0, max }).map((n) => String(n).padStart(2, '0'));
    const shaped = fc
      .tuple(
        fc.integer({ min: 0, max: 9999 }),
        two(19),
        two(39),
        two(29),
        two(69),
        two(69),
        fc.integer({ min: 0, max: 999 }),
      )
      .map(
        ([y, mo, d, h, mi, s, ms]) =>
          `${String(y).padStart(4, '0')}-${mo}-${d}T${h}:${mi}:${s}.${String(ms).padStart(3, '0')}Z`,
      );
    fc.assert(
      fc.property(shaped, (iso) => {
        expect(viaToMs(iso)).toBe(viaDateParse(iso));
      }),
      { seed: 7, numRuns: 5000 },
    );
  });

  it.each([
    '2024-02-29T12:00:00.000Z', // leap day
    '2000-02-29T00:00:00.000Z', // leap (divisible by 400)
    '1900-02-29T00:00:00.000Z', // not leap (divisible by 100): refused
    '2023-02-29T00:00:00.000Z',
    '2025-04-31T00:00:00.000Z',
    '2025-12-31T23:59:59.999Z',
    '1969-12-31T23:59:59.999Z',
    '2025-13-01T00:00:00.000Z',
    '2025-00-10T00:00:00.000Z',
    '2025-01-00T00:00:00.000Z',
    '2025-01-01T24:00:00.000Z',
    '2025-01-01T10:60:00.000Z',
    '2025-01-01T10:00:60.000Z',
    '2025-01-01T10:00:00.00aZ',
    '2025-03-01T09:00:00Z', // other shapes go to Date.parse
    '2025-03-01T10:00:00.000+01:00',
    '2025-03-01',
    'not a date',
  ])('%s gives what Date.parse gives', (iso) => {
    expect(viaToMs(iso)).toBe(viaDateParse(iso));
  });
});

describe('isoDate', () => {
  it.each([
    ['2025-03-01T23:30:00.000Z', '2025-03-01'],
    ['2025-03-01T23:30:00.000-02:00', '2025-03-02'],
    ['2025-03-01T00:30:00+01:00', '2025-02-28'],
  ])('%s is %s (UTC)', (iso, date) => {
    expect(isoDate(iso)).toBe(date);
  });
});
