/**
 * Test-only reference: the straightforward implementation as it was before the engine was made fast,
 * kept unchanged so the oracle tests can prove the fast one gives the same answers. Do not optimise.
 */
import type { ParameterKey } from '@shared/care/parameters';
import type { WaterTestInput } from '@shared/care/types';
import { toMs } from './time';

/** Oldest first; ties broken by id so shuffled input always gives the same order. */
export function sortByTakenAt(tests: readonly WaterTestInput[]): WaterTestInput[] {
  return [...tests].sort(
    (a, b) => toMs(a.takenAt) - toMs(b.takenAt) || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0),
  );
}

export interface KnownValue {
  value: number;
  takenAt: string;
  testId: string;
}

/**
 * The most recent value of a parameter among tests that come before the reading in (takenAt, id) order. This is
 * the one deliberate change since the copy was taken: free ammonia's inputs now follow that rule everywhere
 * (server, concerns, the form's preview), so a test at the same instant with a later id no longer counts.
 */
export function lastKnownValue(
  tests: readonly WaterTestInput[],
  parameter: ParameterKey,
  at: string,
  excludeId?: string,
): KnownValue | null {
  const limit = toMs(at);
  let best: KnownValue | null = null;
  for (const test of sortByTakenAt(tests)) {
    const ms = toMs(test.takenAt);
    const before = ms < limit || (ms === limit && excludeId !== undefined && test.id < excludeId);
    if (!before) continue;
    const value = test.values[parameter];
    if (value === undefined || !Number.isFinite(value)) continue;
    best = { value, takenAt: test.takenAt, testId: test.id };
  }
  return best;
}

export interface SeriesPoint {
  ms: number;
  value: number;
}

/** Values of one parameter, oldest first, from tests inside [fromMs, toMs]. */
export function seriesOf(
  tests: readonly WaterTestInput[],
  parameter: ParameterKey,
  fromMs: number,
  untilMs: number,
): SeriesPoint[] {
  const points: SeriesPoint[] = [];
  for (const test of sortByTakenAt(tests)) {
    const ms = toMs(test.takenAt);
    const value = test.values[parameter];
    if (ms < fromMs || ms > untilMs || value === undefined || !Number.isFinite(value)) continue;
    points.push({ ms, value });
  }
  return points;
}
