import { DOSED_PARAMETERS, MAX_SAFE_DAILY_RISE } from '@shared/chemistry';
import { dueTests } from '../due-tests';
import { classify } from '../evaluation/classify';
import { capitalised, listOf } from '../evaluation/wording';
import { TREND_RULES } from '../evaluation/trend-rules';
import { formatNumber, formatReading, parameterInfo, PARAMETER_KEYS, type ParameterKey } from '../parameters';
import { COMMON_PRACTICE, commonPractice } from '../provenance';
import { DAY_MS, toMs } from '../time';
import type { CheckContext, CheckItem } from './types';

/**
 * Thresholds of the water rules. Common practice, no source: a test older than two weeks says little about
 * today; when animals show signs, anything not tested in the last week is worth testing now; ammonia and
 * nitrite from before the signs began say little about now.
 */
export const WATER_CHECK_RULES = {
  recentTestDays: 14,
  retestWithSignsDays: 7,
  ammoniaNitriteHours: 24,
  swingLookbackDays: 7,
  dosedSwingLookbackDays: 30,
  provenance: 'common practice, no source',
} as const;

function label(key: ParameterKey): string {
  return key === 'pH' ? 'pH' : parameterInfo(key).label.toLowerCase();
}

function daysAgo(ctx: CheckContext, iso: string): number {
  return Math.floor((ctx.nowMs - toMs(iso)) / DAY_MS);
}

function agoText(days: number): string {
  return days <= 0 ? 'today' : days === 1 ? 'yesterday' : `${days} days ago`;
}

/** Latest values outside the profile's ideal band, most severe first. */
export function waterOutOfRange(ctx: CheckContext): CheckItem | null {
  const danger: string[] = [];
  const caution: string[] = [];
  const parameters: ParameterKey[] = [];
  for (const key of PARAMETER_KEYS) {
    const range = ctx.input.profile.ranges[key];
    const known = range ? ctx.timeline.lastKnown(key, ctx.nowMs) : null;
    if (!range || !known || ctx.nowMs - toMs(known.takenAt) > WATER_CHECK_RULES.recentTestDays * DAY_MS)
      continue;
    const verdict = classify(known.value, range);
    if (verdict.level === 'ok') continue;
    const text = `${formatReading(key, known.value)} (${agoText(daysAgo(ctx, known.takenAt))}, ${verdict.direction})`;
    (verdict.level === 'danger' ? danger : caution).push(text);
    parameters.push(key);
  }
  if (parameters.length === 0) return null;
  return {
    key: 'water-out-of-range',
    title: `Deal with the water first: ${listOf([...danger, ...caution])}`,
    why: `The latest tests are outside the range for ${ctx.input.profile.animals}. Follow the steps on those results before looking further, and test again to make sure of them.`,
    parameters,
    provenance: commonPractice("The ranges are the tank's care profile."),
  };
}

export function ammoniaNitriteToday(ctx: CheckContext): CheckItem | null {
  if (!ctx.anySign) return null;
  const since = ctx.nowMs - WATER_CHECK_RULES.ammoniaNitriteHours * 3_600_000;
  const missing = (['ammonia', 'nitrite'] as const).filter((key) => {
    const known = ctx.timeline.lastKnown(key, ctx.nowMs);
    return !known || toMs(known.takenAt) < since;
  });
  if (missing.length === 0) return null;
  return {
    key: 'ammonia-nitrite-today',
    title: 'Test ammonia and nitrite today, with pH and temperature',
    why: `${missing.length === 2 ? 'Neither has' : `${parameterInfo(missing[0] as ParameterKey).label.split(' ')[0]} has not`} been tested since the signs began. They can rise in an established tank too (a dead animal, overfeeding, a filter that stopped), and the tests take minutes. pH and temperature show how much of the ammonia is the harmful part.`,
    parameters: ['ammonia', 'nitrite', 'pH', 'temperature'],
    provenance: COMMON_PRACTICE,
  };
}

function temperatureSwing(ctx: CheckContext): string | null {
  const rule = TREND_RULES.temperatureSwing;
  const points = ctx.timeline.series(
    'temperature',
    ctx.nowMs - WATER_CHECK_RULES.swingLookbackDays * DAY_MS,
    ctx.nowMs,
  );
  let worst = 0;
  for (let i = 0; i < points.length; i++) {
    const end = points[i]!;
    for (let j = i - 1; j >= 0 && end.ms - points[j]!.ms <= rule.windowHours * 3_600_000; j--) {
      worst = Math.max(worst, Math.abs(end.value - points[j]!.value));
    }
  }
  return worst > rule.maxRange
    ? `temperature moved ${formatNumber('temperature', worst)} °C within a day`
    : null;
}

function salinityDrift(ctx: CheckContext): string | null {
  const rule = TREND_RULES.salinityDrift;
  if (!ctx.input.profile.ranges.salinity) return null;
  const values = ctx.timeline
    .series('salinity', ctx.nowMs - rule.windowDays * DAY_MS, ctx.nowMs)
    .map((p) => p.value);
  if (values.length < 2) return null;
  const spread = Math.max(...values) - Math.min(...values);
  return spread > rule.maxRange ? `salinity moved ${formatNumber('salinity', spread)} in a week` : null;
}

