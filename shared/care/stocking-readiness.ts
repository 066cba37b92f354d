import type { CycleStage } from './cycle-constants';
import { formatReading, isParameterKey, parameterInfo, type ParameterKey } from './parameters';
import type { CareProfile } from './profiles/types';
import { sortByTakenAt } from './readings';
import { DAY_MS, isoDate, toMs } from './time';
import type { WaterTestInput } from './types';

export interface StockingChecklist {
  equipmentRunning: boolean;
  quarantinePlan: boolean;
  foodReady: boolean;
}

export interface MentorSignOff {
  mentorId: string;
  signedAt: string;
}

export interface StockingReadinessInput {
  stage: CycleStage;
  recentTests: readonly WaterTestInput[];
  profile: CareProfile;
  checklist: StockingChecklist;
  signOff?: MentorSignOff | null;
  now: string;
  /** Days the water must have stayed in the ideal band. Default 7 (common practice, no source). */
  daysInBand?: number;
}

export type ReadinessKey =
  'cycled' | 'parameters-in-band' | 'equipment' | 'quarantine' | 'food' | 'mentor-sign-off';

export interface ReadinessItem {
  key: ReadinessKey;
  label: string;
  met: boolean;
  detail: string;
}

export interface StockingReadiness {
  ready: boolean;
  items: ReadinessItem[];
}

/** Tests may be a day short of the full window (a test every day starting "7 days ago" spans 6 days). */
const WINDOW_SLACK_DAYS = 1;

/** Parameters tested at least as often as the window must each show up inside it. */
function requiredParameters(profile: CareProfile, days: number): ParameterKey[] {
  return Object.entries(profile.cadences.established)
    .filter(
      (entry): entry is [ParameterKey, number] =>
        isParameterKey(entry[0]) && entry[1] !== undefined && entry[1] <= days,
    )
    .map(([key]) => key)
    .filter((key) => profile.ranges[key] !== undefined);
}

function bandItem(input: StockingReadinessInput, days: number): ReadinessItem {
  const label = `Water in the ideal range for ${days} days`;
  const nowMs = toMs(input.now);
  const inWindow = sortByTakenAt(input.recentTests).filter((t) => {
    const ms = toMs(t.takenAt);
    return ms <= nowMs && ms >= nowMs - days * DAY_MS;
  });
  const first = inWindow[0];
  const last = inWindow[inWindow.length - 1];
  if (!first || !last)
    return { key: 'parameters-in-band', label, met: false, detail: `No tests in the last ${days} days.` };
  const problems: string[] = [];
  const span = (toMs(last.takenAt) - toMs(first.takenAt)) / DAY_MS;
  if (span < days - WINDOW_SLACK_DAYS) {
    problems.push(`tests only cover ${Math.floor(span)} of the last ${days} days`);
  }
  for (const key of requiredParameters(input.profile, days)) {
    if (!inWindow.some((t) => t.values[key] !== undefined))
      problems.push(`no ${parameterInfo(key).label.toLowerCase()} test`);
  }
  for (const t of inWindow) {
    for (const [key, value] of Object.entries(t.values) as [ParameterKey, number | undefined][]) {
      const range = input.profile.ranges[key];
      if (value === undefined || !range) continue;
      if (value < range.ideal[0] || value > range.ideal[1])
        problems.push(`${formatReading(key, value)} on ${isoDate(t.takenAt)}`);
    }
  }
  return problems.length === 0
    ? {
        key: 'parameters-in-band',
        label,
        met: true,
        detail: `${inWindow.length} tests, all in the ideal range.`,
      }
    : { key: 'parameters-in-band', label, met: false, detail: `Not yet: ${problems.join('; ')}.` };
}

/** Whether a tank is ready for its first animals, and what is still missing. */
export function stockingReadiness(input: StockingReadinessInput): StockingReadiness {
  const days = input.daysInBand ?? 7;
  const notes = input.profile.readinessNotes ?? {};
  const { checklist } = input;
  const signOff = input.signOff ?? null;
  const signed = signOff !== null && toMs(signOff.signedAt) <= toMs(input.now);
  const items: ReadinessItem[] = [
    {
      key: 'cycled',
      label: 'Nitrogen cycle finished',
      met: input.stage === 'cycled',
      detail:
        input.stage === 'cycled'
          ? 'Ammonia and nitrite stay at 0 with nitrate present.'
          : `The cycle is at "${input.stage}": wait until ammonia and nitrite stay at 0.`,
    },
    bandItem(input, days),
    {
      key: 'equipment',
      label: 'Equipment running',
      met: checklist.equipmentRunning,
      detail: [
        checklist.equipmentRunning
          ? 'Filter, heater and flow are running.'
          : 'Run the filter, heater and flow for a few days first.',
        notes.equipment,
      ]
        .filter(Boolean)
        .join(' '),
    },
    {
      key: 'quarantine',
      label: 'Quarantine plan for the new animals',
      met: checklist.quarantinePlan,
      detail: checklist.quarantinePlan
        ? 'Quarantine plan in place.'
        : (notes.quarantine ?? 'Plan where new animals will be quarantined before they join the tank.'),
    },
    {
      key: 'food',
      label: 'Food ready',
      met: checklist.foodReady,
      detail: [
        checklist.foodReady ? 'Food is ready.' : 'Get the right food before the animals arrive.',
        notes.food,
      ]
        .filter(Boolean)
        .join(' '),
    },
    {
      key: 'mentor-sign-off',
      label: 'Mentor has signed off',
      met: signed,
      detail:
        signed && signOff
          ? `Signed off on ${isoDate(signOff.signedAt)}.`
          : 'Ask your mentor to look over the tank and sign off.',
    },
  ];
  return { ready: items.every((i) => i.met), items };
}
