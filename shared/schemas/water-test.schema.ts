import { z } from 'zod';
import type { ParameterKey } from '../care/parameters';
import { EOS80_TEMP_RANGE_C } from '../chemistry/seawater-density';
import { REFERENCE_TEMP_RANGE_C } from '../chemistry/specific-gravity';
import {
  ALKALINITY_ENTRY_UNITS,
  AMMONIA_ENTRY_UNITS,
  NITRATE_ENTRY_UNITS,
  NITRITE_ENTRY_UNITS,
  SALINITY_ENTRY_UNITS,
  TEMPERATURE_ENTRY_UNITS,
  TEST_METHODS,
} from '../readings/entry-units';
import { impossibleReading } from '../readings/plausibility';
import { uuid } from './common';
import { cursor, isoDateTime, tankParams } from './tank.schema';

const number = z.number({ message: 'Enter a number.' });
const amount = number.min(0, 'A reading cannot be negative.');
const method = z.enum(TEST_METHODS, { message: `Choose how it was measured: ${TEST_METHODS.join(', ')}.` });
const unitOf = <U extends readonly [string, ...string[]]>(units: U) =>
  z.enum(units, { message: `Choose the unit: ${units.join(', ')}.` });
const entryNote = z.string().trim().max(500, 'Keep the note under 500 characters.');
const common = { method: method.optional(), note: entryNote.optional() };

/** Each entry refuses typos itself, so every bad field is named at once: "pH 80 is not possible — did you mean 8.0?". */
const refuseTypos =
  (parameter: ParameterKey) =>
  (e: { value: number; unit: string }, ctx: z.RefinementCtx): void => {
    const message = impossibleReading(parameter, e.value, e.unit);
    if (message) ctx.addIssue({ code: 'custom', path: ['value'], message });
  };

export const temperatureEntrySchema = z
  .object({ value: number, unit: unitOf(TEMPERATURE_ENTRY_UNITS), ...common })
  .strict()
  .superRefine(refuseTypos('temperature'));

/**
 * SG needs the instrument (method) and its reference temperature (default 25 °C); a hydrometer also needs the
 * sample's temperature (default: this test's temperature). Conductivity is taken as compensated to 25 °C unless
 * `sampleTempC` says at what temperature it was measured.
 */
export const salinityEntrySchema = z
  .object({
    value: amount,
    unit: unitOf(SALINITY_ENTRY_UNITS),
    referenceTempC: number.min(REFERENCE_TEMP_RANGE_C.min).max(REFERENCE_TEMP_RANGE_C.max).optional(),
    sampleTempC: number.min(EOS80_TEMP_RANGE_C.min).max(EOS80_TEMP_RANGE_C.max).optional(),
    ...common,
  })
  .strict()
  .superRefine((e, ctx) => {
    if (e.referenceTempC !== undefined && e.unit !== 'SG') {
      ctx.addIssue({
        code: 'custom',
        path: ['referenceTempC'],
        message: 'A reference temperature belongs to an SG reading only.',
      });
    }
    if (e.sampleTempC !== undefined && e.unit !== 'SG' && e.unit !== 'mS/cm') {
      ctx.addIssue({
        code: 'custom',
        path: ['sampleTempC'],
        message: 'A sample temperature belongs to an SG or conductivity reading only.',
      });
    }
    refuseTypos('salinity')(e, ctx);
  });

const simpleEntry = <U extends readonly [string, ...string[]]>(parameter: ParameterKey, units: U) =>
  z
    .object({ value: amount, unit: unitOf(units), ...common })
    .strict()
    .superRefine(refuseTypos(parameter));
const singleUnitEntry = <U extends string>(parameter: ParameterKey, unit: U) =>
  z
    .object({ value: amount, unit: z.literal(unit).default(unit), ...common })
    .strict()
    .superRefine(refuseTypos(parameter));

