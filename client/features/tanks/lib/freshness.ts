import { DUE_GRACE_DAYS, LONG_OVERDUE_CADENCES } from '@shared/care/due-tests';
import type { CareProfile } from '@shared/care/profiles';
import { DAY_MS } from '@shared/care/time';
import type { TankPhase } from '@shared/care/types';

export type Freshness = 'fresh' | 'due' | 'stale' | 'never';

/** The tightest testing rhythm the profile asks of a tank in this phase, in days. */
export function shortestCadenceDays(profile: CareProfile, phase: TankPhase): number | undefined {
  const days = Object.values(profile.cadences[phase]).filter((d): d is number => typeof d === 'number');
  return days.length ? Math.min(...days) : undefined;
}

/**
 * How recent the last test is against the profile's rhythm: due after one cadence (plus the usual day's grace),
 * stale after LONG_OVERDUE_CADENCES of them — the same thresholds the care panel's due list uses.
 */
export function freshness(
  lastTestedAt: string | null,
  cadenceDays: number | undefined,
  now = Date.now(),
): Freshness {
  if (!lastTestedAt) return 'never';
  if (cadenceDays === undefined) return 'fresh';
  const ageDays = (now - Date.parse(lastTestedAt)) / DAY_MS;
  if (ageDays > cadenceDays * LONG_OVERDUE_CADENCES + DUE_GRACE_DAYS) return 'stale';
  if (ageDays > cadenceDays + DUE_GRACE_DAYS) return 'due';
  return 'fresh';
}
