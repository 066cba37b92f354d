import type {
  CsvImportInput,
  DateFormat,
  ImportTarget,
  ImportUnits,
} from '@shared/schemas/csv-import.schema';
import type { CSV_DELIMITERS } from '@shared/schemas/csv-import.schema';

export type Delimiter = (typeof CSV_DELIMITERS)[number];

/** What the member chose in the mapping step; everything else the server guesses. */
export interface ImportSettings {
  mapping: Record<string, ImportTarget>;
  units: ImportUnits;
  dateFormat?: DateFormat;
  delimiter?: Delimiter;
  salinityReferenceTempC?: number;
}

export const requestFor = (csv: string, s: ImportSettings): CsvImportInput => ({
  csv,
  ...(Object.keys(s.mapping).length ? { mapping: s.mapping } : {}),
  ...(Object.keys(s.units).length ? { units: s.units } : {}),
  ...(s.dateFormat ? { dateFormat: s.dateFormat } : {}),
  ...(s.delimiter ? { delimiter: s.delimiter } : {}),
  ...(s.salinityReferenceTempC !== undefined ? { salinityReferenceTempC: s.salinityReferenceTempC } : {}),
});
