import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { TRIAGE_WEIGHTS, rankTanks, triageScore, type Severity, type TankState } from '@shared/care';
import { day, shuffled } from './helpers';

// Weights (common practice, no source; see shared/care/README.md): urgent 1000, caution 100 (cap 300),
// info 5 (cap 20), each halving every 7 days down to half weight; stale 4/day after 7 days (cap 40);
// trends 15 each (cap 45); questions 20 each (cap 60); new tank up to 30, fading over 42 days.
const NOW = day(100);

function state(tankId: string, over: Partial<TankState>): TankState {
  return {
    tankId,
    createdAt: day(0),
    lastTestAt: day(100),
    openConcerns: [],
    risingTrends: 0,
    unansweredQuestions: 0,
    phase: 'established',
    ...over,
  };
}

const concerns = (severity: Severity, n: number, raisedDay: number) =>
  Array.from({ length: n }, () => ({ severity, raisedAt: day(raisedDay) }));

const TABLE: readonly TankState[] = [
  // A 1000: an urgent concern raised today outranks everything.
  state('tank-a', { openConcerns: concerns('urgent', 1, 100) }),
  // B 528: an urgent concern two weeks old has decayed to its floor (500) but still beats any tank
  // without one; +28 because nobody has tested for 14 days (7 days over × 4).
  state('tank-b', { openConcerns: concerns('urgent', 1, 86), lastTestAt: day(86) }),
  // C 260: two fresh cautions (200) and three unanswered questions (60).
  state('tank-c', { openConcerns: concerns('caution', 2, 100), unansweredQuestions: 3 }),
  // D 315: four fresh cautions are capped at 300, plus one worsening trend (15): above C.
  state('tank-d', { openConcerns: concerns('caution', 4, 100), risingTrends: 1, lastTestAt: day(99) }),
  // E 25: a week-old cycling tank, nothing wrong yet: 30 × (1 − 7/42).
  state('tank-e', { createdAt: day(93), phase: 'cycling' }),
  // F 0: established, tested today, nothing open: last.
  state('tank-f', {}),
  // G 40: never tested in 60 days: stale penalty at its cap. Ties with H; never tested counts as the
  // oldest last test, so G comes first.
  state('tank-g', { createdAt: day(40), lastTestAt: null }),
  // H 40: no test for 30 days: stale penalty at its cap.
  state('tank-h', { lastTestAt: day(70) }),
  // I 80: one week-old caution (half weight, 50) and two worsening trends (30).
  state('tank-i', { openConcerns: concerns('caution', 1, 93), risingTrends: 2, lastTestAt: day(93) }),
  // J 18: two fresh info concerns (10) and a test 9 days ago (2 days over × 4 = 8).
  state('tank-j', { openConcerns: concerns('info', 2, 100), lastTestAt: day(91) }),
];

describe('triageScore', () => {
  it('scores each tank as documented', () => {
    const scores = Object.fromEntries(TABLE.map((s) => [s.tankId, triageScore(s, NOW).score]));
    expect(scores).toEqual({
      'tank-a': 1000,
      'tank-b': 528,
      'tank-c': 260,
      'tank-d': 315,
      'tank-e': 25,
      'tank-f': 0,
      'tank-g': 40,
      'tank-h': 40,
      'tank-i': 80,
      'tank-j': 18,
    });
  });

  it('explains the score in parts that add up', () => {
    const result = triageScore(TABLE[1]!, NOW);
    expect(result.parts).toEqual([
      { label: '1 open urgent concern(s)', points: 500 },
      { label: 'No test for 14 days', points: 28 },
    ]);
    expect(result.parts.reduce((s, p) => s + p.points, 0)).toBe(result.score);
  });

  it('decays a concern by half every 7 days, never below half weight', () => {
    const at = (age: number) =>
      triageScore(state('t', { openConcerns: concerns('caution', 1, 100 - age) }), NOW).score;
    expect([at(0), at(3.5), at(7), at(30)]).toEqual([100, 70.7, 50, 50]);
    expect(TRIAGE_WEIGHTS.decay).toEqual({ halfLifeDays: 7, floor: 0.5 });
  });
});

describe('rankTanks', () => {
  const EXPECTED_ORDER = [
    'tank-a',
    'tank-b',
    'tank-d',
    'tank-c',
    'tank-i',
    'tank-g',
    'tank-h',
    'tank-e',
    'tank-j',
    'tank-f',
  ];

  it('orders the table as justified above', () => {
    expect(rankTanks(TABLE, NOW).map((r) => r.tankId)).toEqual(EXPECTED_ORDER);
  });

  it('gives the same order whatever order the states arrive in', () => {
    for (const seed of [3, 17, 99])
      expect(rankTanks(shuffled(TABLE, seed), NOW).map((r) => r.tankId)).toEqual(EXPECTED_ORDER);
  });

  it('breaks score ties by oldest last test, then tank id', () => {
    // All three score 0 (a test 5 days ago is not stale yet); tank-old was tested longest ago,
    // tank-m and tank-z tie on that too, so their ids decide.
    const twins = [state('tank-z', {}), state('tank-m', {}), state('tank-old', { lastTestAt: day(95) })];
    expect(rankTanks(twins, NOW).map((r) => [r.tankId, r.score])).toEqual([
      ['tank-old', 0],
      ['tank-m', 0],
      ['tank-z', 0],
    ]);
  });

  it('any tank with an open urgent concern outranks every tank without one (property)', () => {
    const severity = fc.constantFrom<Severity>('caution', 'info');
    const anyState = (withUrgent: boolean) =>
      fc.record({
        age: fc.double({ min: 0, max: 400, noNaN: true }),
        lastAgo: fc.option(fc.double({ min: 0, max: 400, noNaN: true }), { nil: null }),
        others: fc.array(fc.record({ severity, ago: fc.double({ min: 0, max: 400, noNaN: true }) }), {
          maxLength: 30,
        }),
        urgentAgo: withUrgent ? fc.double({ min: 0, max: 400, noNaN: true }) : fc.constant(-1),
        trends: fc.nat(20),
        questions: fc.nat(20),
      });
    const build = (
      id: string,
      r: {
        age: number;
        lastAgo: number | null;
        others: { severity: Severity; ago: number }[];
        urgentAgo: number;
        trends: number;
        questions: number;
      },
    ): TankState =>
      state(id, {
        createdAt: day(100 - r.age),
        lastTestAt: r.lastAgo === null ? null : day(100 - Math.min(r.lastAgo, r.age)),
        openConcerns: [
          ...r.others.map((c) => ({ severity: c.severity, raisedAt: day(100 - c.ago) })),
          ...(r.urgentAgo >= 0 ? [{ severity: 'urgent' as const, raisedAt: day(100 - r.urgentAgo) }] : []),
        ],
        risingTrends: r.trends,
        unansweredQuestions: r.questions,
      });
    fc.assert(
      fc.property(anyState(true), anyState(false), (u, n) => {
        const ranked = rankTanks([build('no-urgent', n), build('urgent', u)], NOW);
        expect(ranked[0]?.tankId).toBe('urgent');
      }),
      { numRuns: 300 },
    );
  });
});
