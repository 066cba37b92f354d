import { formatNumber, type ParameterKey } from '../parameters';
import type { CareProfile } from '../profiles/types';
import type { SeriesPoint } from '../readings';
import type { TestTimeline } from '../test-timeline';
import { DAY_MS, toMs } from '../time';
import type { Concern, TankPhase, WaterTestInput } from '../types';
import { mentorStep } from './wording';

/**
 * Trend thresholds. All common practice, no source: they are starting points a club can tune,
 * not published limits.
 */
export const TREND_RULES = {
  nitrateRising: { windowDays: 14, minTests: 3, minSpanDays: 4, perWeek: 5 },
  salinityDrift: { windowDays: 7, maxRange: 1 },
  pHFalling: { windowDays: 14, minTests: 3, minSpanDays: 7, perWeek: -0.2 },
  temperatureSwing: { windowHours: 24, maxRange: 2 },
  provenance: 'common practice, no source',
} as const;

/** Least-squares slope in value per week. */
function slopePerWeek(points: readonly SeriesPoint[]): number {
  const n = points.length;
  const meanX = points.reduce((s, p) => s + p.ms, 0) / n;
  const meanY = points.reduce((s, p) => s + p.value, 0) / n;
  let num = 0;
  let den = 0;
  for (const p of points) {
    num += (p.ms - meanX) * (p.value - meanY);
    den += (p.ms - meanX) ** 2;
  }
  return den === 0 ? 0 : (num / den) * 7 * DAY_MS;
}

function window(
  history: TestTimeline,
  reading: WaterTestInput,
  parameter: ParameterKey,
  endMs: number,
  days: number,
): SeriesPoint[] {
  return history.seriesWith(parameter, endMs - days * DAY_MS, endMs, reading, endMs);
}

function spanDays(points: readonly SeriesPoint[]): number {
  const first = points[0];
  const last = points[points.length - 1];
  return first && last ? (last.ms - first.ms) / DAY_MS : 0;
}

function range(points: readonly SeriesPoint[]): { min: number; max: number; risingNow: boolean } {
  const values = points.map((p) => p.value);
  const first = points[0]?.value ?? 0;
  const last = points[points.length - 1]?.value ?? 0;
  return { min: Math.min(...values), max: Math.max(...values), risingNow: last >= first };
}

/** Trend concerns for the tank's tests up to and including `reading` (tests in `history` with its id are left out). */
export function trendConcerns(
  history: TestTimeline,
  reading: WaterTestInput,
  profile: CareProfile,
  phase: TankPhase,
): Concern[] {
  const end = toMs(reading.takenAt);
  const out: Concern[] = [];

  const nr = TREND_RULES.nitrateRising;
  const nitrate = window(history, reading, 'nitrate', end, nr.windowDays);
  // While cycling, nitrate is meant to rise: that is the bacteria working.
  if (phase === 'established' && nitrate.length >= nr.minTests && spanDays(nitrate) >= nr.minSpanDays) {
    const perWeek = slopePerWeek(nitrate);
    if (perWeek > nr.perWeek) {
      out.push({
        parameter: 'nitrate',
        severity: 'caution',
        rule: 'trend.nitrate.rising',
        reason: `Nitrate is climbing about ${formatNumber('nitrate', perWeek)} mg/L a week: waste is building up faster than water changes remove it.`,
        nextSteps: [
          'Feed a little less.',
          'Change water more often, or a little more each time.',
          mentorStep('caution'),
        ],
        value: perWeek,
        unit: 'mg/L NO3 per week',
      });
    }
  }

  const sd = TREND_RULES.salinityDrift;
  const salinity = window(history, reading, 'salinity', end, sd.windowDays);
  if (profile.ranges.salinity && salinity.length >= 2) {
    const r = range(salinity);
    if (r.max - r.min > sd.maxRange) {
      out.push({
        parameter: 'salinity',
        severity: 'caution',
        rule: 'trend.salinity.drift',
        reason: r.risingNow
          ? `Salinity rose ${formatNumber('salinity', r.max - r.min)} in a week: water evaporates but salt stays behind.`
          : `Salinity fell ${formatNumber('salinity', r.max - r.min)} in a week: too much fresh water is going in.`,
        nextSteps: r.risingNow
          ? [
              'Top up evaporation with fresh (purified) water, not salt water, every day.',
              mentorStep('caution'),
            ]
          : [
              'Top up only to the fill line, and mix new salt water to the right salinity.',
              mentorStep('caution'),
            ],
        value: r.max - r.min,
        unit: 'PSU',
      });
    }
  }

  const pf = TREND_RULES.pHFalling;
  const pH = window(history, reading, 'pH', end, pf.windowDays);
  if (profile.ranges.pH && pH.length >= pf.minTests && spanDays(pH) >= pf.minSpanDays) {
    const perWeek = slopePerWeek(pH);
    if (perWeek < pf.perWeek) {
      out.push({
        parameter: 'pH',
        severity: 'caution',
        rule: 'trend.ph.falling',
        reason: `pH is falling about ${formatNumber('pH', -perWeek)} a week: the water's buffer may be running out.`,
        nextSteps: [
          'Test alkalinity (dKH).',
          'Check the room and tank are well aired.',
          mentorStep('caution'),
        ],
        value: perWeek,
        unit: 'pH per week',
      });
    }
  }

  const ts = TREND_RULES.temperatureSwing;
  const temps = history.seriesWith('temperature', end - ts.windowHours * 3_600_000, end, reading, end);
  if (temps.length >= 2) {
    const r = range(temps);
    if (r.max - r.min > ts.maxRange) {
      out.push({
        parameter: 'temperature',
        severity: 'caution',
        rule: 'trend.temperature.swing',
        reason: `Temperature swung ${formatNumber('temperature', r.max - r.min)} °C within a day: quick changes stress animals.`,
        nextSteps: [
          'Check the heater and its thermostat, and keep the tank out of sun and drafts.',
          mentorStep('caution'),
        ],
        value: r.max - r.min,
        unit: '°C',
      });
    }
  }
  return out;
}

export function isTrendRule(rule: string): boolean {
  return rule.startsWith('trend.');
}
