import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { CYCLE_DURATION_WEEKS, cycleStage, type CycleStage, type WaterTestInput } from '@shared/care';
import { day, shuffled, test, textbookTests } from './helpers';

// Stage changes need 2 consecutive agreeing tests (default), so each new stage shows up one test after
// its first sign, dated from that first sign. `cycled` needs ammonia and nitrite at 0 for 7 days with
// nitrate present (defaults; common practice, no source).
const EXPECTED: readonly (readonly [CycleStage, number])[] = [
  ['not-started', 0], // 0
  ['not-started', 0], // 1
  ['not-started', 0], // 2 ammonia seen once: not confirmed yet
  ['ammonia-rising', 2], // 3 confirmed, dated from day 2
  ['ammonia-rising', 2], // 4
  ['ammonia-rising', 2], // 5
  ['ammonia-rising', 2], // 6
  ['ammonia-rising', 2], // 7
  ['ammonia-rising', 2], // 8
  ['ammonia-rising', 2], // 9 nitrite seen once
  ['nitrite-rising', 9], // 10 confirmed, dated from day 9
  ['nitrite-rising', 9], // 11
  ['nitrite-rising', 9], // 12
  ['nitrite-rising', 9], // 13
  ['nitrite-rising', 9], // 14
  ['nitrite-rising', 9], // 15
  ['nitrite-rising', 9], // 16
  ['nitrite-rising', 9], // 17 peak 5
  ['nitrite-rising', 9], // 18 4.5 is within 20% of the peak
  ['nitrite-rising', 9], // 19 3.5 < 4 (80% of peak): first falling test
  ['nitrite-falling', 19], // 20 confirmed
  ['nitrite-falling', 19], // 21
  ['nitrite-falling', 19], // 22
  ['nitrite-falling', 19], // 23
  ['nitrite-falling', 19], // 24
  ['nitrite-falling', 19], // 25 first all-zero test
  ['nitrite-falling', 19], // 26
  ['nitrite-falling', 19], // 27
  ['nitrite-falling', 19], // 28
  ['nitrite-falling', 19], // 29
  ['nitrite-falling', 19], // 30
  ['nitrite-falling', 19], // 31
  ['cycled', 32], // 32 zero for 7 days (25 → 32), nitrate 40
  ['cycled', 32], // 33
  ['cycled', 32], // 34
  ['cycled', 32], // 35
];

function stageOn(tests: readonly WaterTestInput[], lastDay: number) {
  return cycleStage(tests.filter((t) => Date.parse(t.takenAt) <= Date.parse(day(lastDay))));
}

describe('cycleStage on a textbook cycle', () => {
  const tests = textbookTests();

  it.each(EXPECTED.map(([stage, since], d) => [d, stage, since] as const))(
    'day %i is %s (since day %i)',
    (d, stage, since) => {
      const result = stageOn(tests, d);
      expect(result.stage).toBe(stage);
      expect(result.since).toBe(day(since));
    },
  );

  it('explains itself', () => {
    const result = cycleStage(tests);
    expect(result.evidence).toContain(`Cycled: confirmed ${day(32).slice(0, 10)}.`);
    expect(result.evidence.some((e) => e.startsWith('Nitrite peaked near 5'))).toBe(true);
    expect(result.evidence.some((e) => e.startsWith(`Cycle started ${day(2).slice(0, 10)}`))).toBe(true);
  });

  it('has no tests: not started, no date', () => {
    expect(cycleStage([])).toEqual({
      stage: 'not-started',
      since: null,
      evidence: ['No ammonia or nitrite tests yet.'],
    });
  });
});

