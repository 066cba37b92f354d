/**
 * What a keeper can record when watching the animals: the one list the form, the schema, the timeline and
 * the rules all read. Each scale starts at its usual state. Values are never removed or renamed (stored
 * observations use them); new ones are added at the end of a scale.
 */
export const OBSERVATION_SCALES = {
  /** Feeding: eating, spitting food out, not eating. */
  feedingResponse: ['eager', 'normal', 'slow', 'spat-out', 'ignored-food'],
  breathing: ['normal', 'fast', 'laboured', 'at-surface'],
  /** Position and posture in the water. */
  buoyancy: ['normal', 'floating', 'sinking', 'tilted'],
  colour: ['normal', 'faded', 'darker', 'patchy'],
  /** Body condition seen from the side and from above. */
  bodyCondition: ['normal', 'thin', 'very-thin'],
  /** Skin: spots and films. */
  spots: ['none', 'fine-white-grains', 'dusty-film', 'larger-white', 'dark', 'red'],
  fins: ['normal', 'clamped', 'frayed', 'reddened'],
  /** Behaviour: hiding. */
  hiding: ['normal', 'more-than-usual', 'always'],
} as const;

export type ObservationScale = keyof typeof OBSERVATION_SCALES;
export type ObservationValue<S extends ObservationScale = ObservationScale> =
  (typeof OBSERVATION_SCALES)[S][number];
export const OBSERVATION_SCALE_KEYS = Object.keys(OBSERVATION_SCALES) as ObservationScale[];

/** The values of each scale that say "looked, nothing unusual". */
export const USUAL_VALUES: { readonly [S in ObservationScale]: readonly ObservationValue<S>[] } = {
  feedingResponse: ['eager', 'normal'],
  breathing: ['normal'],
  buoyancy: ['normal'],
  colour: ['normal'],
  bodyCondition: ['normal'],
  spots: ['none'],
  fins: ['normal'],
  hiding: ['normal'],
};

/** Feeding values that mean the animal took its food. */
export const ATE_VALUES: readonly ObservationValue<'feedingResponse'>[] = ['eager', 'normal', 'slow'];
/** Feeding values that mean no food went down. */
export const DID_NOT_EAT_VALUES: readonly ObservationValue<'feedingResponse'>[] = [
  'spat-out',
  'ignored-food',
];

/** Things seen or not, ticked when seen (`false` = looked for, not seen). */
export const OBSERVATION_CHECKS = [
  'scratching',
  'lethargic',
  'restingOnBottom',
  'swollenBelly',
  'cloudyEyes',
  'wounds',
  'stringyWaste',
  'polypsRetracted',
  'stayingAtSurface',
] as const;
export type ObservationCheck = (typeof OBSERVATION_CHECKS)[number];

/** Whether the observation is about one animal, some of a group, or all of them. */
export const OBSERVATION_AFFECTED = ['one', 'some', 'all'] as const;
export type ObservationAffected = (typeof OBSERVATION_AFFECTED)[number];

export const BREATHS_PER_MINUTE_MAX = 400;
export const OBSERVATION_ANIMAL_MAX = 120;
export const OBSERVATION_TEXT_MAX = 4000;

/** What was seen, as recorded: every field optional, at least one sign present (the schema checks it). */
export interface ObservationSigns {
  /** Which animals, in the keeper's words. */
  animal?: string;
  /** The tank's livestock entry the observation is about, if any. */
  livestockId?: string;
  affected?: ObservationAffected;
  feedingResponse?: ObservationValue<'feedingResponse'>;
  breathing?: ObservationValue<'breathing'>;
  breathsPerMinute?: number;
  buoyancy?: ObservationValue<'buoyancy'>;
  colour?: ObservationValue<'colour'>;
  bodyCondition?: ObservationValue<'bodyCondition'>;
  spots?: ObservationValue<'spots'>;
  fins?: ObservationValue<'fins'>;
  hiding?: ObservationValue<'hiding'>;
  checks?: Partial<Record<ObservationCheck, boolean>>;
  /** A photo of the tank's, already uploaded. */
  photoId?: string;
  /** The keeper's own words. */
  text?: string;
}

/** One observation as the engine reads it. */
export interface ObservationInput extends ObservationSigns {
  id: string;
  /** ISO timestamp of when the animals were watched. */
  observedAt: string;
}
