import { describe, expect, it } from 'vitest';
import { PARAMETER_KEYS } from '@shared/care/parameters';
import { analyzeCsv, type AnalyzeContext } from '@shared/readings/csv-analyze';
import { CsvProblem } from '@shared/readings/csv-layout';
import { guessTarget, guessUnit, parameterHeader } from '@shared/readings/csv-columns';
import { detectDateFormat, parseDateCell, wallTimeToUtc } from '@shared/readings/csv-dates';
import { csvImportSchema } from '@shared/schemas/csv-import.schema';

const ctx: AnalyzeContext = {
  systemType: 'tropical-freshwater',
  now: '2025-12-31T00:00:00.000Z',
  timeZone: 'UTC',
  existingTakenAt: new Set(),
};
const analyze = (csv: string, extra: Record<string, unknown> = {}) =>
  analyzeCsv(csvImportSchema.parse({ csv, ...extra }), ctx);

describe('reading dates from a spreadsheet', () => {
  it('when dates are ISO or day-first or month-first, then each is read in the time zone given', () => {
    expect(parseDateCell('2025-03-04 18:30', undefined, 'iso', 'UTC')).toEqual({
      iso: '2025-03-04T18:30:00.000Z',
    });
    expect(parseDateCell('2025-03-04T18:30:00+02:00', undefined, 'iso', 'America/New_York')).toEqual({
      iso: '2025-03-04T16:30:00.000Z',
    });
    expect(parseDateCell('04/03/2025 6:30 pm', undefined, 'dmy', 'UTC')).toEqual({
      iso: '2025-03-04T18:30:00.000Z',
    });
    expect(parseDateCell('03/04/2025', '18:30', 'mdy', 'UTC')).toEqual({ iso: '2025-03-04T18:30:00.000Z' });
    expect(parseDateCell('2025-07-01 09:00', undefined, 'iso', 'Europe/Berlin')).toEqual({
      iso: '2025-07-01T07:00:00.000Z',
    });
    expect(parseDateCell('2025-01-01 09:00', undefined, 'iso', 'Europe/Berlin')).toEqual({
      iso: '2025-01-01T08:00:00.000Z',
    });
    expect(parseDateCell('2025-03-04', undefined, 'iso', 'UTC')).toEqual({ iso: '2025-03-04T12:00:00.000Z' });
  });

  it('when a date does not exist, then the error says so', () => {
    expect(parseDateCell('31/02/2025', undefined, 'dmy', 'UTC')).toEqual({
      error: '"31/02/2025" is not a real date.',
    });
    expect(parseDateCell('2025-03-04 25:10', undefined, 'iso', 'UTC')).toEqual({
      error: '"2025-03-04 25:10" has an impossible time.',
    });
    expect(parseDateCell('yesterday', undefined, 'iso', 'UTC')).toEqual({
      error: '"yesterday" is not a date in the form 2025-03-04 18:30.',
    });
  });

  it('when detecting the format, then a day above 12 decides; none is ambiguous; both is mixed', () => {
    expect(detectDateFormat(['2025-01-02', '2025-01-03T10:00Z'])).toBe('iso');
    expect(detectDateFormat(['01/02/2025', '25/02/2025'])).toBe('dmy');
    expect(detectDateFormat(['02/25/2025'])).toBe('mdy');
    expect(detectDateFormat(['01/02/2025', '03/04/2025'])).toBe('ambiguous');
    expect(detectDateFormat(['25/02/2025', '02/25/2025'])).toBe('mixed');
  });

  it('when the wall time is skipped or repeated by a DST change, then the later instant is used', () => {
    // Lisbon jumps from 01:00 to 02:00 on 30 March 2025 and falls back from 02:00 to 01:00 on 26 October.
    expect(new Date(wallTimeToUtc(Date.UTC(2025, 2, 30, 1, 30), 'Europe/Lisbon')).toISOString()).toBe(
      '2025-03-30T01:30:00.000Z',
    );
    expect(new Date(wallTimeToUtc(Date.UTC(2025, 9, 26, 1, 30), 'Europe/Lisbon')).toISOString()).toBe(
      '2025-10-26T01:30:00.000Z',
    );
    expect(new Date(wallTimeToUtc(Date.UTC(2025, 9, 26, 0, 30), 'Europe/Lisbon')).toISOString()).toBe(
      '2025-10-25T23:30:00.000Z',
    );
  });
});

describe('reading columns from a spreadsheet', () => {
  it('when our own export headers come back, then each maps to its parameter in the canonical unit', () => {
    for (const key of PARAMETER_KEYS) expect(guessTarget(parameterHeader(key)), key).toBe(key);
    expect(guessTarget(parameterHeader('freeAmmonia'))).toBe('ignore');
    expect(guessUnit('nitrate', parameterHeader('nitrate'), [])).toBe('mg/L NO3');
    expect(guessUnit('alkalinity', parameterHeader('alkalinity'), [])).toBe('dKH');
    expect(guessUnit('salinity', parameterHeader('salinity'), [])).toBe('PSU');
  });

  it('when headers are written by hand, then targets and units are guessed from words and, failing that, from the numbers', () => {
    expect(guessTarget('Salinity at 25 °C')).toBe('salinity');
    expect(guessTarget('Phosphate')).toBe('phosphate');
    expect(guessTarget('KH')).toBe('alkalinity');
    expect(guessTarget('Mg')).toBe('magnesium');
    expect(guessTarget('Comments')).toBe('note');
    expect(guessTarget('Colour of the water')).toBe('ignore');
    expect(guessUnit('salinity', 'Salinity', [1.024, 1.025, 1.026])).toBe('SG');
    expect(guessUnit('salinity', 'Salinity', [34, 35])).toBe('ppt');
    expect(guessUnit('temperature', 'Temp', [77, 78])).toBe('°F');
    expect(guessUnit('ammonia', 'TAN', [0.1])).toBe('mg/L NH3-N');
    expect(guessUnit('alkalinity', 'Alk (ppm)', [140])).toBe('mg/L CaCO3');
  });

  it('when a semicolon file uses decimal commas and repeats a header, then numbers read and columns get distinct names', () => {
    const { preview } = analyze('Date;pH;pH;Tank colour\n2025-01-01 08:00;7,4;7,5;green\n');
    expect(preview.columns).toEqual(['Date', 'pH', 'pH (2)', 'Tank colour']);
    expect(preview.mapping).toEqual({
      Date: 'takenAt',
      pH: 'pH',
      'pH (2)': 'ignore',
      'Tank colour': 'ignore',
    });
    expect(preview.sample[0]!.values).toEqual({ pH: 7.4 });
  });

  it('when a row has no readings or too many cells, then that row is an error and the others still count', () => {
    const { preview } = analyze('date,pH\n2025-01-01 08:00,\n2025-01-02 08:00,7.2,9\n2025-01-03 08:00,7.3\n');
    expect(preview).toMatchObject({ rows: 3, valid: 1, invalid: 2 });
    expect(preview.errors.map((e) => [e.row, e.message])).toEqual([
      [2, 'This row has no readings.'],
      [3, 'This row has 3 cells but the header has 2.'],
    ]);
  });

  it('when the file has only a header or nothing usable, then a CsvProblem names the part to fix', () => {
    expect(() => analyze('date,pH\n')).toThrow(CsvProblem);
    expect(() => analyze('date,colour\n2025-01-01,green\n')).toThrow(/No column holds a reading/);
  });
});