describe('cycleStage projection (typical 4–6 weeks, range 2–8: common practice, no source)', () => {
  const tests = textbookTests();

  it('exports the typical course for the UI', () => {
    expect(CYCLE_DURATION_WEEKS).toMatchObject({ typicalMin: 4, typicalMax: 6, rangeMin: 2, rangeMax: 8 });
  });

  it('projects from the first ammonia (day 2), never earlier than 7 zero days after the latest test', () => {
    // earliest: 2 weeks after day 2 is day 16, but the zero run cannot finish before day 10 + 7.
    expect(stageOn(tests, 10).projectedDoneAt).toEqual({
      earliest: day(17),
      likely: day(37),
      latest: day(58),
    });
  });

  it('once the zero run has started, the earliest date is its start + 7 days', () => {
    expect(stageOn(tests, 26).projectedDoneAt).toEqual({
      earliest: day(32),
      likely: day(37),
      latest: day(58),
    });
  });

  it('has no projection before the cycle starts or after it is done', () => {
    expect(stageOn(tests, 1).projectedDoneAt).toBeUndefined();
    expect(stageOn(tests, 33).projectedDoneAt).toBeUndefined();
  });

  it('never projects into the past of `now`', () => {
    const result = cycleStage(
      tests.filter((t) => t.takenAt <= day(10)),
      { now: day(30) },
    );
    expect(result.projectedDoneAt?.earliest).toBe(day(30));
  });
});

describe('cycleStage setback', () => {
  const cycled = textbookTests();
  const longCycled = [...cycled];
  for (let d = 38; d <= 92; d += 3)
    longCycled.push(test(`z${d}`, d, { ammonia: 0, nitrite: 0, nitrate: 30 }));

  it('stays cycled over 60 quiet days', () => {
    expect(cycleStage(longCycled)).toMatchObject({ stage: 'cycled', since: day(32) });
  });

  it('ammonia reappearing on two tests after 60 cycled days is a setback, dated from the first', () => {
    const history = [
      ...longCycled,
      test('s1', 93, { ammonia: 0.5, nitrite: 0, nitrate: 30 }),
      test('s2', 94, { ammonia: 0.5, nitrite: 0.25, nitrate: 30 }),
    ];
    const result = cycleStage(history);
    expect(result.stage).toBe('setback');
    expect(result.since).toBe(day(93));
    expect(result.evidence.some((e) => e.startsWith('Setback:'))).toBe(true);
  });

  it('recovers to cycled after another 7 zero days', () => {
    const history = [
      ...longCycled,
      test('s1', 93, { ammonia: 0.5, nitrite: 0 }),
      test('s2', 94, { ammonia: 0.5, nitrite: 0.25 }),
    ];
    for (let d = 95; d <= 102; d++) history.push(test(`r${d}`, d, { ammonia: 0, nitrite: 0, nitrate: 30 }));
    expect(cycleStage(history.filter((t) => t.takenAt <= day(101)))).toMatchObject({
      stage: 'setback',
      since: day(93),
    });
    expect(cycleStage(history)).toMatchObject({ stage: 'cycled', since: day(102) });
  });
});

describe('cycleStage with noisy tests', () => {
  it('one ammonia blip on a cycled tank does not flip it', () => {
    const history = [
      ...textbookTests(),
      test('blip', 36, { ammonia: 0.25, nitrite: 0 }),
      test('ok', 37, { ammonia: 0, nitrite: 0 }),
    ];
    const result = cycleStage(history);
    expect(result).toMatchObject({ stage: 'cycled', since: day(32) });
    expect(result.evidence.some((e) => e.startsWith('1 test(s) disagreed'))).toBe(true);
  });

  it('a single misread zero nitrite mid-cycle does not make it "falling"', () => {
    const tests = textbookTests().map((t) =>
      t.id === 'd14' ? { ...t, values: { ammonia: 0.5, nitrite: 0, nitrate: 10 } } : t,
    );
    for (let d = 14; d <= 19; d++)
      expect(stageOn(tests, d)).toMatchObject({ stage: 'nitrite-rising', since: day(9) });
    expect(cycleStage(tests)).toMatchObject({ stage: 'cycled', since: day(32) });
  });

  it('a single wild nitrite reading does not set the peak', () => {
    const tests = textbookTests().map((t) =>
      t.id === 'd13' ? { ...t, values: { ammonia: 1, nitrite: 10, nitrate: 5 } } : t,
    );
    // With 10 as the peak, day 14 (4) and 15 (5) would read as "falling"; they must not.
    for (let d = 13; d <= 19; d++) expect(stageOn(tests, d).stage).toBe('nitrite-rising');
    expect(stageOn(tests, 20)).toMatchObject({ stage: 'nitrite-falling', since: day(19) });
  });

  it('a single nitrite blip during the zero run restarts the 7-day count but not the stage', () => {
    const tests = textbookTests().map((t) =>
      t.id === 'd27' ? { ...t, values: { ammonia: 0, nitrite: 0.25, nitrate: 35 } } : t,
    );
    for (let d = 27; d <= 34; d++)
      expect(stageOn(tests, d)).toMatchObject({ stage: 'nitrite-falling', since: day(19) });
    expect(stageOn(tests, 35)).toMatchObject({ stage: 'cycled', since: day(35) });
  });

  it('zeros without nitrate do not count as cycled', () => {
    const tests = textbookTests().map((t) =>
      t.takenAt >= day(25) ? { ...t, values: { ammonia: 0, nitrite: 0 } } : t,
    );
    const result = cycleStage(tests);
    expect(result.stage).toBe('nitrite-falling');
    // The last nitrate seen in the zero run is what counts: none was taken in it.
    expect(result.evidence).toContain('Test nitrate too: a cycled tank shows nitrate.');
  });

  it('an empty tank reading zero with tap-water nitrate is not cycled: the cycle never started', () => {
    const tests = Array.from({ length: 15 }, (_, d) =>
      test(`e${d}`, d, { ammonia: 0, nitrite: 0, nitrate: 5 }),
    );
    expect(cycleStage(tests)).toMatchObject({ stage: 'not-started', since: day(0) });
  });
});

