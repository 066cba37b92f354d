import type { AnyParameterKey, ParameterKey } from '@shared/care/parameters';
import type { Band } from '@shared/care/profiles';
import type { CanonicalValues } from '@shared/readings/normalize-water-test';
import { toDisplay, type ReadingPrefs, type UnitPrefs } from './display-units';
import { colorVar } from '../../tailwind.config';

export interface Point {
  t: number;
  v: number;
  testId: string;
}

/** A stored test as the charts read it: a time and canonical values (free ammonia where it was worked out). */
export interface ChartableTest {
  id: string;
  takenAt: string;
  values: CanonicalValues;
  freeAmmonia?: number | null;
}

/** One parameter over time in the member's units, oldest first. */
export function seriesOf(
  tests: readonly ChartableTest[],
  key: ParameterKey | 'freeAmmonia',
  prefs: UnitPrefs,
): Point[] {
  const points: Point[] = [];
  for (const test of tests) {
    const canonical = key === 'freeAmmonia' ? test.freeAmmonia : test.values[key];
    if (canonical === undefined || canonical === null) continue;
    points.push({ t: Date.parse(test.takenAt), v: toDisplay(key, canonical, prefs), testId: test.id });
  }
  return points.sort((a, b) => a.t - b.t);
}

export function bandToDisplay(key: AnyParameterKey, band: Band, prefs: ReadingPrefs): [number, number] {
  return [toDisplay(key, band[0], prefs), toDisplay(key, band[1], prefs)];
}

/** Round tick steps (1, 2 or 5 × a power of ten) so an axis reads 0, 0.5, 1 rather than 0, 0.85, 1.7. */
export function niceTicks(
  [lo, hi]: [number, number],
  count = 4,
): { domain: [number, number]; ticks: number[] } {
  const raw = (hi - lo) / count || 1;
  const power = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 2.5, 5, 10].map((m) => m * power).find((s) => s >= raw) ?? 10 * power;
  const start = Number((Math.floor(lo / step + 1e-9) * step).toFixed(10));
  const end = Number((Math.ceil(hi / step - 1e-9) * step).toFixed(10));
  const ticks: number[] = [];
  for (let t = start; t <= end + step / 2; t += step) ticks.push(Number(t.toFixed(10)));
  return { domain: [start, end], ticks };
}

/** A y range holding every point and the ideal band, with a little air so nothing sits on the frame. */
export function yDomain(values: readonly number[], band?: readonly [number, number]): [number, number] {
  const all = [...values, ...(band ?? [])];
  let lo = Math.min(...all);
  let hi = Math.max(...all);
  if (!Number.isFinite(lo) || !Number.isFinite(hi)) return [0, 1];
  if (lo === hi) {
    const pad = Math.abs(lo) * 0.05 || 0.5;
    return [Math.max(0, lo - pad), hi + pad];
  }
  const pad = (hi - lo) * 0.12;
  // Concentrations cannot go below zero: keep the axis from doing so.
  lo = lo >= 0 && lo - pad < 0 ? 0 : lo - pad;
  hi += pad;
  return [lo, hi];
}

/** The chart palette, from the theme's roles so the charts follow the colour scheme too. */
export const CHART_COLOURS = {
  line: colorVar('link'),
  grid: colorVar('line'),
  ideal: colorVar('ok'),
  caution: colorVar('watch'),
  waterChange: colorVar('ink-muted'),
  axis: colorVar('ink-muted'),
  ammonia: colorVar('danger'),
  nitrite: colorVar('watch'),
  nitrate: colorVar('link'),
  marker: colorVar('danger'),
} as const;
