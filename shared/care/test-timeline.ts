import type { ParameterKey } from './parameters';
import { compareTests, engineOrder, type KnownValue, type SeriesPoint } from './readings';
import type { WaterTestInput } from './types';

/** First index in `times` (ascending) whose time passes `after` (false, then true). */
function firstWhere(times: readonly number[], after: (ms: number) => boolean): number {
  let lo = 0;
  let hi = times.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (after(times[mid] as number)) hi = mid;
    else lo = mid + 1;
  }
  return lo;
}

function finite(value: number | undefined): value is number {
  return value !== undefined && Number.isFinite(value);
}

/**
 * A tank's tests read once: each timestamp parsed once and the tests sorted once (oldest first, ties by
 * id, otherwise input order). Every question the engine asks of a history is then a binary search plus a
 * look at the few tests near the answer, instead of a sort and a scan of everything, so the server can
 * build one per tank and hand it to `evaluateReading` and `cycleStage` alike.
 * It is a snapshot: do not change the tests after indexing them.
 */
export class TestTimeline {
  /** The tests, oldest first, ties broken by id. */
  readonly tests: readonly WaterTestInput[];
  /** `takenAt` of `tests[i]` in epoch milliseconds. */
  readonly times: readonly number[];

  constructor(tests: readonly WaterTestInput[]) {
    const { order, times } = engineOrder(tests);
    this.tests = order.map((i) => tests[i] as WaterTestInput);
    this.times = order.map((i) => times[i] as number);
  }

  get length(): number {
    return this.tests.length;
  }

  /** The most recent finite value of a parameter at or before `atMs`, skipping tests with id `excludeId`. */
  lastKnown(parameter: ParameterKey, atMs: number, excludeId?: string): KnownValue | null {
    for (let i = firstWhere(this.times, (ms) => ms > atMs) - 1; i >= 0; i--) {
      const test = this.tests[i] as WaterTestInput;
      const value = test.values[parameter];
      if (test.id !== excludeId && finite(value)) return { value, takenAt: test.takenAt, testId: test.id };
    }
    return null;
  }

  /** Finite values of one parameter inside [fromMs, untilMs], oldest first. */
  series(parameter: ParameterKey, fromMs: number, untilMs: number): SeriesPoint[] {
    const out: SeriesPoint[] = [];
    const end = firstWhere(this.times, (ms) => ms > untilMs);
    for (let i = firstWhere(this.times, (ms) => ms >= fromMs); i < end; i++) {
      const value = (this.tests[i] as WaterTestInput).values[parameter];
      if (finite(value)) out.push({ ms: this.times[i] as number, value });
    }
    return out;
  }

  /**
   * Values of one parameter inside [fromMs, untilMs], oldest first, leaving out tests with id
   * `reading.id` and putting `reading`'s own value (if finite) where it sorts: what the tank's history
   * looks like with this reading in it. `readingMs` is the reading's `takenAt`, parsed by the caller once.
   */
  seriesWith(
    parameter: ParameterKey,
    fromMs: number,
    untilMs: number,
    reading: WaterTestInput,
    readingMs: number,
  ): SeriesPoint[] {
    const own = reading.values[parameter];
    const ownIn = finite(own) && readingMs >= fromMs && readingMs <= untilMs;
    const out: SeriesPoint[] = [];
    let placed = !ownIn;
    const end = firstWhere(this.times, (ms) => ms > untilMs);
    for (let i = firstWhere(this.times, (ms) => ms >= fromMs); i < end; i++) {
      const test = this.tests[i] as WaterTestInput;
      const value = test.values[parameter];
      if (test.id === reading.id || !finite(value)) continue;
      const ms = this.times[i] as number;
      if (!placed && compareTests(ms, test.id, readingMs, reading.id) > 0) {
        out.push({ ms: readingMs, value: own as number });
        placed = true;
      }
      out.push({ ms, value });
    }
    if (!placed) out.push({ ms: readingMs, value: own as number });
    return out;
  }
}

/** Index a history once; a timeline passed in is returned as it is. */
export function indexTests(history: readonly WaterTestInput[] | TestTimeline): TestTimeline {
  return history instanceof TestTimeline ? history : new TestTimeline(history);
}
