import { describe, expect, it } from 'vitest';
import {
  BUILT_IN_PROFILES,
  cycleStage,
  evaluateReading,
  indexTests,
  PARAMETER_KEYS,
  sortByTakenAt,
  type CycleStageOptions,
  type EvaluationContext,
  type ParameterKey,
  type TankPhase,
  type WaterTestInput,
} from '@shared/care';
import { seededRandom, shuffled } from './helpers';
import { generateHistory, type HistoryOptions } from './histories';
import { referenceCycleStage } from './reference/cycle-stage';
import { referenceEvaluateReading } from './reference/evaluate-reading';
import { seriesOf as referenceSeries, sortByTakenAt as referenceSort } from './reference/readings';

// Oracle tests: the indexed engine must answer exactly as the straightforward one it replaced (kept in
// ./reference), on many seeded histories. Same seeds on every run, so a failure names a reproducible case.

const DAY = 86_400_000;
const END = Date.parse('2026-06-01T08:00:00.000Z');
const HISTORIES = 40;

function optionsFor(seed: number): HistoryOptions {
  const rand = seededRandom(seed * 7919);
  return {
    days: 3 + Math.floor(rand() * 362),
    endMs: END,
    testsPerDay: [0.3, 1, 1, 2.5][Math.floor(rand() * 4)],
    cycle: rand() < 0.5,
    gaps: rand() * 0.4,
  };
}

/** A reading with a random subset of parameters at `ms`; ammonia often without pH or temperature. */
function readingAt(rand: () => number, id: string, ms: number): WaterTestInput {
  const values: Partial<Record<ParameterKey, number>> = {};
  const typical: Record<ParameterKey, () => number> = {
    temperature: () => 20 + rand() * 10,
    salinity: () => (rand() < 0.2 ? rand() * 5 : 28 + rand() * 10),
    pH: () => 7 + rand() * 1.6,
    ammonia: () => (rand() < 0.3 ? 0 : rand() * 3),
    nitrite: () => (rand() < 0.4 ? 0 : rand() * 2),
    nitrate: () => rand() * 60,
    alkalinity: () => 4 + rand() * 10,
    calcium: () => 300 + rand() * 220,
    magnesium: () => 1000 + rand() * 600,
    phosphate: () => rand() * 0.4,
  };
  for (const key of PARAMETER_KEYS) if (rand() < 0.5) values[key] = typical[key]();
  return { id, takenAt: new Date(ms).toISOString(), values };
}

interface Case {
  label: string;
  reading: WaterTestInput;
  context: EvaluationContext & { history: readonly WaterTestInput[] };
}

function casesFor(seed: number): Case[] {
  const rand = seededRandom(seed);
  const history = shuffled(generateHistory(seed, optionsFor(seed), `s${seed}`), seed + 1);
  const profile = BUILT_IN_PROFILES[seed % BUILT_IN_PROFILES.length]!;
  const phase: TankPhase = rand() < 0.5 ? 'cycling' : 'established';
  const hasLivestock = [true, false, undefined][Math.floor(rand() * 3)];
  const tank = {
    volumeL: 20 + Math.round(rand() * 400),
    phase,
    systemType: profile.systemTypes[0]!,
    ...(hasLivestock === undefined ? {} : { hasLivestock }),
  };
  const context = {
    tank,
    history,
    now: new Date(END).toISOString(),
    ...(rand() < 0.5 ? { sourceWater: { nitrate: Math.round(rand() * 30) } } : {}),
  };
  const sorted = sortByTakenAt(history);
  const inside = sorted[Math.floor(rand() * sorted.length)]!;
  const latest = sorted.at(-1)!;
  const sameInstant = Date.parse(inside.takenAt);
  return [
    // The newest test, judged with a history that contains it (what the server does).
    { label: 'latest, in history', reading: latest, context },
    // A test in the middle: later tests must be ignored, the test itself left out by id.
    { label: 'middle, in history', reading: inside, context },
    // A new reading, same instant as an existing test (ties broken by id on both sides of it).
    {
      label: 'new, same instant as a test',
      reading: readingAt(rand, `${inside.id}-m`, sameInstant),
      context,
    },
    { label: 'new, before every test id', reading: readingAt(rand, '!', sameInstant), context },
    {
      label: 'new, after the history',
      reading: readingAt(rand, 'new', END + Math.floor(rand() * 3 * DAY)),
      context,
    },
  ];
}

