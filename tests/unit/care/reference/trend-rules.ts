/**
 * Test-only reference: the straightforward implementation as it was before the engine was made fast,
 * kept unchanged so the oracle tests can prove the fast one gives the same answers. Do not optimise.
 */
import { formatNumber, type ParameterKey } from '@shared/care/parameters';
import type { CareProfile } from '@shared/care/profiles/types';
import { seriesOf, type SeriesPoint } from './readings';
import { DAY_MS, toMs } from './time';
import type { Concern, TankPhase, WaterTestInput } from '@shared/care/types';
import { TREND_RULES } from '@shared/care/evaluation/trend-rules';
import { mentorStep } from '@shared/care/evaluation/wording';

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
  tests: readonly WaterTestInput[],
  parameter: ParameterKey,
  endMs: number,
  days: number,
): SeriesPoint[] {
  return seriesOf(tests, parameter, endMs - days * DAY_MS, endMs);
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

/** Trend concerns for the tests up to and including `reading`. `tests` must already include the reading. */
export function trendConcerns(
  tests: readonly WaterTestInput[],
  reading: WaterTestInput,
  profile: CareProfile,
  phase: TankPhase,
): Concern[] {
  const end = toMs(reading.takenAt);
  const out: Concern[] = [];

  const nr = TREND_RULES.nitrateRising;
  const nitrate = window(tests, 'nitrate', end, nr.windowDays);
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
  const salinity = window(tests, 'salinity', end, sd.windowDays);
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
  const pH = window(tests, 'pH', end, pf.windowDays);
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
  const temps = seriesOf(tests, 'temperature', end - ts.windowHours * 3_600_000, end);
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
