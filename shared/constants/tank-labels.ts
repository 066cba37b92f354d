import type { CycleStage } from '../care/cycle-constants';
import type { SystemType } from '../care/system-types';
import type { TankPhase } from '../care/types';
import type { TankShape } from '../chemistry/tank-volume';
import type { TestMethod } from '../readings/entry-units';
import type {
  ObservationAffected,
  ObservationCheck,
  ObservationScale,
  ObservationValue,
} from '../care/observations/vocabulary';
import type {
  DOSE_UNITS,
  EQUIPMENT_CHANGES,
  SOURCE_WATER_TYPES,
  TankEventKind,
} from '../schemas/tank-event.schema';

/** Words shown for the tank lists in shared/: one table each, keyed by the lists so none can be missed. */
export const SYSTEM_TYPE_LABELS: Record<SystemType, string> = {
  'marine-fish-only': 'Marine, fish only',
  reef: 'Reef (corals and fish)',
  seahorse: 'Seahorse tank',
  brackish: 'Brackish',
  'tropical-freshwater': 'Tropical freshwater',
  coldwater: 'Coldwater',
};

export const TANK_PHASE_LABELS: Record<TankPhase, { label: string; hint: string }> = {
  cycling: {
    label: 'Still cycling',
    hint: 'The filter bacteria are still growing: ammonia or nitrite still show up.',
  },
  established: {
    label: 'Established',
    hint: 'Ammonia and nitrite stay at zero and the tank is ready for (or has) animals.',
  },
};

/** Where a tank is in the nitrogen cycle, in a few words (the desk's rows, the home's tank cards). */
export const CYCLE_STAGE_WORDS: Record<CycleStage, string> = {
  'not-started': 'cycle not started',
  'ammonia-rising': 'cycling: ammonia',
  'nitrite-rising': 'cycling: nitrite up',
  'nitrite-falling': 'cycling: nitrite down',
  cycled: 'cycled',
  setback: 'setback',
};

export const TANK_SHAPE_LABELS: Record<TankShape, string> = {
  rectangle: 'Rectangular',
  cylinder: 'Round (cylinder)',
  bowfront: 'Bow-front',
};

export const TEST_METHOD_LABELS: Record<TestMethod, string> = {
  'liquid-kit': 'Liquid test kit',
  strip: 'Test strip',
  'digital-meter': 'Digital meter',
  refractometer: 'Refractometer',
  hydrometer: 'Hydrometer',
  lab: 'Lab test',
};

export const TANK_EVENT_KIND_LABELS: Record<TankEventKind, string> = {
  'water-change': 'Water change',
  'supplement-dose': 'Dose',
  'feeding-note': 'Feeding note',
  'equipment-change': 'Equipment',
  'livestock-added': 'Animals added',
  'livestock-removed': 'Animals left',
  observation: 'How the animals look',
};

export const SOURCE_WATER_LABELS: Record<(typeof SOURCE_WATER_TYPES)[number], string> = {
  'natural-sea-water': 'Natural sea water',
  'mixed-salt': 'Salt water I mixed',
  'ro-di-fresh': 'RO/DI fresh water',
  'tap-conditioned': 'Tap water with conditioner',
};

export const DOSE_UNIT_LABELS: Record<(typeof DOSE_UNITS)[number], string> = {
  mL: 'mL',
  L: 'L',
  g: 'g',
  mg: 'mg',
  drops: 'drops',
  capsules: 'capsules',
  scoops: 'scoops',
  tsp: 'teaspoons',
};

export const EQUIPMENT_CHANGE_LABELS: Record<(typeof EQUIPMENT_CHANGES)[number], string> = {
  added: 'Added',
  removed: 'Taken out',
  replaced: 'Replaced',
  adjusted: 'Adjusted',
  cleaned: 'Cleaned',
  failed: 'Stopped working',
};

export const OBSERVATION_SCALE_LABELS: Record<ObservationScale, string> = {
  feedingResponse: 'Feeding',
  breathing: 'Breathing (gills)',
  colour: 'Colour',
  buoyancy: 'Position and posture',
  bodyCondition: 'Body shape',
  spots: 'Spots or film on the body',
  fins: 'Fins',
  hiding: 'Hiding',
};

export const OBSERVATION_VALUE_LABELS: Record<ObservationValue, string> = {
  eager: 'Eager',
  normal: 'As usual',
  slow: 'Slow to eat',
  'spat-out': 'Spat food out',
  'ignored-food': 'Did not eat',
  fast: 'Fast',
  laboured: 'Laboured',
  'at-surface': 'Gasping at the surface',
  faded: 'Faded',
  darker: 'Darker',
  patchy: 'Patchy',
  floating: 'Floating up',
  sinking: 'Sinking',
  tilted: 'Tilted',
  thin: 'Thin (belly pinched in)',
  'very-thin': 'Very thin (bones or spine show)',
  none: 'None',
  'fine-white-grains': 'Fine white grains, like salt',
  'dusty-film': 'Dusty gold or grey film',
  'larger-white': 'Larger white spots',
  dark: 'Dark spots',
  red: 'Red patches',
  clamped: 'Held close to the body',
  frayed: 'Frayed or torn',
  reddened: 'Red at the base',
  'more-than-usual': 'More than usual',
  always: 'All the time',
};

export const OBSERVATION_CHECK_LABELS: Record<ObservationCheck, string> = {
  scratching: 'Rubbing or scratching on rock or sand',
  lethargic: 'Listless, not moving much',
  restingOnBottom: 'Resting on the bottom',
  swollenBelly: 'Swollen belly',
  cloudyEyes: 'Cloudy eyes',
  wounds: 'Wounds or sores',
  stringyWaste: 'Stringy white waste',
  polypsRetracted: 'Coral polyps pulled in',
  stayingAtSurface: 'Staying at the surface',
};

export const OBSERVATION_AFFECTED_LABELS: Record<ObservationAffected, string> = {
  one: 'One animal',
  some: 'Some of them',
  all: 'All of them',
};
