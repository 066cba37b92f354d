import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { salinityFromSpecificGravity } from '@shared/chemistry/specific-gravity';
import { convert } from '@shared/chemistry/units';
import { TankEvent } from '@server/modules/tanks/tank-event.entity';
import { resetDatabase } from '@tests/helpers/db';
import { createTestApp, type TestApp } from '@tests/helpers/test-app';
import { makeTankVia, tankPeople } from './people';

const HOUR = 3_600_000;
const hoursAgo = (h: number) => new Date(Date.now() - h * HOUR).toISOString();

describe('timeline events and observations', () => {
  let t: TestApp;
  let p: Awaited<ReturnType<typeof tankPeople>>;
  let tank: string;
  let events: string;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());
  beforeEach(async () => {
    await resetDatabase(t.dataSource);
    p = await tankPeople(t);
    tank = `/api/clubs/${p.club.id}/tanks/${(await makeTankVia(p.asKeeper, p.club.id)).id}`;
    events = `${tank}/events`;
  });

  it('when a water change is logged as a percentage with the new water measured, then litres, share and canonical values are worked out', async () => {
    const res = await p.asKeeper.post(events, {
      kind: 'water-change',
      occurredAt: hoursAgo(3),
      note: 'Siphoned the sand too',
      details: {
        percent: 20,
        sourceWater: 'mixed-salt',
        sourceNitrate: { value: 1, unit: 'mg/L NO3-N' },
        sourceSalinity: { value: 1.025, unit: 'SG', method: 'refractometer' },
      },
    });
    expect(res.status).toBe(201);
    expect(res.body.event).toMatchObject({
      kind: 'water-change',
      note: 'Siphoned the sand too',
      livestockId: null,
      photos: [],
    });
    expect(res.body.event.computed.litres).toBeCloseTo(60, 10);
    expect(res.body.event.computed.fraction).toBeCloseTo(0.2, 10);
    expect(res.body.event.computed.sourceNitrateMgL).toBeCloseTo(convert(1, 'mg/L NO3-N', 'mg/L NO3'), 10);
    expect(res.body.event.computed.sourceSalinity).toBeCloseTo(
      salinityFromSpecificGravity({ sg: 1.025, sampleTempC: 25, referenceTempC: 25 }),
      9,
    );
  });

  it('when a water change gives both litres and percent, or more than the tank holds, then 400 on details', async () => {
    const both = await p.asKeeper.post(events, {
      kind: 'water-change',
      occurredAt: hoursAgo(1),
      details: { volumeL: 30, percent: 10, sourceWater: 'ro-di-fresh' },
    });
    expect(both.status).toBe(400);
    expect(both.body.issues).toEqual([
      { path: 'details.volumeL', message: 'Give either the litres changed or the percentage, not both.' },
    ]);
    const huge = await p.asKeeper.post(events, {
      kind: 'water-change',
      occurredAt: hoursAgo(1),
      details: { volumeL: 400, sourceWater: 'tap-conditioned' },
    });
    expect(huge.status).toBe(400);
    expect(huge.body.issues[0].path).toBe('details.volumeL');
    const typo = await p.asKeeper.post(events, {
      kind: 'water-change',
      occurredAt: hoursAgo(1),
      details: {
        volumeL: 30,
        sourceWater: 'natural-sea-water',
        sourceNitrate: { value: 5000, unit: 'mg/L NO3' },
      },
    });
    expect(typo.body.issues[0].path).toBe('details.sourceNitrate.value');
  });

  it('when doses, feeding and equipment changes are logged, then each is stored with its details; a wrong kind or field is a 400', async () => {
    const posts = [
      {
        kind: 'supplement-dose',
        occurredAt: hoursAgo(5),
        details: { product: 'Two-part calcium', amount: 12, unit: 'mL' },
      },
      {
        kind: 'feeding-note',
        occurredAt: hoursAgo(4),
        details: { food: 'frozen brine shrimp', amount: 'half a cube' },
      },
      {
        kind: 'equipment-change',
        occurredAt: hoursAgo(2),
        details: { equipment: 'return pump', change: 'replaced' },
      },
    ];
    for (const body of posts) expect((await p.asKeeper.post(events, body)).status).toBe(201);
    const list = await p.asMentor.get(events);
    expect(list.body.items.map((e: { kind: string }) => e.kind)).toEqual([
      'equipment-change',
      'feeding-note',
      'supplement-dose',
    ]);
    expect((await p.asMentor.get(`${events}?kind=feeding-note`)).body.items).toHaveLength(1);

    const wrong = await p.asKeeper.post(events, { kind: 'party', occurredAt: hoursAgo(1), details: {} });
    expect(wrong.status).toBe(400);
    expect(wrong.body.issues[0].path).toBe('kind');
    const extra = await p.asKeeper.post(events, {
      kind: 'supplement-dose',
      occurredAt: hoursAgo(1),
      details: { product: 'x', amount: 1, unit: 'cups', colour: 'red' },
    });
    expect(extra.body.issues.map((i: { path: string }) => i.path).sort()).toEqual([
      'details',
      'details.unit',
    ]);
  });

  it('when an observation is recorded, then its checklist and scales are kept; an empty one or an animal from another tank is refused', async () => {
    const goby = await p.asKeeper.post(`${tank}/livestock`, {
      speciesCommonName: 'Invented watchman goby',
      count: 1,
      addedOn: '2025-03-01',
    });
    const body = {
      kind: 'observation',
      occurredAt: hoursAgo(1),
      details: {
        animal: 'the goby',
        livestockId: goby.body.livestock.id,
        feedingResponse: 'slow',
        breathing: 'fast',
        breathsPerMinute: 120,
        spots: 'fine-white-grains',
        fins: 'clamped',
        hiding: 'more-than-usual',
        checks: { scratching: true, lethargic: false },
        text: 'Rubbing on the rock work after lights out.',
      },
    };
    const res = await p.asKeeper.post(events, body);
    expect(res.status).toBe(201);
    const stored = await t.dataSource.getRepository(TankEvent).findOneByOrFail({ id: res.body.event.id });
    expect(stored.details).toEqual(body.details);

    const empty = await p.asKeeper.post(events, {
      kind: 'observation',
      occurredAt: hoursAgo(1),
      details: { animal: 'the goby' },
    });
    expect(empty.body.issues).toEqual([{ path: 'details', message: 'Record at least one thing you saw.' }]);
    const badCheck = await p.asKeeper.post(events, {
      kind: 'observation',
      occurredAt: hoursAgo(1),
      details: { checks: { sneezing: true } },
    });
    expect(badCheck.body.issues[0].path).toBe('details.checks');

    const elsewhere = await makeTankVia(p.asKeeper, p.club.id, {
      name: 'Quarantine tank',
      systemType: 'marine-fish-only',
      volume: { source: 'entered', value: 40 },
    });
    const stray = await p.asKeeper.post(`/api/clubs/${p.club.id}/tanks/${elsewhere.id}/events`, {
      ...body,
      details: { ...body.details },
    });
    expect(stray.status).toBe(400);
    expect(stray.body.issues).toEqual([
      { path: 'details.livestockId', message: 'That livestock entry is not in this tank.' },
    ]);
  });

  it('when an event is edited, then new details are checked against its own kind; deleting removes it', async () => {
    const created = await p.asKeeper.post(events, {
      kind: 'supplement-dose',
      occurredAt: hoursAgo(3),
      details: { product: 'Iodine', amount: 2, unit: 'drops' },
    });
    const url = `${events}/${created.body.event.id}`;
    const edit = await p.asKeeper.patch(url, {
      details: { product: 'Iodine', amount: 3, unit: 'drops' },
      note: 'Counted again',
    });
    expect(edit.status).toBe(200);
    expect(edit.body.event).toMatchObject({
      details: { amount: 3 },
      note: 'Counted again',
      kind: 'supplement-dose',
    });
    const bad = await p.asKeeper.patch(url, { details: { food: 'pellets' } });
    expect(bad.status).toBe(400);
    expect(bad.body.issues.map((i: { path: string }) => i.path)).toEqual(
      expect.arrayContaining(['details.product', 'details.amount', 'details.unit']),
    );
    expect((await p.asKeeper.patch(url, { kind: 'feeding-note' })).status).toBe(400);
    expect((await p.asMentor.delete(url)).status).toBe(403);
    expect((await p.asKeeper.delete(url)).status).toBe(204);
    expect(await t.dataSource.getRepository(TankEvent).countBy({ id: created.body.event.id })).toBe(0);
  });

  it('when the timeline is read, then tests and events interleave newest first across pages', async () => {
    await p.asKeeper.post(`${tank}/water-tests`, { takenAt: hoursAgo(6), entries: { pH: { value: 8.1 } } });
    await p.asKeeper.post(events, {
      kind: 'feeding-note',
      occurredAt: hoursAgo(5),
      details: { food: 'pellets' },
    });
    await p.asKeeper.post(`${tank}/water-tests`, { takenAt: hoursAgo(4), entries: { pH: { value: 8.2 } } });
    await p.asKeeper.post(events, {
      kind: 'observation',
      occurredAt: hoursAgo(3),
      details: { colour: 'faded' },
    });
    await p.asKeeper.post(`${tank}/water-tests`, { takenAt: hoursAgo(2), entries: { pH: { value: 8.3 } } });
    const first = await p.asMentor.get(`${tank}/timeline?limit=3`);
    expect(first.status).toBe(200);
    const second = await p.asMentor.get(`${tank}/timeline?limit=3&before=${first.body.nextCursor}`);
    expect(second.body.nextCursor).toBeNull();
    const items = [...first.body.items, ...second.body.items];
    expect(items.map((i: { type: string }) => i.type)).toEqual([
      'water-test',
      'event',
      'water-test',
      'event',
      'water-test',
    ]);
    expect(items[0].waterTest.values.pH).toBe(8.3);
    expect(items[1].event.kind).toBe('observation');
    const times = items.map((i: { at: string }) => Date.parse(i.at));
    expect([...times].sort((a, b) => b - a)).toEqual(times);
    expect((await p.asNeighbour.get(`${tank}/timeline`)).status).toBe(403);
  });
});
