import { describe, expect, it } from 'vitest';
import { REEF_PROFILE, dueTests, overdueConcerns, type DueTest } from '@shared/care';
import { day, test } from './helpers';

// Cadences are the reef profile's (common practice, no source): weekly basics, monthly
// alkalinity/calcium/magnesium, phosphate every 14 days. `due` lasts one day after dueAt, then `overdue`.
const NOW = day(100);

const history = [
  test('a', 95, { ammonia: 0, nitrite: 0, nitrate: 5 }),
  test('b', 92.5, { temperature: 25.5 }),
  test('c', 90, { salinity: 35 }),
  test('d', 85, { pH: 8.2 }),
  test('e', 80, { alkalinity: 8 }),
  test('f', 30, { calcium: 420 }),
  test('future', 101, { nitrate: 6, salinity: 35 }), // after `now`: ignored
];

describe('dueTests', () => {
  it('lists every scheduled parameter of an established reef with a fixed now', () => {
    const rows = dueTests({ phase: 'established', systemType: 'reef', createdAt: day(75) }, history, NOW);
    const expected: DueTest[] = [
      {
        parameter: 'ammonia',
        cadenceDays: 7,
        lastTestedAt: day(95),
        dueAt: day(102),
        overdueByDays: 0,
        status: 'ok',
      },
      {
        parameter: 'nitrite',
        cadenceDays: 7,
        lastTestedAt: day(95),
        dueAt: day(102),
        overdueByDays: 0,
        status: 'ok',
      },
      {
        parameter: 'nitrate',
        cadenceDays: 7,
        lastTestedAt: day(95),
        dueAt: day(102),
        overdueByDays: 0,
        status: 'ok',
      },
      {
        parameter: 'pH',
        cadenceDays: 7,
        lastTestedAt: day(85),
        dueAt: day(92),
        overdueByDays: 8,
        status: 'overdue',
      },
      {
        parameter: 'temperature',
        cadenceDays: 7,
        lastTestedAt: day(92.5),
        dueAt: day(99.5),
        overdueByDays: 0,
        status: 'due',
      },
      {
        parameter: 'salinity',
        cadenceDays: 7,
        lastTestedAt: day(90),
        dueAt: day(97),
        overdueByDays: 3,
        status: 'overdue',
      },
      {
        parameter: 'alkalinity',
        cadenceDays: 30,
        lastTestedAt: day(80),
        dueAt: day(110),
        overdueByDays: 0,
        status: 'ok',
      },
      {
        parameter: 'calcium',
        cadenceDays: 30,
        lastTestedAt: day(30),
        dueAt: day(60),
        overdueByDays: 40,
        status: 'overdue',
      },
      // Never tested: due from the day the tank was set up.
      {
        parameter: 'magnesium',
        cadenceDays: 30,
        lastTestedAt: null,
        dueAt: day(75),
        overdueByDays: 25,
        status: 'overdue',
      },
      {
        parameter: 'phosphate',
        cadenceDays: 14,
        lastTestedAt: null,
        dueAt: day(75),
        overdueByDays: 25,
        status: 'overdue',
      },
    ];
    expect(rows).toEqual(expected);
  });

  it('uses the cycling cadence while cycling (ammonia and nitrite daily)', () => {
    const rows = dueTests(
      { phase: 'cycling', systemType: 'reef', profile: REEF_PROFILE },
      [test('x', 98.5, { ammonia: 1, nitrite: 0 }), test('y', 99.5, { nitrite: 0.5 })],
      NOW,
    );
    expect(rows.find((r) => r.parameter === 'ammonia')).toMatchObject({
      dueAt: day(99.5),
      status: 'due',
      overdueByDays: 0,
    });
    expect(rows.find((r) => r.parameter === 'nitrite')).toMatchObject({ dueAt: day(100.5), status: 'ok' });
    expect(rows.map((r) => r.parameter)).not.toContain('calcium');
  });

  it('without createdAt, a never-tested parameter is simply due now', () => {
    const rows = dueTests({ phase: 'established', systemType: 'coldwater' }, [], NOW);
    expect(rows.every((r) => r.status === 'due' && r.dueAt === NOW && r.lastTestedAt === null)).toBe(true);
  });
});

describe('overdueConcerns', () => {
  it('slightly overdue is info, more than 2 cadences since the last test is caution', () => {
    const rows = dueTests({ phase: 'established', systemType: 'reef', createdAt: day(75) }, history, NOW);
    const concerns = overdueConcerns(rows);
    expect(concerns.map((c) => [c.rule, c.severity])).toEqual([
      ['schedule.pH.overdue', 'caution'], // 15 days since the last test > 2 × 7
      ['schedule.salinity.overdue', 'info'], // 10 days
      ['schedule.calcium.overdue', 'caution'], // 70 days > 2 × 30
      ['schedule.magnesium.overdue', 'info'], // never tested, 25 days overdue ≤ one cadence
      ['schedule.phosphate.overdue', 'caution'], // never tested, 25 days overdue > 14
    ]);
    expect(concerns[1]?.reason).toContain('3 day(s) overdue');
    expect(concerns[1]?.nextSteps[0]).toBe('Test salinity today.');
  });

  it('raises nothing for tests that are ok or just due', () => {
    const rows = dueTests(
      { phase: 'established', systemType: 'reef' },
      [test('t', 99.5, { ammonia: 0 })],
      NOW,
    );
    expect(overdueConcerns(rows.filter((r) => r.parameter === 'ammonia'))).toEqual([]);
    expect(overdueConcerns(rows)).toEqual([]);
  });
});
