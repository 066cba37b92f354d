import Papa from 'papaparse';
import { CSV_DELIMITERS } from '@shared/schemas/csv-import.schema';

export interface CsvGlance {
  /** Header cells, trimmed: the names the server uses for ordinary headers. */
  header: string[];
  /** The first few data rows, for showing what each column holds. */
  rows: string[][];
  delimiter: string;
}

/** The header and first rows, parsed in the browser the way the server reads the file. */
export function glanceAt(text: string, delimiter?: string): CsvGlance {
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), {
    delimiter: delimiter ?? '',
    delimitersToGuess: [...CSV_DELIMITERS],
    preview: 6,
    skipEmptyLines: 'greedy',
  });
  const [header = [], ...rows] = parsed.data;
  return { header: header.map((h) => h.trim()), rows, delimiter: parsed.meta.delimiter || ',' };
}
