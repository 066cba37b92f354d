import type { ParameterKey, WaterTestInput } from '@shared/care';
import { DAY_MS } from '@shared/care/time';

export const T0 = Date.parse('2025-03-01T09:00:00.000Z');

/** ISO time `d` days (fractional allowed) after T0. */
export function day(d: number): string {
  return new Date(T0 + d * DAY_MS).toISOString();
}

export function test(id: string, d: number, values: Partial<Record<ParameterKey, number>>): WaterTestInput {
  return { id, takenAt: day(d), values };
}

/** Deterministic PRNG (mulberry32) so shuffles are the same on every run. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export function shuffled<T>(items: readonly T[], seed: number): T[] {
  const out = [...items];
  const rand = seededRandom(seed);
  for (let i = out.length - 1; i > 0; i--) {
    const j = Math.floor(rand() * (i + 1));
    const a = out[i] as T;
    out[i] = out[j] as T;
    out[j] = a;
  }
  return out;
}

/**
 * A textbook fishless cycle, one test a day for 36 days (days 0–35): ammonia rises and falls,
 * nitrite follows, nitrate climbs. [ammonia, nitrite, nitrate] per day.
 */
export const TEXTBOOK_CYCLE: readonly (readonly [number, number, number])[] = [
  [0, 0, 0], // 0 set up, no ammonia source yet
  [0, 0, 0], // 1
  [0.5, 0, 0], // 2 first ammonia
  [1, 0, 0], // 3
  [2, 0, 0], // 4
  [3, 0, 0], // 5
  [4, 0, 0], // 6
  [4, 0, 0], // 7 ammonia peak
  [3.5, 0, 0], // 8
  [3, 0.25, 0], // 9 first nitrite
  [2.5, 0.5, 0], // 10
  [2, 1, 0], // 11
  [1.5, 2, 5], // 12 first nitrate
  [1, 3, 5], // 13
  [0.5, 4, 10], // 14
  [0.25, 5, 10], // 15
  [0, 5, 15], // 16 ammonia gone
  [0, 5, 15], // 17 nitrite peak
  [0, 4.5, 20], // 18
  [0, 3.5, 20], // 19 nitrite clearly below its peak
  [0, 3, 25], // 20
  [0, 2, 25], // 21
  [0, 1, 30], // 22
  [0, 0.5, 30], // 23
  [0, 0.25, 30], // 24
  [0, 0, 35], // 25 first all-zero day
  [0, 0, 35], // 26
  [0, 0, 35], // 27
  [0, 0, 40], // 28
  [0, 0, 40], // 29
  [0, 0, 40], // 30
  [0, 0, 40], // 31
  [0, 0, 40], // 32 zero for 7 days with nitrate present
  [0, 0, 40], // 33
  [0, 0, 40], // 34
  [0, 0, 40], // 35
];

export function textbookTests(): WaterTestInput[] {
  return TEXTBOOK_CYCLE.map(([ammonia, nitrite, nitrate], d) =>
    test(`d${String(d).padStart(2, '0')}`, d, { ammonia, nitrite, nitrate }),
  );
}
