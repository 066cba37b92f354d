import { PARAMETER_KEYS, type ParameterKey, type WaterTestInput } from '@shared/care';
import { seededRandom } from './helpers';

const DAY = 86_400_000;

/**
 * Deterministic test histories for the oracle tests and the bench: the same seed gives the same tests on
 * every run and machine. Values are plausible tank readings with the awkward cases mixed in — tests on the
 * same instant, tests carrying only some parameters, spikes, zeros, a cycle that sets back.
 */
export interface HistoryOptions {
  /** Days covered, counted back from `endMs`. */
  days: number;
  endMs: number;
  /** Average tests per day (1 = daily). */
  testsPerDay?: number;
  /** Start the history with a fishless cycle (ammonia, then nitrite, then zero with nitrate). */
  cycle?: boolean;
  /** Fraction of tests that leave out a parameter they would otherwise carry. */
  gaps?: number;
}

const round = (value: number, step: number) => Math.round(value / step) * step;

function cycleValues(
  dayIndex: number,
  rand: () => number,
): { ammonia: number; nitrite: number; nitrate: number } {
  const ammonia = Math.max(0, 4 - Math.abs(dayIndex - 8) / 2 + (rand() - 0.5));
  const nitrite = Math.max(0, 5 - Math.abs(dayIndex - 18) / 2 + (rand() - 0.5));
  const nitrate = Math.max(0, (dayIndex - 10) * 1.5);
  return { ammonia: round(ammonia, 0.25), nitrite: round(nitrite, 0.25), nitrate: round(nitrate, 5) };
}

/** A tank's tests, oldest first, ids `<prefix>-<n>`. */
export function generateHistory(seed: number, options: HistoryOptions, prefix = 't'): WaterTestInput[] {
  const rand = seededRandom(seed);
  const perDay = options.testsPerDay ?? 1;
  const gaps = options.gaps ?? 0.15;
  const count = Math.max(1, Math.round(options.days * perDay));
  const startMs = options.endMs - options.days * DAY;
  const tests: WaterTestInput[] = [];
  let nitrate = 5;
  let salinity = 33;
  let pH = 8.2;
  let previousMs = startMs;
  for (let i = 0; i < count; i++) {
    // Mostly spread over the days; now and then two tests at the very same instant.
    const ms =
      i > 0 && rand() < 0.03 ? previousMs : startMs + Math.floor(((i + rand()) / count) * options.days * DAY);
    previousMs = ms;
    const dayIndex = (ms - startMs) / DAY;
    nitrate = Math.max(0, nitrate + (rand() - 0.35) * 2);
    if (rand() < 0.05) nitrate = Math.max(0, nitrate - 15);
    salinity = Math.min(40, Math.max(26, salinity + (rand() - 0.5) * 0.6));
    pH = Math.min(8.8, Math.max(7.2, pH + (rand() - 0.52) * 0.08));
    const values: Partial<Record<ParameterKey, number>> = {
      temperature: round(24 + Math.sin(i / 3) * 1.5 + (rand() - 0.5) * 2, 0.1),
      salinity: round(salinity, 0.1),
      pH: round(pH, 0.01),
      nitrate: round(nitrate, 0.5),
    };
    if (options.cycle && dayIndex < 30) Object.assign(values, cycleValues(dayIndex, rand));
    else {
      values.ammonia = rand() < 0.06 ? round(rand() * 0.5, 0.05) : 0;
      values.nitrite = rand() < 0.04 ? round(rand() * 0.3, 0.05) : 0;
      if (options.cycle) values.nitrate = Math.max(values.nitrate ?? 0, 2);
    }
    if (rand() < 0.2) values.alkalinity = round(6 + rand() * 6, 0.1);
    if (rand() < 0.1) values.calcium = round(330 + rand() * 150, 1);
    if (rand() < 0.1) values.magnesium = round(1100 + rand() * 400, 1);
    if (rand() < 0.1) values.phosphate = round(rand() * 0.3, 0.01);
    // Built key by key in the canonical order, as the server's loader does (no `delete`, which would
    // leave the objects in a slow shape and make the figures pessimistic).
    const kept: Partial<Record<ParameterKey, number>> = {};
    for (const key of PARAMETER_KEYS) {
      const value = values[key];
      if (value !== undefined && rand() >= gaps) kept[key] = value;
    }
    tests.push({
      id: `${prefix}-${String(i).padStart(4, '0')}`,
      takenAt: new Date(ms).toISOString(),
      values: kept,
    });
  }
  return tests;
}
