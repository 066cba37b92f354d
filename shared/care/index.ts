export * from './parameters';
export * from './system-types';
export * from './types';
export * from './provenance';
export * from './profiles';
export { evaluateReading, dedupeConcerns } from './evaluation/evaluate-reading';
export { TREND_RULES, isTrendRule } from './evaluation/trend-rules';
export { MAX_WATER_CHANGE_FRACTION } from './evaluation/water-change';
export * from './cycle-constants';
export { cycleStage } from './cycle-stage';
export * from './due-tests';
export * from './due-by-day';
export * from './triage';
export * from './stocking-readiness';
export { sortByTakenAt, type KnownValue, type SeriesPoint, type TestPosition } from './readings';
export {
  FREE_AMMONIA_INPUTS,
  lastKnownInputs,
  type FreeAmmoniaInput,
  type LastKnown,
} from './evaluation/free-ammonia';
export { indexTests, TestTimeline } from './test-timeline';
export * from './observations';
export * from './what-to-check';
