import type { AnyParameterKey, ParameterKey } from './parameters';
import type { SystemType } from './system-types';
import type { LastKnown } from './evaluation/free-ammonia';
import type { TestTimeline } from './test-timeline';

/** One water test as the member entered it, already converted to canonical units. */
export interface WaterTestInput {
  id: string;
  /** ISO 8601 timestamp. */
  takenAt: string;
  values: Partial<Record<ParameterKey, number>>;
}

export type TankPhase = 'cycling' | 'established';

export type Severity = 'info' | 'caution' | 'urgent';

export const SEVERITIES: readonly Severity[] = ['info', 'caution', 'urgent'];

export interface Concern {
  parameter: AnyParameterKey;
  severity: Severity;
  /** Plain language a beginner can act on. */
  reason: string;
  /** Stable id of the rule that fired; the dedupe key ("one concern per cause"). */
  rule: string;
  nextSteps: string[];
  value?: number;
  unit?: string;
  /** The water changes behind a "change N litres" step, as planned by the chemistry engine. */
  waterChanges?: { litres: number; fraction: number; resulting: number }[];
}

export interface TankContext {
  volumeL: number;
  phase: TankPhase;
  systemType: SystemType;
  /**
   * Whether animals live in the tank now. Defaults: false while cycling, true once established.
   */
  hasLivestock?: boolean;
}

export interface EvaluationContext {
  tank: TankContext;
  /**
   * Earlier tests of the same tank, any order. May include the reading itself; it is ignored. Pass a
   * `TestTimeline` (`indexTests(tests)`) when judging the same history more than once: it is read once.
   */
  history: readonly WaterTestInput[] | TestTimeline;
  /**
   * The tank's last known temperature, pH and salinity before the reading, when the caller has them from the whole
   * record (the server and the form's preview do); otherwise they are looked up in `history` by the same rule.
   */
  lastKnown?: LastKnown;
  sourceWater?: { nitrate?: number };
  /** ISO timestamp; the engine never reads the clock. */
  now: string;
}

export function severityRank(severity: Severity): number {
  return SEVERITIES.indexOf(severity);
}
