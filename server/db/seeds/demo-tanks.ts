import type { EntityManager } from 'typeorm';
import { createTankEventSchema } from '@shared/schemas/tank-event.schema';
import { createLivestockSchema, createTankSchema, type CreateTankInput } from '@shared/schemas/tank.schema';
import { createWaterTestSchema } from '@shared/schemas/water-test.schema';
import { judgeConcerns } from '../../modules/concerns';
import {
  addLivestock,
  createTank,
  createTankEvent,
  createWaterTest,
  TankChanges,
  type Tank,
} from '../../modules/tanks';
import { DAY_MS } from '@shared/care/time';

/**
 * Invented histories for the demo club, written through the same services the API uses, so derived values and
 * concerns are exactly what a real keeper would see. Numbers are shaped like a typical course, not taken from anyone.
 */
/** An evening-ish moment `daysAgo` days back, never in the future (tests taken later than now are refused). */
const at = (daysAgo: number) => new Date(Date.now() - daysAgo * DAY_MS - 3 * 3_600_000).toISOString();
const round = (n: number, dp = 2) => Math.round(n * 10 ** dp) / 10 ** dp;
const bump = (day: number, start: number, peak: number, end: number, height: number) =>
  day <= start || day >= end
    ? 0
    : day <= peak
      ? (height * (day - start)) / (peak - start)
      : (height * (end - day)) / (end - peak);

type Entries = Record<string, unknown>;

/** The demo tanks are judged like any tank, so their concerns are real; nobody is notified of a seed. */
const deps = { tankChanges: new TankChanges(judgeConcerns) };

async function tank(
  tx: EntityManager,
  clubId: string,
  ownerId: string,
  input: CreateTankInput,
): Promise<Tank> {
  return createTank(tx, clubId, ownerId, createTankSchema.parse(input));
}
async function test(
  tx: EntityManager,
  t: Tank,
  ownerId: string,
  takenAt: string,
  entries: Entries,
  note = '',
): Promise<void> {
  await createWaterTest(tx, deps, t, createWaterTestSchema.parse({ takenAt, entries, note }), ownerId);
}

/** A seahorse tank four weeks into a fishless cycle: ammonia came and went, nitrite is falling, nitrate is building. */
async function cyclingSeahorseTank(tx: EntityManager, clubId: string, ownerId: string): Promise<void> {
  const t = await tank(tx, clubId, ownerId, {
    name: 'Seagrass corner',
    systemType: 'seahorse',
    phase: 'cycling',
    setUpOn: at(29).slice(0, 10),
    volume: {
      source: 'dimensions',
      shape: 'rectangle',
      unit: 'cm',
      length: 80,
      width: 45,
      height: 60,
      fillHeight: 55,
      displacementFraction: 0.1,
    },
    equipmentNotes:
      'Canister filter, 150 W heater on a controller, skimmer, LED light on a timer. All on an RCD-protected socket.',
  });
  for (let day = 28; day >= 0; day -= day > 10 ? 1 : 2) {
    const d = 28 - day;
    await test(
      tx,
      t,
      ownerId,
      at(day),
      {
        temperature: { value: 24 + ((d % 3) - 1) * 0.2, unit: '°C', method: 'digital-meter' },
        salinity: { value: 1.0245, unit: 'SG', method: 'refractometer', referenceTempC: 25, sampleTempC: 25 },
        pH: { value: round(8.1 - d * 0.004, 2), method: 'liquid-kit' },
        ammonia: {
          value: round(Math.max(0, bump(d, 0, 7, 17, 2)), 2),
          unit: 'mg/L NH3',
          method: 'liquid-kit',
        },
        nitrite: {
          value: round(Math.max(0, bump(d, 6, 17, 32, 2.5)), 2),
          unit: 'mg/L NO2',
          method: 'liquid-kit',
        },
        nitrate: { value: round(Math.max(0, (d - 10) * 1.2), 1), unit: 'mg/L NO3', method: 'liquid-kit' },
      },
      d === 0 ? 'Dosed bottled ammonia (no surfactants) to 2 ppm to start the cycle.' : '',
    );
  }
}

