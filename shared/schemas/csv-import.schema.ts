import { z } from 'zod';
import { PARAMETERS, type ParameterKey } from '../care/parameters';
import { TEST_METHODS } from '../readings/entry-units';
import { timeZone } from './common';
import {
  alkalinityEntrySchema,
  ammoniaEntrySchema,
  nitrateEntrySchema,
  nitriteEntrySchema,
  salinityEntrySchema,
  temperatureEntrySchema,
} from './water-test.schema';

export const CSV_MAX_BYTES = 5 * 1024 * 1024;
export const IMPORT_MAX_ROWS = 20_000;
/** How many row errors (and warnings) a preview lists; the counts are always complete. */
export const IMPORT_LISTED_ISSUES = 200;

const PARAMETER_TARGETS = PARAMETERS.map((p) => p.key) as unknown as readonly [
  ParameterKey,
  ...ParameterKey[],
];
/** What a CSV column can hold. `record` is the export's first column: rows other than water tests are skipped. */
export const IMPORT_TARGETS = ['takenAt', 'time', 'note', 'record', 'ignore', ...PARAMETER_TARGETS] as const;
export type ImportTarget = (typeof IMPORT_TARGETS)[number];

export const DATE_FORMATS = ['iso', 'dmy', 'mdy'] as const;
export type DateFormat = (typeof DATE_FORMATS)[number];
export const CSV_DELIMITERS = [',', ';', '\t', '|'] as const;

export const importUnitsSchema = z
  .object({
    temperature: temperatureEntrySchema.shape.unit,
    salinity: salinityEntrySchema.shape.unit,
    ammonia: ammoniaEntrySchema.shape.unit,
    nitrite: nitriteEntrySchema.shape.unit,
    nitrate: nitrateEntrySchema.shape.unit,
    alkalinity: alkalinityEntrySchema.shape.unit,
  })
  .partial()
  .strict();
export type ImportUnits = z.output<typeof importUnitsSchema>;

const utf8Bytes = (s: string) => new TextEncoder().encode(s).length;

export const csvImportSchema = z
  .object({
    csv: z
      .string({ message: 'Send the file as text in `csv`.' })
      .min(1, 'The file is empty.')
      .max(CSV_MAX_BYTES, 'The file is larger than 5 MB.')
      .refine((s) => utf8Bytes(s) <= CSV_MAX_BYTES, 'The file is larger than 5 MB.'),
    /** Column header → what it holds. Columns left out are guessed from their headers. */
    mapping: z.record(z.string().max(200), z.enum(IMPORT_TARGETS)).optional(),
    units: importUnitsSchema.optional(),
    /** For SG columns: the instrument's reference temperature. */
    salinityReferenceTempC: salinityEntrySchema.shape.referenceTempC,
    methods: z.partialRecord(z.enum(PARAMETER_TARGETS), z.enum(TEST_METHODS)).optional(),
    dateFormat: z.enum(DATE_FORMATS).optional(),
    delimiter: z.enum(CSV_DELIMITERS).optional(),
    /** For times written without an offset; defaults to the member's own time zone. */
    timeZone: timeZone.optional(),
  })
  .strict();
export type CsvImportInput = z.input<typeof csvImportSchema>;
export type CsvImportRequest = z.output<typeof csvImportSchema>;
