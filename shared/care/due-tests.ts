import { parameterInfo, type ParameterKey } from './parameters';
import { defaultProfileFor, type CareProfile } from './profiles';
import type { SystemType } from './system-types';
import { DAY_MS, addDays, toMs } from './time';
import type { Concern, TankPhase, WaterTestInput } from './types';

export interface DueTestsTank {
  phase: TankPhase;
  systemType: SystemType;
  /** The tank's profile; defaults to the system type's built-in one. */
  profile?: CareProfile;
  /** When the tank was set up. A parameter never tested is due from this moment (else from `now`). */
  createdAt?: string;
}

export type DueStatus = 'due' | 'overdue' | 'ok';

export interface DueTest {
  parameter: ParameterKey;
  cadenceDays: number;
  lastTestedAt: string | null;
  dueAt: string;
  /** Whole days past dueAt; 0 when not yet due. */
  overdueByDays: number;
  status: DueStatus;
}

/**
 * A test is `due` from dueAt for one day, then `overdue`. Common practice, no source: a day's grace
 * lets a member test "today" without being told off.
 */
export const DUE_GRACE_DAYS = 1;

/** Longer overdue than this many cadences: a caution, not just a reminder (common practice, no source). */
export const LONG_OVERDUE_CADENCES = 2;

function lastTested(
  history: readonly WaterTestInput[],
  parameter: ParameterKey,
  nowMs: number,
): string | null {
  let best: string | null = null;
  let bestMs = -Infinity;
  for (const t of history) {
    const ms = toMs(t.takenAt);
    if (t.values[parameter] === undefined || ms > nowMs || ms <= bestMs) continue;
    best = t.takenAt;
    bestMs = ms;
  }
  return best;
}

/** One row per parameter the profile schedules for the tank's phase, in the profile's order. */
export function dueTests(tank: DueTestsTank, history: readonly WaterTestInput[], now: string): DueTest[] {
  const profile = tank.profile ?? defaultProfileFor(tank.systemType);
  const cadence = profile.cadences[tank.phase];
  const nowMs = toMs(now);
  const rows: DueTest[] = [];
  for (const [key, days] of Object.entries(cadence) as [ParameterKey, number | undefined][]) {
    if (days === undefined) continue;
    const last = lastTested(history, key, nowMs);
    const dueAt = last ? addDays(last, days) : (tank.createdAt ?? now);
    const late = nowMs - toMs(dueAt);
    const overdueByDays = late > 0 ? Math.floor(late / DAY_MS) : 0;
    const status: DueStatus = late < 0 ? 'ok' : late < DUE_GRACE_DAYS * DAY_MS ? 'due' : 'overdue';
    rows.push({ parameter: key, cadenceDays: days, lastTestedAt: last, dueAt, overdueByDays, status });
  }
  return rows;
}

/** Overdue tests as concerns: `info` when a little late, `caution` when late by more than 2 cadences. */
export function overdueConcerns(due: readonly DueTest[]): Concern[] {
  const concerns: Concern[] = [];
  for (const d of due) {
    if (d.status !== 'overdue') continue;
    const label = parameterInfo(d.parameter).label;
    const long = d.overdueByDays > d.cadenceDays * (LONG_OVERDUE_CADENCES - 1);
    const when = d.lastTestedAt
      ? `last tested about ${d.overdueByDays + d.cadenceDays} days ago`
      : 'never tested';
    concerns.push({
      parameter: d.parameter,
      severity: long ? 'caution' : 'info',
      rule: `schedule.${d.parameter}.overdue`,
      reason: `${label} is ${d.overdueByDays} day(s) overdue (${when}; test every ${d.cadenceDays} day(s)). Problems you don't test for stay invisible.`,
      nextSteps: [
        `Test ${label.toLowerCase()} today.`,
        'Ask your mentor if you are unsure how to use the test kit.',
      ],
    });
  }
  return concerns;
}
