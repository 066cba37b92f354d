import { z } from 'zod';
import { SYSTEM_TYPES } from '../care/system-types';
import type { TankPhase } from '../care/types';
import { MAX_DISPLACEMENT_FRACTION, TANK_SHAPES } from '../chemistry/tank-volume';
import { VOLUME_UNITS } from '../chemistry/units';
import { clubIdParams, uuid } from './common';

export const TANK_PHASES = ['cycling', 'established'] as const satisfies readonly TankPhase[];
export const MAX_TANK_VOLUME_L = 100_000;
export const CM_PER_INCH = 2.54;
export const LENGTH_UNITS = ['cm', 'in'] as const;

export const isoDateTime = z.iso.datetime({
  offset: true,
  message: 'Give a date and time with its offset, e.g. 2025-03-04T18:30:00+01:00 or …Z.',
});
export const isoDate = z.iso.date({ message: 'Give a date as YYYY-MM-DD.' });
/** Query-string switches: ?mine=1 or ?mine=true. */
export const flag = z.enum(['0', '1', 'true', 'false']).transform((v) => v === '1' || v === 'true');
/** An opaque paging position handed out by the server. */
export const cursor = z
  .string()
  .max(200)
  .regex(/^[A-Za-z0-9_-]+$/, 'That page position is not valid.');

export const tankParams = clubIdParams.extend({ tankId: uuid });

const side = z
  .number({ message: 'Enter a number.' })
  .positive('Must be more than 0.')
  .max(1000, 'That is larger than any tank.');

/** Inside measurements; a bow-front's bow is the extra depth at the centre (at most half the length). */
const dimensionsSchema = z
  .object({
    source: z.literal('dimensions'),
    shape: z.enum(TANK_SHAPES, { message: `Choose the shape: ${TANK_SHAPES.join(', ')}.` }),
    unit: z.enum(LENGTH_UNITS).default('cm'),
    length: side.optional(),
    width: side.optional(),
    height: side,
    diameter: side.optional(),
    bowDepth: z.number().min(0).max(1000).optional(),
    /** Water height, same unit; defaults to the full height. */
    fillHeight: side.optional(),
    /** Share of the water taken up by rock, sand and equipment. */
    displacementFraction: z.number().min(0).max(MAX_DISPLACEMENT_FRACTION).default(0),
  })
  .strict()
  .superRefine((d, ctx) => {
    const need: Record<(typeof TANK_SHAPES)[number], readonly string[]> = {
      rectangle: ['length', 'width'],
      cylinder: ['diameter'],
      bowfront: ['length', 'width', 'bowDepth'],
    };
    const allowed = new Set([...need[d.shape], 'height', 'fillHeight']);
    for (const f of need[d.shape]) {
      if (d[f as keyof typeof d] === undefined)
        ctx.addIssue({ code: 'custom', path: [f], message: `A ${d.shape} tank needs its ${f}.` });
    }
    for (const f of ['length', 'width', 'diameter', 'bowDepth'] as const) {
      if (d[f] !== undefined && !allowed.has(f))
        ctx.addIssue({ code: 'custom', path: [f], message: `A ${d.shape} tank has no ${f}.` });
    }
    if (d.fillHeight !== undefined && d.fillHeight > d.height)
      ctx.addIssue({
        code: 'custom',
        path: ['fillHeight'],
        message: 'The water cannot be higher than the tank.',
      });
    if (
      d.shape === 'bowfront' &&
      d.bowDepth !== undefined &&
      d.length !== undefined &&
      d.bowDepth > d.length / 2
    ) {
      ctx.addIssue({
        code: 'custom',
        path: ['bowDepth'],
        message: 'The bow can be at most half the length.',
      });
    }
  });

const enteredVolumeSchema = z
  .object({
    source: z.literal('entered'),
    value: z.number({ message: 'Enter the volume.' }).positive('Must be more than 0.'),
    unit: z.enum(VOLUME_UNITS).default('L'),
  })
  .strict();

