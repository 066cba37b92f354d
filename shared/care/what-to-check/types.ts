import type { ObservationFinding } from '../observations/findings';
import type { SubjectSigns } from '../observations/signs';
import type { ObservationInput } from '../observations/vocabulary';
import type { ParameterKey } from '../parameters';
import type { CareProfile } from '../profiles/types';
import type { Provenance } from '../provenance';
import type { SystemType } from '../system-types';
import type { TestTimeline } from '../test-timeline';
import type { TankPhase, WaterTestInput } from '../types';

/** An animal on the tank's list. */
export interface LivestockSummary {
  id: string;
  name: string;
  /** When it joined the tank: a date (YYYY-MM-DD) or a timestamp. */
  addedOn: string;
  /** What the keeper wrote about quarantining it; empty when nothing was written. */
  quarantineNotes?: string;
  removedOn?: string | null;
}

/** A recent change to the tank, from its timeline. */
export interface RecentChange {
  kind: 'water-change' | 'supplement-dose' | 'equipment-change' | 'feeding-note';
  occurredAt: string;
  /** The keeper's words or the entry's summary ("Heater replaced", "Calcium dose 10 mL"). */
  summary?: string;
}

export interface WhatToCheckInput {
  observations: readonly ObservationInput[];
  profile: CareProfile;
  tank: { systemType: SystemType; phase: TankPhase; hasLivestock?: boolean; createdAt?: string };
  /** The tank's tests, any order (or indexed once with `indexTests`). */
  tests: readonly WaterTestInput[] | TestTimeline;
  livestock?: readonly LivestockSummary[];
  recentChanges?: readonly RecentChange[];
  /** ISO timestamp; the engine never reads the clock. */
  now: string;
}

export const CHECK_KEYS = [
  'oxygen-and-surface',
  'water-out-of-range',
  'ammonia-nitrite-today',
  'feeding',
  'swings',
  'temperature-through-the-day',
  'not-tested-lately',
  'flow-and-equipment',
  'recent-changes',
  'new-animals-and-quarantine',
  'tank-mates',
  'watch-and-log',
  'ask-mentor-and-vet',
] as const;
export type CheckKey = (typeof CHECK_KEYS)[number];

export interface CheckItem {
  key: CheckKey;
  /** What to do, as an instruction. */
  title: string;
  /** Why, in plain words, with this tank's figures where they exist. */
  why: string;
  /** Parameters to test, when the item is a test. */
  parameters?: ParameterKey[];
  provenance: Provenance;
}

export interface WhatToCheck {
  /** In order; always ends with `ask-mentor-and-vet`. */
  items: CheckItem[];
  /** The observation findings the list was built from. */
  findings: ObservationFinding[];
}

/** What every rule reads, worked out once. */
export interface CheckContext {
  input: WhatToCheckInput;
  nowMs: number;
  timeline: TestTimeline;
  subjects: readonly SubjectSigns[];
  findings: readonly ObservationFinding[];
  /** Any sign other than the usual on any animal. */
  anySign: boolean;
  seahorse: boolean;
}

export type CheckRule = (ctx: CheckContext) => CheckItem | null;