/** Alkalinity, calcium or magnesium changing faster between two tests than it is safe to raise it by dosing. */
function dosedSwings(ctx: CheckContext): string[] {
  const out: string[] = [];
  for (const key of DOSED_PARAMETERS) {
    if (!ctx.input.profile.ranges[key]) continue;
    const points = ctx.timeline.series(
      key,
      ctx.nowMs - WATER_CHECK_RULES.dosedSwingLookbackDays * DAY_MS,
      ctx.nowMs,
    );
    let worst: { change: number; days: number } | null = null;
    for (let i = 1; i < points.length; i++) {
      const change = points[i]!.value - points[i - 1]!.value;
      const days = Math.max(1, (points[i]!.ms - points[i - 1]!.ms) / DAY_MS);
      if (
        Math.abs(change) > MAX_SAFE_DAILY_RISE[key] * days &&
        (!worst || Math.abs(change) / days > Math.abs(worst.change) / worst.days)
      ) {
        worst = { change, days };
      }
    }
    if (worst) {
      const unit = parameterInfo(key).unit;
      out.push(
        `${label(key)} ${worst.change > 0 ? 'rose' : 'fell'} ${formatNumber(key, Math.abs(worst.change))} ${unit} in ${Math.round(worst.days)} day(s)`,
      );
    }
  }
  return out;
}

export function swings(ctx: CheckContext): CheckItem | null {
  const found = [temperatureSwing(ctx), salinityDrift(ctx), ...dosedSwings(ctx)].filter(
    (s): s is string => s !== null,
  );
  if (found.length === 0) return null;
  return {
    key: 'swings',
    title: 'Look at the swings, not only the levels',
    why: `${found.map(capitalised).join('; ')}. Animals cope better with a steady value a little off than with one that keeps moving, and every single test can be in range while it moves. Find what drives it (heater, top-up water, dosing) before correcting anything.`,
    provenance: commonPractice(
      `Same limits as the trend rules (${TREND_RULES.temperatureSwing.maxRange} °C a day, ${TREND_RULES.salinityDrift.maxRange} a week) and the daily dosing limits (${DOSED_PARAMETERS.map((k) => `${MAX_SAFE_DAILY_RISE[k]} ${parameterInfo(k).unit}`).join(', ')} a day).`,
    ),
  };
}

/** With signs but no swing seen: one test a day cannot show a swing within the day. */
export function temperatureThroughTheDay(ctx: CheckContext): CheckItem | null {
  if (!ctx.anySign || temperatureSwing(ctx) !== null) return null;
  const points = ctx.timeline.series(
    'temperature',
    ctx.nowMs - WATER_CHECK_RULES.swingLookbackDays * DAY_MS,
    ctx.nowMs,
  );
  const twoInADay = points.some(
    (p, i) => i > 0 && p.ms - points[i - 1]!.ms < TREND_RULES.temperatureSwing.windowHours * 3_600_000,
  );
  if (twoInADay) return null;
  return {
    key: 'temperature-through-the-day',
    title: 'Read the thermometer morning and evening for two days',
    why: 'One reading a day cannot show a heater sticking on or off, or the room warming up in the afternoon sun.',
    parameters: ['temperature'],
    provenance: COMMON_PRACTICE,
  };
}

/**
 * Parameters the profile schedules that are due or overdue, and (when animals show signs) anything the
 * profile has a range for that was not tested in the last week: the rarely tested ones most of all.
 */
export function notTestedLately(ctx: CheckContext): CheckItem | null {
  const { tank, profile } = ctx.input;
  const due = dueTests(
    {
      phase: tank.phase,
      systemType: tank.systemType,
      profile,
      ...(tank.createdAt ? { createdAt: tank.createdAt } : {}),
    },
    ctx.timeline.tests,
    ctx.input.now,
  );
  const rows = new Map<ParameterKey, string>();
  for (const d of due) {
    if (d.status === 'ok') continue;
    rows.set(
      d.parameter,
      d.lastTestedAt
        ? `${label(d.parameter)} (${agoText(daysAgo(ctx, d.lastTestedAt))}, every ${d.cadenceDays} days)`
        : `${label(d.parameter)} (never)`,
    );
  }
  if (ctx.anySign) {
    for (const key of PARAMETER_KEYS) {
      if (!profile.ranges[key] || rows.has(key)) continue;
      const known = ctx.timeline.lastKnown(key, ctx.nowMs);
      if (!known) rows.set(key, `${label(key)} (never)`);
      else if (ctx.nowMs - toMs(known.takenAt) > WATER_CHECK_RULES.retestWithSignsDays * DAY_MS) {
        rows.set(key, `${label(key)} (${agoText(daysAgo(ctx, known.takenAt))})`);
      }
    }
  }
  if (rows.size === 0) return null;
  const parameters = PARAMETER_KEYS.filter((k) => rows.has(k));
  const rare = parameters.filter((k) => (profile.cadences.established[k] ?? 0) >= 14);
  return {
    key: 'not-tested-lately',
    title: `Test what has not been tested lately: ${listOf(parameters.map((k) => rows.get(k) as string))}`,
    why: `A problem nobody tests for stays invisible.${rare.length ? ` ${capitalised(listOf(rare.map(label)))} ${rare.length > 1 ? 'are' : 'is'} tested rarely, so ${rare.length > 1 ? 'they drift' : 'it drifts'} unnoticed.` : ''}`,
    parameters,
    provenance: commonPractice(
      'Cadences are the care profile’s; a week without a test while animals show signs is common practice.',
    ),
  };
}
