export * from './vocabulary';
export {
  SIGN_WINDOWS,
  currentSigns,
  type NotEatingRun,
  type SeenAt,
  type SeenSign,
  type SubjectSigns,
} from './signs';
export { CHECK_RULES, PATTERN_RULES, SIGN_RULES, type SignRule } from './severity-rules';
export {
  CHECKLIST_STEP,
  VET_STEP,
  observationFindings,
  observationSeverity,
  type ObservationContext,
  type ObservationFinding,
} from './findings';
