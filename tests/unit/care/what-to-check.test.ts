import { describe, expect, it } from 'vitest';
import {
  CHECK_KEYS,
  SEAHORSE_LARGE_PROFILE,
  SOURCES,
  TROPICAL_FRESHWATER_PROFILE,
  indexTests,
  whatToCheckNext,
  type CheckKey,
  type ObservationInput,
  type WaterTestInput,
  type WhatToCheckInput,
} from '@shared/care';
import { day, test } from './helpers';
import { forbiddenWordsIn, seen } from './observations/helpers';

// Rules and thresholds: common practice, no source, except where an item names Koldewey (2005),
// Syngnathid Husbandry in Public Aquariums (seahorse feeding, from memory) or Noga (2010), Fish Disease:
// Diagnosis and Treatment (breathing and the water first, from memory). Swing limits are the trend rules'
// (2 °C in a day, 1 salinity unit in a week) and the daily dosing limits (1 dKH, 20 mg/L Ca, 100 mg/L Mg).

const NOW = 40; // days after T0

/** A seahorse tank with every figure in its ideal band: basics daily, alkalinity/calcium/magnesium weekly. */
function perfectSeahorseTests(
  over: (d: number) => Partial<WaterTestInput['values']> = () => ({}),
): WaterTestInput[] {
  const tests: WaterTestInput[] = [];
  for (let d = 0; d <= NOW; d++) {
    const weekly = d % 7 === NOW % 7 ? { alkalinity: 9, calcium: 420, magnesium: 1300 } : {};
    tests.push(
      test(`t${d}`, d - 0.1, {
        temperature: 23.5,
        salinity: 33,
        pH: 8.2,
        ammonia: 0,
        nitrite: 0,
        nitrate: 5,
        ...weekly,
        ...over(d),
      }),
    );
  }
  return tests;
}

function input(over: Partial<WhatToCheckInput> = {}): WhatToCheckInput {
  return {
    observations: [],
    profile: SEAHORSE_LARGE_PROFILE,
    tank: { systemType: 'seahorse', phase: 'established', hasLivestock: true, createdAt: day(0) },
    tests: perfectSeahorseTests(),
    now: day(NOW),
    ...over,
  };
}

const keys = (i: WhatToCheckInput) => whatToCheckNext(i).items.map((x) => x.key);
const item = (i: WhatToCheckInput, key: CheckKey) => whatToCheckNext(i).items.find((x) => x.key === key);
const notEating: ObservationInput[] = [
  seen(NOW - 1.2, { animal: 'Yellow seahorse', feedingResponse: 'ignored-food' }),
  seen(NOW - 0.2, { animal: 'Yellow seahorse', feedingResponse: 'ignored-food' }),
];

describe('whatToCheckNext with perfect readings and a seahorse not eating', () => {
  const result = whatToCheckNext(input({ observations: notEating }));

  it('still leads somewhere: feeding first, then how the day runs, the flow, watching again, and the mentor and vet', () => {
    expect(result.items.map((x) => x.key)).toEqual([
      'feeding',
      'temperature-through-the-day',
      'flow-and-equipment',
      'watch-and-log',
      'ask-mentor-and-vet',
    ]);
    expect(result.findings.map((f) => [f.rule, f.severity])).toEqual([['observation.not-eating', 'urgent']]);
  });

  it('says why, in this tank’s words: the profile’s food note and the seahorse gut (Koldewey 2005)', () => {
    const feeding = result.items[0]!;
    expect(feeding.title).toBe('Watch a whole feeding closely');
    expect(feeding.why).toContain('Yellow seahorse: not eating as usual.');
    expect(feeding.why).toContain(SEAHORSE_LARGE_PROFILE.readinessNotes!.food!);
    expect(feeding.why).toContain('Seahorses have no true stomach');
    expect(feeding.provenance).toBe(SOURCES.koldewey2005);
  });

  it('asks for no test that was done today', () => {
    expect(
      result.items.some(
        (x) =>
          x.key === 'ammonia-nitrite-today' ||
          x.key === 'not-tested-lately' ||
          x.key === 'water-out-of-range',
      ),
    ).toBe(false);
  });
});

