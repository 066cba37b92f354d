import type { WaterTestInput } from './types';
import { toMs } from './time';

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

export interface SeriesPoint {
  ms: number;
  value: number;
}

/** Oldest first, then by id: the one order every engine function reads tests in. */
export function compareTests(aMs: number, aId: string, bMs: number, bId: string): number {
  return aMs - bMs || (aId < bId ? -1 : aId > bId ? 1 : 0);
}

/**
 * Indices of `tests` in engine order, with each timestamp parsed once. Array.prototype.sort is stable, so
 * tests equal in time and id keep their input order.
 */
export function engineOrder(tests: readonly WaterTestInput[]): { order: number[]; times: number[] } {
  const times = tests.map((t) => toMs(t.takenAt));
  const order = tests.map((_, i) => i);
  let sorted = true;
  for (let i = 1; i < tests.length && sorted; i++) {
    sorted =
      compareTests(
        times[i - 1] as number,
        (tests[i - 1] as WaterTestInput).id,
        times[i] as number,
        (tests[i] as WaterTestInput).id,
      ) <= 0;
  }
  if (!sorted)
    order.sort((a, b) =>
      compareTests(
        times[a] as number,
        (tests[a] as WaterTestInput).id,
        times[b] as number,
        (tests[b] as WaterTestInput).id,
      ),
    );
  return { order, times };
}

/** Oldest first; ties broken by id so shuffled input always gives the same order. */
export function sortByTakenAt(tests: readonly WaterTestInput[]): WaterTestInput[] {
  return engineOrder(tests).order.map((i) => tests[i] as WaterTestInput);
}
