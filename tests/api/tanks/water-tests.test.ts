import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { freeAmmonia } from '@shared/chemistry/ammonia';
import { REFERENCE_TEMP_60F_C, salinityFromSpecificGravity } from '@shared/chemistry/specific-gravity';
import { convert } from '@shared/chemistry/units';
import { salinityAsSpecificGravity } from '@shared/readings/salinity';
import { AuditEvent } from '@server/modules/audit/audit-event.entity';
import { WaterTest } from '@server/modules/tanks/water-test.entity';
import { resetDatabase } from '@tests/helpers/db';
import { createTestApp, type TestApp } from '@tests/helpers/test-app';
import { makeTankVia, tankPeople } from './people';

const HOUR = 3_600_000;
const hoursAgo = (h: number) => new Date(Date.now() - h * HOUR).toISOString();

describe('water tests', () => {
  let t: TestApp;
  let p: Awaited<ReturnType<typeof tankPeople>>;
  let tests: string;
  let tankId: string;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());
  beforeEach(async () => {
    await resetDatabase(t.dataSource);
    p = await tankPeople(t);
    tankId = (await makeTankVia(p.asKeeper, p.club.id)).id;
    tests = `/api/clubs/${p.club.id}/tanks/${tankId}/water-tests`;
  });
  const row = (id: string) => t.dataSource.getRepository(WaterTest).findOneByOrFail({ id });

  it('when SG 1.0245 is read on a refractometer referenced to 25 °C with the sample at 25 °C, then practical salinity is stored and reads back as SG 1.0245', async () => {
    const res = await p.asKeeper.post(tests, {
      takenAt: hoursAgo(1),
      entries: {
        salinity: { value: 1.0245, unit: 'SG', method: 'refractometer', referenceTempC: 25, sampleTempC: 25 },
      },
    });
    expect(res.status).toBe(201);
    const expected = salinityFromSpecificGravity({ sg: 1.0245, sampleTempC: 25, referenceTempC: 25 });
    const stored = await row(res.body.waterTest.id);
    expect(stored.salinityPsu).toBeCloseTo(expected, 9);
    expect(res.body.waterTest.values.salinity).toBe(stored.salinityPsu);
    expect(
      Math.abs(salinityAsSpecificGravity(res.body.waterTest.values.salinity, 25) - 1.0245),
    ).toBeLessThanOrEqual(0.00005);
    expect(stored.entries.salinity).toEqual({
      value: 1.0245,
      unit: 'SG',
      method: 'refractometer',
      referenceTempC: 25,
      sampleTempC: 25,
    });
    expect(res.body.waterTest.derived.salinity).toMatchObject({
      from: 'SG',
      reading: 1.0245,
      sampleTempC: 25,
      sampleTempSource: 'entry',
      referenceTempC: 25,
    });
  });

  it('when a hydrometer referenced to 60 °F is read in 26 °C water, then the sample temperature comes from this test', async () => {
    const res = await p.asKeeper.post(tests, {
      takenAt: hoursAgo(1),
      entries: {
        temperature: { value: 26, unit: '°C' },
        salinity: { value: 1.0235, unit: 'SG', method: 'hydrometer', referenceTempC: 15.56 },
      },
    });
    expect(res.status).toBe(201);
    const expected = salinityFromSpecificGravity({
      sg: 1.0235,
      sampleTempC: 26,
      referenceTempC: REFERENCE_TEMP_60F_C,
    });
    expect(res.body.waterTest.values.salinity).toBeCloseTo(expected, 9);
    expect(res.body.waterTest.derived.salinity).toMatchObject({
      sampleTempC: 26,
      sampleTempSource: 'this-test',
      referenceTempC: REFERENCE_TEMP_60F_C,
    });
  });

  it('when readings come in other units, then the canonical columns hold °C, mg/L NO3 and dKH while the entries keep what was typed', async () => {
    const res = await p.asKeeper.post(tests, {
      takenAt: hoursAgo(2),
      entries: {
        temperature: { value: 77, unit: '°F' },
        nitrate: { value: 2, unit: 'mg/L NO3-N', method: 'strip' },
        alkalinity: { value: 2.86, unit: 'meq/L', note: 'second try' },
        salinity: { value: 53, unit: 'mS/cm', method: 'digital-meter' },
      },
    });
    expect(res.status).toBe(201);
    const stored = await row(res.body.waterTest.id);
    expect(stored.temperatureC).toBeCloseTo(25, 10);
    expect(stored.nitrateMgL).toBeCloseTo(convert(2, 'mg/L NO3-N', 'mg/L NO3'), 10);
    expect(stored.alkalinityDkh).toBeCloseTo(convert(2.86, 'meq/L', 'dKH'), 10);
    expect(stored.salinityPsu).toBeGreaterThan(34);
    expect(stored.salinityPsu).toBeLessThan(36);
    expect(stored.entries.nitrate).toEqual({ value: 2, unit: 'mg/L NO3-N', method: 'strip' });
    expect(stored.entries.temperature).toEqual({ value: 77, unit: '°F', method: 'digital-meter' });
    expect(res.body.waterTest.derived.salinity).toMatchObject({
      from: 'mS/cm',
      sampleTempC: 25,
      sampleTempSource: 'assumed',
    });
  });

  it('when a value is a typo, then 400 names the field and suggests the likely value; nothing is stored', async () => {
    const res = await p.asKeeper.post(tests, {
      takenAt: hoursAgo(1),
      entries: {
        pH: { value: 80 },
        nitrate: { value: 5, unit: 'ppm' },
        temperature: { value: 250, unit: '°F' },
      },
    });
    expect(res.status).toBe(400);
    expect(res.body.issues).toEqual(
      expect.arrayContaining([
        { path: 'entries.pH.value', message: 'pH 80 is not possible — did you mean 8.0?' },
        { path: 'entries.nitrate.unit', message: 'Choose the unit: mg/L NO3, mg/L NO3-N.' },
        {
          path: 'entries.temperature.value',
          message: expect.stringMatching(
            /^Temperature 250 °F is not possible: readings go from 28\.4–113 °F/,
          ),
        },
      ]),
    );
    expect(await t.dataSource.getRepository(WaterTest).count()).toBe(0);
  });

  it('when the structure is wrong, then 400 lists every path (unknown parameter, no readings, bad time, negative value)', async () => {
    const cases: [unknown, string][] = [
      [{ takenAt: hoursAgo(1), entries: { chlorine: { value: 1 } } }, 'entries'],
      [{ takenAt: hoursAgo(1), entries: {} }, 'entries'],
      [{ takenAt: 'yesterday', entries: { pH: { value: 8 } } }, 'takenAt'],
      [{ takenAt: hoursAgo(1), entries: { phosphate: { value: -1 } } }, 'entries.phosphate.value'],
      [
        { takenAt: hoursAgo(1), entries: { salinity: { value: 35, unit: 'ppt', referenceTempC: 25 } } },
        'entries.salinity.referenceTempC',
      ],
      [{ takenAt: new Date(Date.now() + 2 * HOUR).toISOString(), entries: { pH: { value: 8 } } }, 'takenAt'],
      [
        {
          takenAt: hoursAgo(1),
          entries: { salinity: { value: 1.035, unit: 'SG', method: 'refractometer' } },
        },
        'entries.salinity.value',
      ],
    ];
    for (const [body, path] of cases) {
      const res = await p.asKeeper.post(tests, body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(
        res.body.issues.map((i: { path: string }) => i.path),
        JSON.stringify(res.body),
      ).toContain(path);
    }
  });

  it('when a value is possible but unusual, then it is saved with a warning', async () => {
    const res = await p.asKeeper.post(tests, {
      takenAt: hoursAgo(1),
      entries: { pH: { value: 5.2 }, nitrate: { value: 10, unit: 'mg/L NO3' } },
    });
    expect(res.status).toBe(201);
    expect(res.body.warnings).toEqual([
      {
        path: 'entries.pH.value',
        message: 'pH 5.2 is unusual (most tanks read 5.5–9.5): check the reading.',
      },
    ]);
    expect((await row(res.body.waterTest.id)).pH).toBe(5.2);
  });

  it('when a test has ammonia but no pH or temperature, then free ammonia uses the tank’s last known ones and says which; edits and deletes of that earlier test are followed', async () => {
    const earlier = await p.asKeeper.post(tests, {
      takenAt: hoursAgo(30),
      entries: {
        temperature: { value: 26, unit: '°C' },
        pH: { value: 8.2 },
        salinity: { value: 35, unit: 'PSU' },
      },
    });
    const later = await p.asKeeper.post(tests, {
      takenAt: hoursAgo(2),
      entries: { ammonia: { value: 0.5, unit: 'mg/L NH3' } },
    });
    expect(later.status).toBe(201);
    const expectFree = (pH: number) =>
      freeAmmonia({ total: 0.5, basis: 'NH3', tempC: 26, pH, salinity: 35 }).nh3;
    expect(later.body.waterTest.freeAmmonia).toBeCloseTo(expectFree(8.2), 12);
    expect(later.body.waterTest.derived.freeAmmonia.inputs.pH).toEqual({
      value: 8.2,
      source: 'last-known',
      testId: earlier.body.waterTest.id,
      takenAt: earlier.body.waterTest.takenAt,
    });

    await p.asKeeper.patch(`${tests}/${earlier.body.waterTest.id}`, { entries: { pH: { value: 7.8 } } });
    expect((await row(later.body.waterTest.id)).freeAmmoniaMgL).toBeCloseTo(expectFree(7.8), 12);

    const between = await p.asKeeper.post(tests, { takenAt: hoursAgo(10), entries: { pH: { value: 8.4 } } });
    const refreshed = await row(later.body.waterTest.id);
    expect(refreshed.freeAmmoniaMgL).toBeCloseTo(expectFree(8.4), 12);
    expect(refreshed.derived.freeAmmonia).toMatchObject({
      inputs: {
        pH: { testId: between.body.waterTest.id },
        temperature: { testId: earlier.body.waterTest.id },
      },
    });

    await p.asKeeper.delete(`${tests}/${between.body.waterTest.id}`);
    await p.asKeeper.delete(`${tests}/${earlier.body.waterTest.id}`);
    const alone = await row(later.body.waterTest.id);
    expect(alone.freeAmmoniaMgL).toBeNull();
    expect(alone.derived.freeAmmonia).toEqual({
      value: null,
      reason: expect.stringMatching(/no pH and temperature/),
    });
  });

  it('when the kind of tank changes from salt to fresh, then stored free ammonia is worked out again with no salt', async () => {
    const res = await p.asKeeper.post(tests, {
      takenAt: hoursAgo(3),
      entries: {
        ammonia: { value: 1, unit: 'mg/L NH3' },
        pH: { value: 8.0 },
        temperature: { value: 25, unit: '°C' },
      },
    });
    expect(res.body.waterTest.derived.freeAmmonia.inputs.salinity).toMatchObject({
      source: 'assumed',
      detail: expect.stringMatching(/salinity range/),
    });
    const salty = (await row(res.body.waterTest.id)).freeAmmoniaMgL!;
    await p.asKeeper.patch(`/api/clubs/${p.club.id}/tanks/${tankId}`, { systemType: 'tropical-freshwater' });
    const stored = await row(res.body.waterTest.id);
    expect(stored.freeAmmoniaMgL).toBeCloseTo(
      freeAmmonia({ total: 1, basis: 'NH3', tempC: 25, pH: 8.0, salinity: 0 }).nh3,
      12,
    );
    expect(stored.freeAmmoniaMgL).not.toBeCloseTo(salty, 6);
    expect(stored.derived.freeAmmonia).toMatchObject({
      inputs: { salinity: { value: 0, source: 'assumed', detail: 'fresh water' } },
    });
  });

  it('when a test is edited, then named entries are replaced, null removes one, and the rest stay', async () => {
    const created = await p.asKeeper.post(tests, {
      takenAt: hoursAgo(5),
      entries: { pH: { value: 8.1 }, nitrate: { value: 20, unit: 'mg/L NO3' }, calcium: { value: 420 } },
      note: 'after feeding',
    });
    const id = created.body.waterTest.id as string;
    const res = await p.asKeeper.patch(`${tests}/${id}`, {
      takenAt: hoursAgo(4),
      entries: { nitrate: { value: 5, unit: 'mg/L NO3-N' }, calcium: null },
    });
    expect(res.status).toBe(200);
    const stored = await row(id);
    expect(stored.pH).toBe(8.1);
    expect(stored.nitrateMgL).toBeCloseTo(convert(5, 'mg/L NO3-N', 'mg/L NO3'), 10);
    expect(stored.calciumMgL).toBeNull();
    expect(stored.entries).not.toHaveProperty('calcium');
    expect(stored.note).toBe('after feeding');
    expect(stored.updatedAt.getTime()).toBeGreaterThan(stored.createdAt.getTime());

    const empty = await p.asKeeper.patch(`${tests}/${id}`, { entries: { pH: null, nitrate: null } });
    expect(empty.status).toBe(400);
    expect(empty.body.issues).toEqual([
      { path: 'entries', message: 'Keep at least one reading, or delete the test.' },
    ]);
    const typo = await p.asKeeper.patch(`${tests}/${id}`, { entries: { pH: { value: 81 } } });
    expect(typo.body.issues).toEqual([
      { path: 'entries.pH.value', message: 'pH 81 is not possible — did you mean 8.1?' },
    ]);
    expect((await p.asMentor.patch(`${tests}/${id}`, { note: 'mentor was here' })).status).toBe(403);
  });

  it('when a test is deleted by its owner, then it is gone for good and the deletion is audited; others get 403', async () => {
    const created = await p.asKeeper.post(tests, { takenAt: hoursAgo(1), entries: { pH: { value: 8.1 } } });
    const id = created.body.waterTest.id as string;
    expect((await p.asMentor.delete(`${tests}/${id}`)).status).toBe(403);
    expect((await p.asKeeper.delete(`${tests}/${id}`)).status).toBe(204);
    expect((await p.asKeeper.get(`${tests}/${id}`)).status).toBe(404);
    expect(await t.dataSource.getRepository(WaterTest).countBy({ id })).toBe(0);
    expect(
      await t.dataSource.getRepository(AuditEvent).countBy({ action: 'water-test.deleted', targetId: id }),
    ).toBe(1);
  });

  it('when listing, then newest first, page by page with a cursor; a forged cursor is a 400', async () => {
    for (let h = 1; h <= 5; h++)
      await p.asKeeper.post(tests, { takenAt: hoursAgo(h), entries: { pH: { value: 8 + h / 10 } } });
    const seen: number[] = [];
    let cursor: string | null = null;
    let pages = 0;
    do {
      const res = await p.asMentor.get(`${tests}?limit=2${cursor ? `&before=${cursor}` : ''}`);
      expect(res.status).toBe(200);
      seen.push(...res.body.items.map((i: { values: { pH: number } }) => i.values.pH));
      cursor = res.body.nextCursor;
      pages++;
    } while (cursor);
    expect(pages).toBe(3);
    expect(seen).toEqual([8.1, 8.2, 8.3, 8.4, 8.5]);
    expect((await p.asKeeper.get(`${tests}?before=bm90LWEtY3Vyc29y`)).status).toBe(400);
    expect(
      (await p.asKeeper.get(`${tests}?from=${encodeURIComponent(hoursAgo(2.5))}`)).body.items,
    ).toHaveLength(2);
  });
});