describe('whatToCheckNext rules', () => {
  it('oxygen and the surface come first when breathing is not as usual, with warm water noted (Noga 2010)', () => {
    const obs = [seen(NOW - 0.1, { breathing: 'fast', checks: { stayingAtSurface: true } })];
    const i = input({
      observations: obs,
      tests: perfectSeahorseTests((d) => (d === NOW ? { temperature: 26 } : {})),
    });
    expect(keys(i)[0]).toBe('oxygen-and-surface');
    expect(item(i, 'oxygen-and-surface')!.why).toContain('warm water holds less oxygen');
    expect(item(i, 'oxygen-and-surface')!.provenance).toBe(SOURCES.noga2010);
    expect(
      item(input({ observations: [seen(NOW - 0.1, { breathing: 'fast' })] }), 'oxygen-and-surface')!.why,
    ).not.toContain('warm');
  });

  it('water out of range: the latest values outside the ideal band, worst first; older than two weeks do not count', () => {
    const tests = perfectSeahorseTests((d) => (d === NOW ? { nitrate: 30, pH: 7.95 } : {}));
    expect(item(input({ tests }), 'water-out-of-range')!.title).toBe(
      'Deal with the water first: Nitrate 30 mg/L NO3 (today, high) and pH 7.95 (today, low)',
    );
    const old = [test('x', NOW - 20, { calcium: 250 })];
    expect(item(input({ tests: old }), 'water-out-of-range')).toBeUndefined();
  });

  it('ammonia and nitrite today: asked when animals show signs and neither was tested in the last day', () => {
    const tests = perfectSeahorseTests().filter((t) => Date.parse(t.takenAt) < Date.parse(day(NOW - 2)));
    const i = input({ tests, observations: [seen(NOW - 0.1, { colour: 'darker' })] });
    expect(item(i, 'ammonia-nitrite-today')).toMatchObject({
      parameters: ['ammonia', 'nitrite', 'pH', 'temperature'],
    });
    expect(item(i, 'ammonia-nitrite-today')!.why).toMatch(/^Neither has been tested since the signs began/);
    expect(item(input({ tests }), 'ammonia-nitrite-today')).toBeUndefined();
  });

  it('swings: temperature within a day, salinity within a week, alkalinity faster than a day’s dosing limit', () => {
    const tests = [
      ...perfectSeahorseTests(),
      test('warm', NOW - 0.5, { temperature: 26 }),
      test('salty', NOW - 3, { salinity: 34.5 }),
      test('alk-low', NOW - 0.05, { alkalinity: 7.5 }),
    ];
    const swing = item(input({ tests }), 'swings')!;
    expect(swing.why).toContain('Temperature moved 2.5 °C within a day');
    expect(swing.why).toContain('Salinity moved 1.5 in a week');
    expect(swing.why).toContain('Alkalinity fell 1.5 dKH in 1 day(s)');
    expect(item(input(), 'swings')).toBeUndefined();
  });

  it('temperature through the day: asked with signs and one reading a day; not with two a day', () => {
    const obs = [seen(NOW - 0.1, { hiding: 'more-than-usual' })];
    expect(item(input({ observations: obs }), 'temperature-through-the-day')).toMatchObject({
      parameters: ['temperature'],
    });
    const twice = [...perfectSeahorseTests(), test('evening', NOW - 0.6, { temperature: 23.8 })];
    expect(item(input({ observations: obs, tests: twice }), 'temperature-through-the-day')).toBeUndefined();
  });

  it('not tested lately: overdue by the profile’s cadence, and with signs anything older than a week, rare ones named', () => {
    // Magnesium last tested 40 days ago (cadence 30); calcium 10 days ago (not due, but signs).
    const tests = perfectSeahorseTests((d) => ({
      alkalinity: 9,
      calcium: d === NOW - 10 ? 420 : undefined,
      magnesium: d === 0 ? 1300 : undefined,
    })).map((t) => ({
      ...t,
      values: Object.fromEntries(Object.entries(t.values).filter(([, v]) => v !== undefined)),
    }));
    const quiet = item(input({ tests }), 'not-tested-lately')!;
    expect(quiet.parameters).toEqual(['magnesium']);
    expect(quiet.title).toBe('Test what has not been tested lately: magnesium (40 days ago, every 30 days)');
    const withSigns = item(
      input({ tests, observations: [seen(NOW - 0.1, { fins: 'frayed' })] }),
      'not-tested-lately',
    )!;
    expect(withSigns.parameters).toEqual(['calcium', 'magnesium']);
    expect(withSigns.title).toBe(
      'Test what has not been tested lately: calcium (10 days ago) and magnesium (40 days ago, every 30 days)',
    );
    expect(withSigns.why).toBe(
      'A problem nobody tests for stays invisible. Calcium and magnesium are tested rarely, so they drift unnoticed.',
    );
  });

  it('not tested lately: a parameter never tested says so', () => {
    const tests = perfectSeahorseTests().map((t) => ({
      ...t,
      values: { ...t.values, magnesium: undefined },
    }));
    expect(item(input({ tests }), 'not-tested-lately')!.title).toContain('magnesium (never)');
  });

  it('flow and equipment: gentle flow and holding places for seahorses; the filter and heater for fish', () => {
    const obs = [seen(NOW - 0.1, { buoyancy: 'tilted' })];
    const seahorse = item(input({ observations: obs }), 'flow-and-equipment')!;
    expect(seahorse.title).toBe('Check the flow is gentle and they have places to hold on');
    expect(seahorse.why).toContain('Seahorses swim weakly');
    const fish = item(
      input({
        observations: obs,
        profile: TROPICAL_FRESHWATER_PROFILE,
        tank: { systemType: 'tropical-freshwater', phase: 'established' },
      }),
      'flow-and-equipment',
    )!;
    expect(fish.title).toBe('Check the filter, heater and pumps are running as usual');
  });

  it('recent changes: the last three days, oldest first, nothing later than now', () => {
    const recentChanges = [
      { kind: 'supplement-dose' as const, occurredAt: day(NOW - 0.5), summary: 'Calcium 10 mL' },
      { kind: 'water-change' as const, occurredAt: day(NOW - 2) },
      { kind: 'equipment-change' as const, occurredAt: day(NOW - 5), summary: 'New pump' },
      { kind: 'feeding-note' as const, occurredAt: day(NOW + 1) },
    ];
    const i = input({ observations: notEating, recentChanges });
    expect(item(i, 'recent-changes')!.title).toBe(
      'Go over what changed in the last 3 days: water change on 2025-04-08; dose on 2025-04-09 (Calcium 10 mL)',
    );
    expect(item(input({ recentChanges }), 'recent-changes')).toBeUndefined();
  });

  it('new animals and quarantine: arrivals in the last 30 days, asking about quarantine when none is recorded', () => {
    const livestock = [
      { id: 'l1', name: 'Yellow seahorse', addedOn: day(NOW - 5).slice(0, 10), quarantineNotes: '' },
      {
        id: 'l2',
        name: 'Pipefish',
        addedOn: day(NOW - 12),
        quarantineNotes: 'Four weeks in the spare tank.',
      },
      { id: 'l3', name: 'Old timer', addedOn: day(NOW - 60) },
      { id: 'l4', name: 'Gone', addedOn: day(NOW - 3), removedOn: day(NOW - 1) },
    ];
    const found = item(input({ observations: notEating, livestock }), 'new-animals-and-quarantine')!;
    expect(found.title).toBe(
      'Think about the newest animals: Yellow seahorse (5 days ago), Pipefish (12 days ago)',
    );
    expect(found.why).toContain(
      `No quarantine is recorded for Yellow seahorse. ${SEAHORSE_LARGE_PROFILE.readinessNotes!.quarantine!} Ask your mentor before adding more.`,
    );
    expect(
      item(input({ observations: notEating, livestock: livestock.slice(1) }), 'new-animals-and-quarantine')!
        .why,
    ).not.toContain('No quarantine');
    expect(item(input({ livestock }), 'new-animals-and-quarantine')).toBeUndefined();
  });

  it('tank mates: hiding, torn fins or wounds', () => {
    expect(
      item(input({ observations: [seen(NOW - 0.1, { animal: 'Molly', fins: 'frayed' })] }), 'tank-mates')!
        .why,
    ).toMatch(/^Molly: /);
    expect(
      item(input({ observations: [seen(NOW - 0.1, { checks: { wounds: true } })] }), 'tank-mates'),
    ).toBeDefined();
    expect(item(input({ observations: notEating }), 'tank-mates')).toBeUndefined();
  });

  it('with no worrying signs and every test on time, only the mentor and vet remain', () => {
    const usual = [seen(NOW - 0.1, { feedingResponse: 'eager', breathing: 'normal', spots: 'none' })];
    expect(keys(input({ observations: usual }))).toEqual(['ask-mentor-and-vet']);
    expect(keys(input())).toEqual(['ask-mentor-and-vet']);
  });

  it('always ends with the caution to ask the mentor and a veterinarian who knows aquatic animals', () => {
    for (const i of [input(), input({ observations: notEating }), input({ tests: [] })]) {
      const last = whatToCheckNext(i).items.at(-1)!;
      expect(last.key).toBe('ask-mentor-and-vet');
      expect(last.title).toBe('Ask your mentor, and a veterinarian who knows aquatic animals');
      expect(last.why).toContain('give no medicine without a veterinarian’s advice');
    }
  });

  it('lists items in the documented order, each once, never names an illness or a medicine, and takes an indexed history alike', () => {
    const everything: ObservationInput[] = [
      seen(NOW - 0.3, {
        animal: 'Yellow seahorse',
        breathing: 'laboured',
        feedingResponse: 'ignored-food',
        hiding: 'always',
        bodyCondition: 'very-thin',
      }),
      seen(NOW - 1.3, {
        animal: 'Yellow seahorse',
        feedingResponse: 'spat-out',
        spots: 'dusty-film',
        checks: { stayingAtSurface: true, scratching: true, wounds: true },
      }),
      seen(NOW - 0.2, {
        animal: 'Pipefish',
        affected: 'all',
        fins: 'frayed',
        colour: 'patchy',
        buoyancy: 'floating',
      }),
    ];
    // Ammonia not tested for three days, magnesium never, nitrate high in the latest test, a warm evening.
    const tests = [
      ...perfectSeahorseTests((d) => ({
        magnesium: undefined,
        ...(d > NOW - 3 ? { ammonia: undefined } : {}),
      })),
      test('w', NOW - 0.05, { temperature: 26.5, nitrate: 40 }),
    ];
    const i = input({
      observations: everything,
      tests,
      livestock: [{ id: 'l1', name: 'Pipefish', addedOn: day(NOW - 4) }],
      recentChanges: [{ kind: 'water-change', occurredAt: day(NOW - 1) }],
    });
    const result = whatToCheckNext(i);
    const order = result.items.map((x) => x.key);
    // Everything but "temperature through the day", which gives way to a swing already seen.
    expect(order).toEqual(CHECK_KEYS.filter((k) => k !== 'temperature-through-the-day'));
    const text = result.items.flatMap((x) => [x.title, x.why]).join(' ');
    expect(forbiddenWordsIn(text)).toEqual([]);
    expect(whatToCheckNext({ ...i, tests: indexTests(tests) })).toEqual(result);
  });
});
