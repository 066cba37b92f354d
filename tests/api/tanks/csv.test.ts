import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { salinityFromSpecificGravity } from '@shared/chemistry/specific-gravity';
import { convert } from '@shared/chemistry/units';
import { WaterTest } from '@server/modules/tanks/water-test.entity';
import { resetDatabase } from '@tests/helpers/db';
import { createTestApp, type TestApp } from '@tests/helpers/test-app';
import { makeTankVia, tankPeople } from './people';
import { DAY_MS } from '@shared/care/time';

const START = Date.UTC(2025, 0, 1, 8, 0);
const stamp = (ms: number) => new Date(ms).toISOString().slice(0, 16).replace('T', ' ');

/** 50 invented readings, one a day; rows 12, 22 and 32 (as a spreadsheet numbers them) are wrong on purpose. */
function fiftyRows(): string {
  const lines = ['Date,Temp (°F),Salinity (SG),pH,Ammonia (mg/L NH4),Nitrate (mg/L NO3-N),Notes'];
  for (let i = 0; i < 50; i++) {
    const date = i === 20 ? 'not a date' : stamp(START + i * DAY_MS);
    const pH = i === 10 ? '80' : '8.1';
    const nitrate = i === 30 ? 'lots' : String(1 + (i % 5));
    lines.push(`${date},${77 + (i % 3) * 0.5},1.024,${pH},0,${nitrate},"day ${i + 1}, all calm"`);
  }
  return `${lines.join('\n')}\n`;
}

