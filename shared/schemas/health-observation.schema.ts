import { z } from 'zod';
import {
  BREATHS_PER_MINUTE_MAX,
  OBSERVATION_AFFECTED,
  OBSERVATION_ANIMAL_MAX,
  OBSERVATION_CHECKS,
  OBSERVATION_SCALES,
  OBSERVATION_TEXT_MAX,
  type ObservationScale,
  type ObservationSigns,
} from '../care/observations/vocabulary';
import { uuid } from './common';

const text = (max: number) => z.string().trim().max(max, `Keep it under ${max} characters.`);
const scale = <S extends ObservationScale>(s: S) =>
  z
    .enum(OBSERVATION_SCALES[s], { message: `Choose one of: ${OBSERVATION_SCALES[s].join(', ')}.` })
    .optional();

/** Fields that say which animals, not what was seen. */
const WHO = ['animal', 'livestockId', 'affected'] as const;

/**
 * A health observation of one animal or a group: the signs from the shared vocabulary, an optional photo and
 * the keeper's own words. Stored as the details of an `observation` tank event; the form and the server
 * both validate with this.
 */
export const healthObservationSchema = z
  .object({
    animal: text(OBSERVATION_ANIMAL_MAX).optional(),
    livestockId: uuid.optional(),
    affected: z
      .enum(OBSERVATION_AFFECTED, { message: `Choose one of: ${OBSERVATION_AFFECTED.join(', ')}.` })
      .optional(),
    feedingResponse: scale('feedingResponse'),
    breathing: scale('breathing'),
    breathsPerMinute: z
      .number({ message: 'Enter a whole number of breaths.' })
      .int('Enter a whole number of breaths.')
      .min(0, 'Cannot be below 0.')
      .max(BREATHS_PER_MINUTE_MAX, `At most ${BREATHS_PER_MINUTE_MAX}.`)
      .optional(),
    buoyancy: scale('buoyancy'),
    colour: scale('colour'),
    bodyCondition: scale('bodyCondition'),
    spots: scale('spots'),
    fins: scale('fins'),
    hiding: scale('hiding'),
    checks: z.partialRecord(z.enum(OBSERVATION_CHECKS), z.boolean()).optional(),
    photoId: uuid.optional(),
    text: text(OBSERVATION_TEXT_MAX).optional(),
  })
  .strict()
  .refine(
    (o) =>
      Object.entries(o).some(
        ([key, v]) =>
          !(WHO as readonly string[]).includes(key) &&
          v !== undefined &&
          v !== '' &&
          !(typeof v === 'object' && Object.keys(v).length === 0),
      ),
    'Record at least one thing you saw.',
  ) satisfies z.ZodType<ObservationSigns>;

export type HealthObservationInput = z.input<typeof healthObservationSchema>;
export type HealthObservation = z.output<typeof healthObservationSchema>;
