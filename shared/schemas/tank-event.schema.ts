import { z } from 'zod';
import { uuid } from './common';
import { healthObservationSchema } from './health-observation.schema';
import { cursor, isoDateTime, MAX_TANK_VOLUME_L, tankParams } from './tank.schema';
import { nitrateEntrySchema, salinityEntrySchema } from './water-test.schema';

export const TANK_EVENT_KINDS = [
  'water-change',
  'supplement-dose',
  'feeding-note',
  'equipment-change',
  'livestock-added',
  'livestock-removed',
  'observation',
] as const;
export type TankEventKind = (typeof TANK_EVENT_KINDS)[number];
/** Written by the livestock list itself, never posted directly, so the two always agree. */
export const LIVESTOCK_EVENT_KINDS = [
  'livestock-added',
  'livestock-removed',
] as const satisfies readonly TankEventKind[];

export const SOURCE_WATER_TYPES = [
  'natural-sea-water',
  'mixed-salt',
  'ro-di-fresh',
  'tap-conditioned',
] as const;
export const DOSE_UNITS = ['mL', 'L', 'g', 'mg', 'drops', 'capsules', 'scoops', 'tsp'] as const;
export const EQUIPMENT_CHANGES = ['added', 'removed', 'replaced', 'adjusted', 'cleaned', 'failed'] as const;

/** The observation vocabulary lives with the rules that read it; re-exported for the forms that list it. */
export { OBSERVATION_CHECKS, OBSERVATION_SCALES } from '../care/observations/vocabulary';

const text = (max: number) => z.string().trim().max(max, `Keep it under ${max} characters.`);
const label = (what: string) =>
  z
    .string({ message: `Say which ${what}.` })
    .trim()
    .min(1, `Say which ${what}.`)
    .max(120, 'Keep it under 120 characters.');

export const waterChangeDetailsSchema = z
  .object({
    volumeL: z.number().positive('Must be more than 0.').max(MAX_TANK_VOLUME_L).optional(),
    percent: z.number().positive('Must be more than 0.').max(100, 'At most 100 %.').optional(),
    sourceWater: z.enum(SOURCE_WATER_TYPES, {
      message: `Choose the new water: ${SOURCE_WATER_TYPES.join(', ')}.`,
    }),
    /** Measured in the new water, if known. */
    sourceNitrate: nitrateEntrySchema.optional(),
    sourceSalinity: salinityEntrySchema.optional(),
  })
  .strict()
  .superRefine((d, ctx) => {
    if ((d.volumeL === undefined) === (d.percent === undefined)) {
      ctx.addIssue({
        code: 'custom',
        path: ['volumeL'],
        message: 'Give either the litres changed or the percentage, not both.',
      });
    }
  });

export const supplementDoseDetailsSchema = z
  .object({
    product: label('product'),
    amount: z.number({ message: 'Enter the amount.' }).positive('Must be more than 0.').max(100_000),
    unit: z.enum(DOSE_UNITS, { message: `Choose the unit: ${DOSE_UNITS.join(', ')}.` }),
  })
  .strict();

export const feedingNoteDetailsSchema = z
  .object({ food: label('food'), amount: text(80).optional() })
  .strict();

export const equipmentChangeDetailsSchema = z
  .object({
    equipment: label('equipment'),
    change: z.enum(EQUIPMENT_CHANGES, { message: `Choose what happened: ${EQUIPMENT_CHANGES.join(', ')}.` }),
  })
  .strict();

export const observationDetailsSchema = healthObservationSchema;

export const livestockAddedDetailsSchema = z
  .object({ livestockId: uuid, speciesCommonName: z.string(), count: z.number().int() })
  .strict();
export const livestockRemovedDetailsSchema = livestockAddedDetailsSchema
  .extend({ reason: z.string().nullable() })
  .strict();

export const TANK_EVENT_DETAILS_SCHEMAS = {
  'water-change': waterChangeDetailsSchema,
  'supplement-dose': supplementDoseDetailsSchema,
  'feeding-note': feedingNoteDetailsSchema,
  'equipment-change': equipmentChangeDetailsSchema,
  'livestock-added': livestockAddedDetailsSchema,
  'livestock-removed': livestockRemovedDetailsSchema,
  observation: observationDetailsSchema,
} as const satisfies Record<TankEventKind, z.ZodType>;

export type TankEventDetails<K extends TankEventKind = TankEventKind> = z.output<
  (typeof TANK_EVENT_DETAILS_SCHEMAS)[K]
>;

const occurredAt = isoDateTime;
const note = text(4000);
const posted = <K extends Exclude<TankEventKind, (typeof LIVESTOCK_EVENT_KINDS)[number]>>(kind: K) =>
  z
    .object({
      kind: z.literal(kind),
      occurredAt,
      note: note.default(''),
      details: TANK_EVENT_DETAILS_SCHEMAS[kind],
    })
    .strict();

export const createTankEventSchema = z.discriminatedUnion(
  'kind',
  [
    posted('water-change'),
    posted('supplement-dose'),
    posted('feeding-note'),
    posted('equipment-change'),
    posted('observation'),
  ],
  {
    message:
      'Choose the kind of entry: water-change, supplement-dose, feeding-note, equipment-change or observation.',
  },
);
export type CreateTankEventInput = z.input<typeof createTankEventSchema>;

/** The kind cannot change; `details`, when given, replace the old ones and are checked against the event's kind. */
export const updateTankEventSchema = z
  .object({ occurredAt: occurredAt.optional(), note: note.optional(), details: z.unknown().optional() })
  .strict()
  .refine((v) => Object.values(v).some((x) => x !== undefined), 'Change the time, the note or the details.');
export type UpdateTankEventInput = z.input<typeof updateTankEventSchema>;

export const tankEventParams = tankParams.extend({ eventId: uuid });
export const tankEventListQuery = z
  .object({
    kind: z.enum(TANK_EVENT_KINDS).optional(),
    limit: z.coerce.number().int().min(1).max(500).default(100),
    before: cursor.optional(),
  })
  .strict();

export const timelineQuery = z
  .object({ limit: z.coerce.number().int().min(1).max(100).default(30), before: cursor.optional() })
  .strict();