describe('cycleStage input order and gaps', () => {
  const tests = textbookTests();
  const reference = cycleStage(tests);

  it('shuffled input (fixed seeds) gives the same answer', () => {
    for (const seed of [1, 42, 2025]) expect(cycleStage(shuffled(tests, seed))).toEqual(reference);
  });

  it('any shuffle gives the same answer (property)', () => {
    fc.assert(
      fc.property(fc.integer(), (seed) => {
        expect(cycleStage(shuffled(tests, seed))).toEqual(reference);
      }),
      { numRuns: 50 },
    );
  });

  it('copes with missing days', () => {
    const keep = new Set([0, 2, 3, 5, 7, 9, 10, 13, 14, 17, 19, 20, 23, 26, 28, 30, 33, 35]);
    const sparse = tests.filter((_, d) => keep.has(d));
    expect(stageOn(sparse, 3)).toMatchObject({ stage: 'ammonia-rising', since: day(2) });
    expect(stageOn(sparse, 10)).toMatchObject({ stage: 'nitrite-rising', since: day(9) });
    // Sparse pairs give a peak of 4 (min of 4 and 5), so 3.5 on day 19 is not yet "falling"; 3 on day 20 is.
    expect(stageOn(sparse, 19).stage).toBe('nitrite-rising');
    expect(stageOn(sparse, 23)).toMatchObject({ stage: 'nitrite-falling', since: day(20) });
    expect(stageOn(sparse, 30).stage).toBe('nitrite-falling');
    // Zero run starts day 26, so 7 days are reached on the day-33 test.
    expect(stageOn(sparse, 33)).toMatchObject({ stage: 'cycled', since: day(33) });
  });

  it('ignores tests that carry neither ammonia nor nitrite when confirming a change', () => {
    const withOthers = [
      ...tests.filter((t) => t.takenAt <= day(2)),
      test('temp', 2.5, { temperature: 25 }),
      test('d03', 3, { ammonia: 1, nitrite: 0 }),
    ];
    expect(cycleStage(withOthers)).toMatchObject({ stage: 'ammonia-rising', since: day(2) });
  });

  it('honours options: 3 confirming tests and a 5-day zero run', () => {
    const result = stageOn(tests, 11);
    expect(result.stage).toBe('nitrite-rising');
    expect(
      cycleStage(
        tests.filter((t) => t.takenAt <= day(10)),
        { confirmTests: 3 },
      ),
    ).toMatchObject({
      stage: 'ammonia-rising',
    });
    expect(
      cycleStage(
        tests.filter((t) => t.takenAt <= day(30)),
        { cycledAfterDays: 5 },
      ),
    ).toMatchObject({
      stage: 'cycled',
      since: day(30),
    });
  });
});
