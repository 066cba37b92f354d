import { COMMON_PRACTICE, SOURCES, commonPractice, type Provenance } from '../provenance';
import type { ObservationCheck, ObservationScale, ObservationValue } from './vocabulary';
import type { Severity } from '../types';

export interface SignRule {
  severity: Severity;
  /** The sign in a reason: "Yellow seahorse: breathing fast." */
  seen: string;
  /** Why it matters, in plain words; never a diagnosis. */
  why?: string;
  provenance: Provenance;
}

const WATER_FIRST = 'The water is the first thing to check.';

/**
 * How much one sign worries us on its own. Unusual values without a rule here (e.g. a faded colour) are
 * worth noting but raise nothing. Common practice, no source, unless a source is named.
 */
export const SIGN_RULES: {
  readonly [S in ObservationScale]: Partial<Record<ObservationValue<S>, SignRule>>;
} = {
  feedingResponse: {
    slow: { severity: 'info', seen: 'slow to eat', provenance: COMMON_PRACTICE },
    'spat-out': {
      severity: 'caution',
      seen: 'spat food out',
      why: 'Food taken and spat out is not eaten.',
      provenance: COMMON_PRACTICE,
    },
    'ignored-food': { severity: 'caution', seen: 'did not eat', provenance: COMMON_PRACTICE },
  },
  breathing: {
    fast: {
      severity: 'caution',
      seen: 'breathing fast',
      why: WATER_FIRST,
      provenance: SOURCES.noga2010,
    },
    laboured: {
      severity: 'urgent',
      seen: 'breathing hard',
      why: `Breathing hard can get worse within hours. ${WATER_FIRST}`,
      provenance: SOURCES.noga2010,
    },
    'at-surface': {
      severity: 'urgent',
      seen: 'gasping at the surface',
      why: `Gasping at the surface can get worse within hours. ${WATER_FIRST}`,
      provenance: SOURCES.noga2010,
    },
  },
  buoyancy: {
    floating: {
      severity: 'caution',
      seen: 'floating up and struggling to stay down',
      provenance: COMMON_PRACTICE,
    },
    sinking: { severity: 'caution', seen: 'sinking and struggling to stay up', provenance: COMMON_PRACTICE },
    tilted: { severity: 'caution', seen: 'tilted in the water', provenance: COMMON_PRACTICE },
  },
  colour: {
    patchy: { severity: 'caution', seen: 'patchy colour', provenance: COMMON_PRACTICE },
  },
  bodyCondition: {
    thin: {
      severity: 'caution',
      seen: 'thin',
      why: 'An animal gets thin over days or weeks: it is not getting enough food.',
      provenance: COMMON_PRACTICE,
    },
    'very-thin': {
      severity: 'caution',
      seen: 'very thin',
      why: 'An animal gets thin over days or weeks: it is not getting enough food.',
      provenance: COMMON_PRACTICE,
    },
  },
  spots: {
    'fine-white-grains': {
      severity: 'caution',
      seen: 'fine white grains on the body',
      why: 'Spots like these can spread to other animals.',
      provenance: COMMON_PRACTICE,
    },
    'dusty-film': {
      severity: 'urgent',
      seen: 'a dusty film on the body',
      why: 'A film like this can spread through a tank within days.',
      provenance: commonPractice('Keepers treat a dusty film as needing help the same day.'),
    },
    'larger-white': { severity: 'caution', seen: 'larger white spots', provenance: COMMON_PRACTICE },
    dark: { severity: 'caution', seen: 'dark spots', provenance: COMMON_PRACTICE },
    red: { severity: 'caution', seen: 'red patches', provenance: COMMON_PRACTICE },
  },
  fins: {
    clamped: { severity: 'info', seen: 'fins held close to the body', provenance: COMMON_PRACTICE },
    frayed: { severity: 'caution', seen: 'frayed or torn fins', provenance: COMMON_PRACTICE },
    reddened: { severity: 'caution', seen: 'fins red at the base', provenance: COMMON_PRACTICE },
  },
  hiding: {
    'more-than-usual': { severity: 'info', seen: 'hiding more than usual', provenance: COMMON_PRACTICE },
    always: { severity: 'caution', seen: 'hiding all the time', provenance: COMMON_PRACTICE },
  },
};

/** Checks ticked on an observation. Common practice, no source. */
export const CHECK_RULES: Readonly<Record<ObservationCheck, SignRule>> = {
  scratching: {
    severity: 'info',
    seen: 'rubbing or scratching on rock or sand',
    why: 'Once now and then is normal; again and again is not.',
    provenance: COMMON_PRACTICE,
  },
  lethargic: { severity: 'caution', seen: 'listless, not moving much', provenance: COMMON_PRACTICE },
  restingOnBottom: { severity: 'caution', seen: 'resting on the bottom', provenance: COMMON_PRACTICE },
  swollenBelly: { severity: 'caution', seen: 'a swollen belly', provenance: COMMON_PRACTICE },
  cloudyEyes: { severity: 'caution', seen: 'cloudy eyes', provenance: COMMON_PRACTICE },
  wounds: { severity: 'caution', seen: 'wounds or sores', provenance: COMMON_PRACTICE },
  stringyWaste: { severity: 'info', seen: 'stringy white waste', provenance: COMMON_PRACTICE },
  polypsRetracted: { severity: 'info', seen: 'coral polyps pulled in', provenance: COMMON_PRACTICE },
  stayingAtSurface: {
    severity: 'caution',
    seen: 'staying at the surface',
    why: WATER_FIRST,
    provenance: SOURCES.noga2010,
  },
};

/** Patterns across signs, observations and animals. */
export const PATTERN_RULES = {
  /**
   * Meals refused on observations at least this far apart, with none eaten between: "two days running"
   * (a refusal on one evening and again the next counts). Seahorses have no true stomach and need food
   * several times a day, so on a seahorse tank it is urgent at once; other animals usually cope with a few
   * days, so it is a caution, urgent after `otherUrgentDays`.
   */
  notEating: {
    minHours: 20,
    otherUrgentDays: 4,
    provenanceSeahorse: SOURCES.koldewey2005,
    provenanceOther: COMMON_PRACTICE,
  },
  /** Scratching seen on this many observations at least `minHours` apart in the window: a caution. */
  repeatedScratching: { minObservations: 2, minHours: 12, provenance: COMMON_PRACTICE },
  /** Breathing not as usual while staying at the surface: urgent. */
  surfaceBreathing: { severity: 'urgent' as Severity, provenance: SOURCES.noga2010 },
  /**
   * A caution or worse on two or more animals, or on an observation of "some" or "all" of a group:
   * several animals at once points to the water or to something spreading. Urgent.
   */
  severalAnimals: { minAnimals: 2, severity: 'urgent' as Severity, provenance: SOURCES.noga2010 },
} as const;