describe('CSV import and export', () => {
  let t: TestApp;
  let p: Awaited<ReturnType<typeof tankPeople>>;
  let tank: string;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());
  beforeEach(async () => {
    await resetDatabase(t.dataSource);
    p = await tankPeople(t);
    tank = `/api/clubs/${p.club.id}/tanks/${(await makeTankVia(p.asKeeper, p.club.id)).id}`;
  });
  const stored = () => t.dataSource.getRepository(WaterTest).find({ order: { takenAt: 'ASC' } });

  it('when a 50-row file has exactly 3 bad rows, then the preview lists those 3 with reasons and guesses columns and units', async () => {
    const res = await p.asKeeper.post(`${tank}/imports/preview`, { csv: fiftyRows() });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      delimiter: ',',
      dateFormat: 'iso',
      rows: 50,
      valid: 47,
      invalid: 3,
      errorCount: 3,
      duplicates: 0,
      mapping: {
        Date: 'takenAt',
        'Temp (°F)': 'temperature',
        'Salinity (SG)': 'salinity',
        pH: 'pH',
        'Ammonia (mg/L NH4)': 'ammonia',
        'Nitrate (mg/L NO3-N)': 'nitrate',
        Notes: 'note',
      },
      units: { temperature: '°F', salinity: 'SG', ammonia: 'mg/L NH4', nitrate: 'mg/L NO3-N' },
    });
    expect(res.body.errors).toEqual([
      { row: 12, field: 'pH', message: 'pH 80 is not possible — did you mean 8.0?' },
      { row: 22, field: 'Date', message: '"not a date" is not a date in the form 2025-03-04 18:30.' },
      { row: 32, field: 'Nitrate (mg/L NO3-N)', message: '"lots" is not a number.' },
    ]);
    expect(res.body.sample[0]).toMatchObject({ row: 2, takenAt: '2025-01-01T08:00:00.000Z' });
    expect(await t.dataSource.getRepository(WaterTest).count()).toBe(0);
  });

  it('when the same file is committed, then the 47 valid rows are saved in canonical units; committing it again saves none', async () => {
    const res = await p.asKeeper.post(`${tank}/imports/commit`, { csv: fiftyRows() });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({
      imported: 47,
      invalid: 3,
      duplicates: 0,
      skipped: 0,
      firstTakenAt: '2025-01-01T08:00:00.000Z',
      lastTakenAt: new Date(START + 49 * DAY_MS).toISOString(),
    });
    const rows = await stored();
    expect(rows).toHaveLength(47);
    const first = rows[0]!;
    expect(first).toMatchObject({ origin: 'import', note: 'day 1, all calm', pH: 8.1, ammoniaMgL: 0 });
    expect(first.temperatureC).toBeCloseTo(25, 10);
    expect(first.salinityPsu).toBeCloseTo(
      salinityFromSpecificGravity({ sg: 1.024, sampleTempC: 25, referenceTempC: 25 }),
      9,
    );
    expect(first.nitrateMgL).toBeCloseTo(convert(1, 'mg/L NO3-N', 'mg/L NO3'), 10);
    expect(first.freeAmmoniaMgL).toBe(0);
    expect(first.entries.nitrate).toEqual({ value: 1, unit: 'mg/L NO3-N', method: 'liquid-kit' });

    const again = await p.asKeeper.post(`${tank}/imports/commit`, { csv: fiftyRows() });
    expect(again.status).toBe(400);
    expect(again.body.issues[0].message).toBe('3 rows have errors and 47 are already on the tank.');
    expect(await t.dataSource.getRepository(WaterTest).count()).toBe(47);
  });

  it('when the file is read with the wrong delimiter, then 400 says only one column was found', async () => {
    const csv = 'date;pH;nitrate\n2025-01-01 08:00;8,1;5\n';
    const res = await p.asKeeper.post(`${tank}/imports/preview`, { csv, delimiter: ',' });
    expect(res.status).toBe(400);
    expect(res.body.issues).toEqual([
      { path: 'delimiter', message: expect.stringMatching(/^Only one column was found/) },
    ]);
    const guessed = await p.asKeeper.post(`${tank}/imports/preview`, { csv });
    expect(guessed.body).toMatchObject({ delimiter: ';', valid: 1 });
    expect(guessed.body.sample[0].values.pH).toBe(8.1);
  });

  it('when the file is not UTF-8 or is binary, then 400 says so', async () => {
    const latin1 = Buffer.from('date,temperature\n2025-01-01 08:00,25\xb0\n', 'latin1').toString('utf8');
    const res = await p.asKeeper.post(`${tank}/imports/preview`, { csv: latin1 });
    expect(res.status).toBe(400);
    expect(res.body.issues).toEqual([
      {
        path: 'csv',
        message:
          'The file is not UTF-8 text: some characters could not be read. Save it as "CSV UTF-8" and try again.',
      },
    ]);
    const binary = await p.asKeeper.post(`${tank}/imports/preview`, { csv: 'date,pH\u0000\u0001\u0002\n' });
    expect(binary.body.issues).toEqual([
      { path: 'csv', message: 'This is not a text CSV file: it contains binary data.' },
    ]);
  });

  it('when dates could be day-first or month-first, then 400 asks which; with dmy and a time zone they are read as local time', async () => {
    const csv = 'when,pH\n03/04/2025 10:00,8.1\n05/06/2025 10:00,8.2\n';
    const ask = await p.asKeeper.post(`${tank}/imports/preview`, { csv });
    expect(ask.status).toBe(400);
    expect(ask.body.issues[0]).toEqual({
      path: 'dateFormat',
      message: expect.stringMatching(/day-first or month-first/),
    });
    const dmy = await p.asKeeper.post(`${tank}/imports/preview`, {
      csv,
      dateFormat: 'dmy',
      timeZone: 'Europe/Lisbon',
    });
    expect(dmy.body.sample.map((s: { takenAt: string }) => s.takenAt)).toEqual([
      '2025-04-03T09:00:00.000Z',
      '2025-06-05T09:00:00.000Z',
    ]);
    const mdy = await p.asKeeper.post(`${tank}/imports/preview`, { csv, dateFormat: 'mdy' });
    expect(mdy.body.sample.map((s: { takenAt: string }) => s.takenAt)).toEqual([
      '2025-03-04T10:00:00.000Z',
      '2025-05-06T10:00:00.000Z',
    ]);
    const obvious = await p.asKeeper.post(`${tank}/imports/preview`, { csv: 'date,pH\n25/12/2025,8.1\n' });
    expect(obvious.body).toMatchObject({
      dateFormat: 'dmy',
      sample: [{ takenAt: '2025-12-25T12:00:00.000Z' }],
    });
  });

  it('when the mapping names a column that is not there or maps two columns to one parameter, then 400 on mapping', async () => {
    const csv = 'date,pH,ph again\n2025-01-01 08:00,8.1,8.2\n';
    const missing = await p.asKeeper.post(`${tank}/imports/preview`, {
      csv,
      mapping: { Nitrate: 'nitrate' },
    });
    expect(missing.body.issues[0].path).toBe('mapping.Nitrate');
    const twice = await p.asKeeper.post(`${tank}/imports/preview`, {
      csv,
      mapping: { pH: 'pH', 'ph again': 'pH' },
    });
    expect(twice.body.issues[0].path).toBe('mapping.ph again');
    const ignored = await p.asKeeper.post(`${tank}/imports/preview`, {
      csv,
      mapping: { pH: 'ignore', 'ph again': 'pH' },
    });
    expect(ignored.body.sample[0].values).toEqual({ pH: 8.2 });
    const noDate = await p.asKeeper.post(`${tank}/imports/preview`, { csv: 'pH,nitrate\n8,5\n' });
    expect(noDate.body.issues[0]).toEqual({
      path: 'mapping',
      message: 'No column holds the date of each test: map one column to takenAt.',
    });
  });

  it('when a tank is exported, then the header names units, a formula-looking note is escaped, and the file re-imports as the same readings (ASVS 1.2.10)', async () => {
    await p.asKeeper.post(`${tank}/imports/commit`, { csv: fiftyRows() });
    await p.asKeeper.post(`${tank}/events`, {
      kind: 'feeding-note',
      occurredAt: '2025-01-05T09:00:00Z',
      note: '=HYPERLINK("http://example.invalid","click")',
      details: { food: '+plankton' },
    });
    const res = await p.asMentor.get(`${tank}/export.csv`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toMatch(
      /^attachment; filename="living-room-reef-\d{4}-\d{2}-\d{2}\.csv"$/,
    );
    const text = res.text.replace(/^\uFEFF/, '');
    const [header, ...lines] = Papa.parse<string[]>(text.trim()).data;
    expect(header).toEqual([
      'record',
      'date (UTC)',
      'temperature (°C)',
      'salinity (PSU)',
      'pH',
      'ammonia (mg/L NH3)',
      'nitrite (mg/L NO2)',
      'nitrate (mg/L NO3)',
      'alkalinity (dKH)',
      'calcium (mg/L Ca)',
      'magnesium (mg/L Mg)',
      'phosphate (mg/L PO4)',
      'free ammonia (mg/L NH3)',
      'note',
      'details',
    ]);
    expect(lines).toHaveLength(48);
    const feeding = lines.find((l) => l[0] === 'feeding-note')!;
    expect(feeding[13]).toBe('\'=HYPERLINK("http://example.invalid","click")');
    expect(feeding[14]).toBe('food +plankton');
    expect(lines.filter((l) => l[0] === 'water-test')[0]!.slice(1, 8)).toEqual([
      '2025-01-01T08:00:00.000Z',
      '25',
      expect.any(String),
      '8.1',
      '0',
      '',
      expect.any(String),
    ]);

    const fresh = await makeTankVia(p.asKeeper, p.club.id, {
      name: 'Copy',
      systemType: 'reef',
      volume: { source: 'entered', value: 300 },
    });
    const back = await p.asKeeper.post(`/api/clubs/${p.club.id}/tanks/${fresh.id}/imports/preview`, {
      csv: res.text,
    });
    expect(back.body).toMatchObject({
      rows: 48,
      valid: 47,
      skipped: 1,
      errorCount: 0,
      units: { temperature: '°C', salinity: 'PSU', nitrate: 'mg/L NO3' },
    });
    expect(back.body.mapping['free ammonia (mg/L NH3)']).toBe('ignore');
  });

  it('when 5,000 rows are committed, then all are saved in one transaction within seconds', async () => {
    const lines = ['date,pH,nitrate (mg/L NO3),temperature (°C)'];
    for (let i = 0; i < 5000; i++)
      lines.push(
        `${new Date(START + i * 3_600_000).toISOString()},${(7.8 + (i % 5) / 10).toFixed(1)},${i % 40},${24 + (i % 3)}`,
      );
    const began = Date.now();
    const res = await p.asKeeper.post(`${tank}/imports/commit`, { csv: lines.join('\n') });
    expect(res.status).toBe(200);
    expect(res.body.imported).toBe(5000);
    expect(Date.now() - began).toBeLessThan(15_000);
    expect(await t.dataSource.getRepository(WaterTest).countBy({ origin: 'import' })).toBe(5000);
  });
});