/** Either the water volume as the member knows it, or the inside dimensions to work it out from. */
export const tankVolumeSchema = z.discriminatedUnion('source', [enteredVolumeSchema, dimensionsSchema], {
  message: "Give the volume: source 'entered' with a value, or 'dimensions' with the tank's measurements.",
});
export type TankVolumeInput = z.input<typeof tankVolumeSchema>;

const name = z
  .string({ message: 'Give the tank a name.' })
  .trim()
  .min(1, 'Give the tank a name.')
  .max(80, 'Keep the name under 80 characters.');
const systemType = z.enum(SYSTEM_TYPES, { message: `Choose the kind of tank: ${SYSTEM_TYPES.join(', ')}.` });
const phase = z.enum(TANK_PHASES, { message: 'Choose cycling or established.' });
const equipmentNotes = z.string().trim().max(4000, 'Keep the notes under 4000 characters.');
/** Which profile judges the readings; the server checks it exists and suits the kind of tank. */
const careProfileKey = z
  .string()
  .regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, 'Choose a care profile by its key, e.g. reef.')
  .max(100);

export const createTankSchema = z
  .object({
    name,
    systemType,
    volume: tankVolumeSchema,
    setUpOn: isoDate.nullable().default(null),
    phase: phase.default('cycling'),
    equipmentNotes: equipmentNotes.default(''),
    /** Defaults to the system type's own profile. */
    careProfileKey: careProfileKey.optional(),
  })
  .strict();
export type CreateTankInput = z.input<typeof createTankSchema>;

export const updateTankSchema = z
  .object({
    name: name.optional(),
    systemType: systemType.optional(),
    volume: tankVolumeSchema.optional(),
    setUpOn: isoDate.nullable().optional(),
    phase: phase.optional(),
    equipmentNotes: equipmentNotes.optional(),
    careProfileKey: careProfileKey.optional(),
  })
  .strict()
  .refine((v) => Object.values(v).some((x) => x !== undefined), 'Change at least one thing.');
export type UpdateTankInput = z.input<typeof updateTankSchema>;

export const tankListQuery = z
  .object({
    /** Only the viewer's own tanks. */
    mine: flag.optional(),
    ownerId: uuid.optional(),
    includeArchived: flag.optional(),
  })
  .strict();

export const livestockParams = tankParams.extend({ livestockId: uuid });
const speciesCommonName = z
  .string({ message: 'Name the animal.' })
  .trim()
  .min(1, 'Name the animal.')
  .max(120, 'Keep the name under 120 characters.');
const count = z
  .number({ message: 'How many?' })
  .int('A whole number, please.')
  .min(1, 'At least 1.')
  .max(10_000);
const livestockSource = z.string().trim().max(120, 'Keep it under 120 characters.');
const quarantineNotes = z.string().trim().max(4000, 'Keep the notes under 4000 characters.');

export const createLivestockSchema = z
  .object({
    speciesCommonName,
    count,
    addedOn: isoDate,
    /** Where the animals came from: a shop, a club swap, bred at home… */
    source: livestockSource.default(''),
    quarantineNotes: quarantineNotes.default(''),
  })
  .strict();
export type CreateLivestockInput = z.input<typeof createLivestockSchema>;

/** Setting `removedOn` records the animals leaving (a timeline entry); `null` undoes it. */
export const updateLivestockSchema = z
  .object({
    speciesCommonName: speciesCommonName.optional(),
    count: count.optional(),
    addedOn: isoDate.optional(),
    source: livestockSource.optional(),
    quarantineNotes: quarantineNotes.optional(),
    removedOn: isoDate.nullable().optional(),
    removalReason: z.string().trim().max(500, 'Keep it under 500 characters.').nullable().optional(),
  })
  .strict()
  .refine((v) => Object.values(v).some((x) => x !== undefined), 'Change at least one thing.');
export type UpdateLivestockInput = z.input<typeof updateLivestockSchema>;

export const livestockListQuery = z.object({ includeRemoved: flag.optional() }).strict();