describe('evaluateReading matches the reference implementation', () => {
  const seeds = Array.from({ length: HISTORIES }, (_, i) => i + 1);
  it.each(seeds)('history %i', (seed) => {
    for (const { label, reading, context } of casesFor(seed)) {
      const expected = referenceEvaluateReading(
        reading,
        BUILT_IN_PROFILES[seed % BUILT_IN_PROFILES.length]!,
        context,
      );
      const profile = BUILT_IN_PROFILES[seed % BUILT_IN_PROFILES.length]!;
      expect(evaluateReading(reading, profile, context), label).toEqual(expected);
      expect(
        evaluateReading(reading, profile, { ...context, history: indexTests(context.history) }),
        `${label}, indexed`,
      ).toEqual(expected);
    }
  });

  it('the generated cases are not all quiet: trends, free ammonia and ranges all fire somewhere', () => {
    const rules = new Set<string>();
    for (let seed = 1; seed <= HISTORIES; seed++) {
      for (const { reading, context } of casesFor(seed)) {
        for (const c of evaluateReading(
          reading,
          BUILT_IN_PROFILES[seed % BUILT_IN_PROFILES.length]!,
          context,
        ))
          rules.add(c.rule.split('.').slice(0, 2).join('.'));
      }
    }
    for (const rule of [
      'trend.nitrate',
      'trend.salinity',
      'trend.temperature',
      'derived.freeAmmonia',
      'range.nitrate',
      'cycle.ammonia',
    ]) {
      expect(rules, rule).toContain(rule);
    }
  });
});

describe('cycleStage matches the reference implementation', () => {
  function optionsOf(rand: () => number): CycleStageOptions {
    const o: CycleStageOptions = {};
    if (rand() < 0.3) o.confirmTests = 1 + Math.floor(rand() * 3);
    if (rand() < 0.3) o.cycledAfterDays = Math.floor(rand() * 14);
    if (rand() < 0.3)
      o.zeroAt = { ammonia: [0, 0.25][Math.floor(rand() * 2)], nitrite: [0, 0.1][Math.floor(rand() * 2)] };
    if (rand() < 0.3) o.nitriteFallFraction = rand() * 0.5;
    if (rand() < 0.5) o.now = new Date(END + Math.floor(rand() * 30 * DAY)).toISOString();
    return o;
  }

  it.each(Array.from({ length: HISTORIES }, (_, i) => i + 1))('history %i', (seed) => {
    const rand = seededRandom(seed * 31);
    const history = shuffled(generateHistory(seed, optionsFor(seed), `c${seed}`), seed);
    for (let k = 0; k < 3; k++) {
      const options = optionsOf(rand);
      // Also every prefix-by-time of the history, as the tank saw it on each day.
      const cutMs = END - Math.floor(rand() * optionsFor(seed).days) * DAY;
      const prefix = history.filter((t) => Date.parse(t.takenAt) <= cutMs);
      for (const tests of [history, prefix]) {
        const expected = referenceCycleStage(tests, options);
        expect(cycleStage(tests, options)).toEqual(expected);
        expect(cycleStage(indexTests(tests), options)).toEqual(expected);
      }
    }
  });

  it('the generated cycles reach every stage somewhere', () => {
    const stages = new Set<string>();
    for (let seed = 1; seed <= HISTORIES; seed++) {
      const history = generateHistory(seed, optionsFor(seed), `c${seed}`);
      for (let d = 0; d <= optionsFor(seed).days; d += 3) {
        stages.add(
          cycleStage(history.filter((t) => Date.parse(t.takenAt) <= END - (optionsFor(seed).days - d) * DAY))
            .stage,
        );
      }
    }
    expect([...stages].sort()).toEqual([
      'ammonia-rising',
      'cycled',
      'nitrite-falling',
      'nitrite-rising',
      'not-started',
      'setback',
    ]);
  });
});

describe('sortByTakenAt matches the reference implementation', () => {
  it.each([1, 2, 3, 4, 5])('history %i, shuffled', (seed) => {
    const history = shuffled(generateHistory(seed, { days: 60, endMs: END, testsPerDay: 3 }), seed);
    expect(sortByTakenAt(history)).toEqual(referenceSort(history));
    expect(indexTests(history).tests).toEqual(referenceSort(history));
  });
});

describe('TestTimeline.series matches the reference implementation', () => {
  it.each([1, 2, 3, 4, 5])('history %i, every parameter, random windows', (seed) => {
    const rand = seededRandom(seed * 101);
    const history = shuffled(generateHistory(seed, { days: 90, endMs: END, testsPerDay: 2 }), seed);
    const timeline = indexTests(history);
    for (let k = 0; k < 20; k++) {
      const from = END - Math.floor(rand() * 100 * DAY);
      const until = from + Math.floor(rand() * 20 * DAY);
      for (const key of PARAMETER_KEYS)
        expect(timeline.series(key, from, until)).toEqual(referenceSeries(history, key, from, until));
    }
  });
});
