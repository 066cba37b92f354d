import type { ParameterKey } from './parameters';
import type { WaterTestInput } from './types';
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

/** Where a test stands in a tank's history: tests are ordered by time, ties by id. */
export interface TestPosition {
  takenAt: string;
  /** Absent for a test not stored yet: then only tests taken strictly earlier come before it. */
  id?: string;
}

/** Whether `test` comes before `position` in (takenAt, id) order; the position's own test never does. */
export function comesBefore(test: Pick<WaterTestInput, 'id' | 'takenAt'>, position: TestPosition): boolean {
  const a = toMs(test.takenAt);
  const b = toMs(position.takenAt);
  if (a !== b) return a < b;
  return position.id !== undefined && test.id < position.id;
}

/** The most recent value of a parameter among tests taken at or before `at`. */
export function lastKnownValue(
  tests: readonly WaterTestInput[],
  parameter: ParameterKey,
  at: string,
  excludeId?: string,
): KnownValue | null {
  const limit = toMs(at);
  let best: KnownValue | null = null;
  for (const test of sortByTakenAt(tests)) {
    if (test.id === excludeId || toMs(test.takenAt) > limit) continue;
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
