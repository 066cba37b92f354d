/**
 * Typical course of a new tank's nitrogen cycle, counted from the first ammonia seen.
 * Common practice, no source: keepers usually quote 4–6 weeks, with 2–8 weeks as the range.
 * Exported so the UI can show them with that label.
 */
export const CYCLE_DURATION_WEEKS = {
  typicalMin: 4,
  typicalMax: 6,
  rangeMin: 2,
  rangeMax: 8,
  provenance: 'common practice, no source',
} as const;

export const CYCLE_STAGES = [
  'not-started',
  'ammonia-rising',
  'nitrite-rising',
  'nitrite-falling',
  'cycled',
  'setback',
] as const;

export type CycleStage = (typeof CYCLE_STAGES)[number];

export interface CycleStageOptions {
  /** Days ammonia and nitrite must read zero (with nitrate present) before the tank counts as cycled. */
  cycledAfterDays?: number;
  /** Consecutive tests that must agree before the stage changes; 2 means one odd test never flips it. */
  confirmTests?: number;
  /** Readings at or below these count as zero (a kit's lowest step). Default 0 for both. */
  zeroAt?: { ammonia?: number; nitrite?: number };
  /** Nitrite this far below its peak (as a fraction of the peak) counts as falling. */
  nitriteFallFraction?: number;
  /** Projections never start before this time; defaults to the latest test. */
  now?: string;
}

/** Defaults: common practice, no source. */
export const CYCLE_STAGE_DEFAULTS = {
  cycledAfterDays: 7,
  confirmTests: 2,
  zeroAt: { ammonia: 0, nitrite: 0 },
  nitriteFallFraction: 0.2,
} as const;

export interface CycleProjection {
  earliest: string;
  likely: string;
  latest: string;
}

export interface CycleStageResult {
  stage: CycleStage;
  /** When the current stage began (for `cycled`: when it was confirmed). Null with no usable tests. */
  since: string | null;
  evidence: string[];
  projectedDoneAt?: CycleProjection;
}