/** An established fish-only tank whose nitrate has crept up between too few water changes. */
async function nitrateCreepTank(tx: EntityManager, clubId: string, ownerId: string): Promise<void> {
  const t = await tank(tx, clubId, ownerId, {
    name: 'Reef-edge fish room',
    systemType: 'marine-fish-only',
    phase: 'established',
    setUpOn: at(120).slice(0, 10),
    volume: { source: 'entered', value: 300, unit: 'L' },
    equipmentNotes: 'Sump with return pump, two heaters, protein skimmer.',
  });
  await addLivestock(
    tx,
    deps,
    t,
    createLivestockSchema.parse({
      speciesCommonName: 'Common clownfish (captive-bred)',
      count: 2,
      addedOn: at(90).slice(0, 10),
      source: 'Club swap night',
      quarantineNotes: '4 weeks in the quarantine tub, ate well.',
    }),
    ownerId,
  );
  for (let week = 8; week >= 0; week--) {
    await test(tx, t, ownerId, at(week * 7 + 1), {
      temperature: { value: 25.2, unit: '°C', method: 'digital-meter' },
      salinity: { value: 34.5, unit: 'PSU', method: 'refractometer' },
      pH: { value: 8.15, method: 'liquid-kit' },
      ammonia: { value: 0, unit: 'mg/L NH3', method: 'liquid-kit' },
      nitrite: { value: 0, unit: 'mg/L NO2', method: 'liquid-kit' },
      nitrate: { value: 12 + (8 - week) * 5, unit: 'mg/L NO3', method: 'liquid-kit' },
    });
    if (week % 4 === 0 && week > 0) {
      await createTankEvent(
        tx,
        t,
        createTankEventSchema.parse({
          kind: 'water-change',
          occurredAt: at(week * 7),
          details: { percent: 10, sourceWater: 'mixed-salt', sourceNitrate: { value: 0, unit: 'mg/L NO3' } },
        }),
        ownerId,
      );
    }
  }
  await createTankEvent(
    tx,
    t,
    createTankEventSchema.parse({
      kind: 'observation',
      occurredAt: at(2),
      details: {
        animal: 'Clownfish',
        feedingResponse: 'normal',
        breathing: 'normal',
        colour: 'normal',
        fins: 'normal',
        hiding: 'normal',
        spots: 'none',
        text: 'Both out and about, eating frozen mysis.',
      },
    }),
    ownerId,
  );
}

/** A calm freshwater tank that is simply overdue for its weekly tests. */
async function quietFreshwaterTank(tx: EntityManager, clubId: string, ownerId: string): Promise<void> {
  const t = await tank(tx, clubId, ownerId, {
    name: 'Living-room community',
    systemType: 'tropical-freshwater',
    phase: 'established',
    volume: { source: 'entered', value: 25, unit: 'US gal' },
  });
  for (const day of [24, 17, 10]) {
    await test(tx, t, ownerId, at(day), {
      temperature: { value: 77, unit: '°F', method: 'digital-meter' },
      pH: { value: 7.2, method: 'strip' },
      ammonia: { value: 0, unit: 'mg/L NH3', method: 'strip' },
      nitrite: { value: 0, unit: 'mg/L NO2', method: 'strip' },
      nitrate: { value: 10, unit: 'mg/L NO3', method: 'strip' },
    });
  }
}

export async function seedDemoTanks(
  tx: EntityManager,
  clubId: string,
  people: Record<string, string>,
): Promise<void> {
  await cyclingSeahorseTank(tx, clubId, people['jonah@harbourlight.example']!);
  await nitrateCreepTank(tx, clubId, people['ines@harbourlight.example']!);
  await quietFreshwaterTank(tx, clubId, people['wendell@harbourlight.example']!);
}
