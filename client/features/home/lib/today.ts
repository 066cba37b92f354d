import { useEffect, useState } from 'react';
import { groupDueByDay, parameterInfo, toTestToday, type DueByDay, type ParameterKey } from '@shared/care';
import { CYCLE_STAGE_WORDS } from '@shared/constants/tank-labels';
import type { HomeTank } from '@shared/schemas/home-views';

/** The clock, ticking once a minute, so "today" turns over at the member's midnight on a page left open. */
export function useMinuteClock(): number {
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    const id = setInterval(() => setNow(Date.now()), 60_000);
    return () => clearInterval(id);
  }, []);
  return now;
}

export interface TankToday {
  groups: DueByDay;
  /** What to test today, most overdue first: what the one action opens the form with. */
  toTest: ParameterKey[];
}

export function tankToday(tank: Pick<HomeTank, 'due'>, now: number, timeZone: string): TankToday {
  const groups = groupDueByDay(tank.due, { now: new Date(now).toISOString(), timeZone });
  return { groups, toTest: toTestToday(groups).map((d) => d.parameter) };
}

export type StateTone = 'settled' | 'cycling' | 'trouble';

/** The tank's state in words: its cycle stage while cycling, "Settled" once established (unless it slipped back). */
export function stateInWords(tank: Pick<HomeTank, 'phase' | 'cycleStage'>): {
  text: string;
  tone: StateTone;
} {
  if (tank.cycleStage === 'setback') return { text: 'Setback: ammonia or nitrite is back', tone: 'trouble' };
  if (tank.phase === 'established') return { text: 'Settled', tone: 'settled' };
  const words =
    tank.cycleStage === 'cycled' ? 'cycle looks done: ask your mentor' : CYCLE_STAGE_WORDS[tank.cycleStage];
  return { text: words.charAt(0).toUpperCase() + words.slice(1), tone: 'cycling' };
}

/** A parameter's name without the qualifier the form needs ("Ammonia (total)" → "Ammonia"): for chips and buttons. */
export const shortLabel = (k: ParameterKey) => parameterInfo(k).label.replace(/\s*\(.*\)$/, '');