export const pHEntrySchema = singleUnitEntry('pH', 'pH');
export const ammoniaEntrySchema = simpleEntry('ammonia', AMMONIA_ENTRY_UNITS);
export const nitriteEntrySchema = simpleEntry('nitrite', NITRITE_ENTRY_UNITS);
export const nitrateEntrySchema = simpleEntry('nitrate', NITRATE_ENTRY_UNITS);
export const alkalinityEntrySchema = simpleEntry('alkalinity', ALKALINITY_ENTRY_UNITS);
export const calciumEntrySchema = singleUnitEntry('calcium', 'mg/L Ca');
export const magnesiumEntrySchema = singleUnitEntry('magnesium', 'mg/L Mg');
export const phosphateEntrySchema = singleUnitEntry('phosphate', 'mg/L PO4');

export const ENTRY_SCHEMAS = {
  temperature: temperatureEntrySchema,
  salinity: salinityEntrySchema,
  pH: pHEntrySchema,
  ammonia: ammoniaEntrySchema,
  nitrite: nitriteEntrySchema,
  nitrate: nitrateEntrySchema,
  alkalinity: alkalinityEntrySchema,
  calcium: calciumEntrySchema,
  magnesium: magnesiumEntrySchema,
  phosphate: phosphateEntrySchema,
} as const satisfies Record<ParameterKey, z.ZodType>;

const hasAny = (o: object) => Object.values(o).some((v) => v !== undefined && v !== null);

/** Any subset of the parameters, each as entered. */
export const waterTestEntriesSchema = z
  .object({
    temperature: temperatureEntrySchema.optional(),
    salinity: salinityEntrySchema.optional(),
    pH: pHEntrySchema.optional(),
    ammonia: ammoniaEntrySchema.optional(),
    nitrite: nitriteEntrySchema.optional(),
    nitrate: nitrateEntrySchema.optional(),
    alkalinity: alkalinityEntrySchema.optional(),
    calcium: calciumEntrySchema.optional(),
    magnesium: magnesiumEntrySchema.optional(),
    phosphate: phosphateEntrySchema.optional(),
  })
  .strict()
  .refine(hasAny, 'Enter at least one reading.');
export type WaterTestEntries = z.output<typeof waterTestEntriesSchema>;
export type WaterTestEntriesInput = z.input<typeof waterTestEntriesSchema>;

const testNote = z.string().trim().max(2000, 'Keep the note under 2000 characters.');

export const createWaterTestSchema = z
  .object({ takenAt: isoDateTime, entries: waterTestEntriesSchema, note: testNote.default('') })
  .strict();
export type CreateWaterTestInput = z.input<typeof createWaterTestSchema>;

/** Entries given here replace those parameters; `null` removes one; parameters not named stay as they were. */
export const updateWaterTestSchema = z
  .object({
    takenAt: isoDateTime.optional(),
    note: testNote.optional(),
    entries: z
      .object({
        temperature: temperatureEntrySchema.nullable().optional(),
        salinity: salinityEntrySchema.nullable().optional(),
        pH: pHEntrySchema.nullable().optional(),
        ammonia: ammoniaEntrySchema.nullable().optional(),
        nitrite: nitriteEntrySchema.nullable().optional(),
        nitrate: nitrateEntrySchema.nullable().optional(),
        alkalinity: alkalinityEntrySchema.nullable().optional(),
        calcium: calciumEntrySchema.nullable().optional(),
        magnesium: magnesiumEntrySchema.nullable().optional(),
        phosphate: phosphateEntrySchema.nullable().optional(),
      })
      .strict()
      .optional(),
  })
  .strict()
  .refine(hasAny, 'Change the time, the note or a reading.');
export type UpdateWaterTestInput = z.input<typeof updateWaterTestSchema>;

export const waterTestParams = tankParams.extend({ testId: uuid });

export const waterTestListQuery = z
  .object({
    limit: z.coerce.number().int().min(1).max(1000).default(100),
    before: cursor.optional(),
    from: isoDateTime.optional(),
    to: isoDateTime.optional(),
  })
  .strict();
