import Papa from 'papaparse';
import { isParameterKey, PARAMETER_KEYS, type ParameterKey } from '../care/parameters';
import {
  IMPORT_MAX_ROWS,
  type CsvImportRequest,
  type DateFormat,
  type ImportTarget,
  type ImportUnits,
} from '../schemas/csv-import.schema';
import { guessTarget, guessUnit } from './csv-columns';
import { detectDateFormat } from './csv-dates';
import type { ReadingIssue } from './issues';

/** The file as a whole cannot be read (wrong separator, not UTF-8, no date column…): answered with a 400. */
export class CsvProblem extends Error {
  constructor(readonly issues: ReadingIssue[]) {
    super(issues[0]?.message ?? 'The file cannot be read.');
    this.name = 'CsvProblem';
  }
}

const problem = (path: string, message: string) => new CsvProblem([{ path, message }]);

const DELIMITERS = [',', ';', '\t', '|'];
const MULTI_UNIT = [
  'temperature',
  'salinity',
  'ammonia',
  'nitrite',
  'nitrate',
  'alkalinity',
] as const satisfies readonly (keyof ImportUnits)[];
export const isMultiUnit = (p: ParameterKey): p is (typeof MULTI_UNIT)[number] =>
  (MULTI_UNIT as readonly string[]).includes(p);
const SINGLE_USE: readonly ImportTarget[] = ['takenAt', 'time', 'note', 'record', ...PARAMETER_KEYS];

export interface CsvLayout {
  columns: string[];
  delimiter: string;
  /** Data rows with at least one filled cell; `row` as a spreadsheet numbers it (the header is row 1). */
  data: { row: number; cells: string[] }[];
  mapping: Map<string, ImportTarget>;
  units: ImportUnits;
  dateFormat: DateFormat;
  timeZone: string;
  decimalComma: boolean;
  parameterColumns: { column: string; i: number; target: ParameterKey }[];
  /** The column holding a target, or undefined. */
  columnOf(target: ImportTarget): string | undefined;
  cellOf(cells: readonly string[], target: ImportTarget): string | undefined;
}

function readRecords(
  text: string,
  delimiter: string | undefined,
): { records: string[][]; delimiter: string } {
  if (text.includes('\uFFFD')) {
    throw problem(
      'csv',
      'The file is not UTF-8 text: some characters could not be read. Save it as "CSV UTF-8" and try again.',
    );
  }
  // eslint-disable-next-line no-control-regex
  if (/[\u0000-\u0008\u000E-\u001F]/.test(text))
    throw problem('csv', 'This is not a text CSV file: it contains binary data.');
  const parsed = Papa.parse<string[]>(text, {
    delimiter: delimiter ?? '',
    delimitersToGuess: DELIMITERS,
    skipEmptyLines: false,
  });
  const records = parsed.data.map((r) => r.map((c) => c ?? ''));
  while (records.length && records[records.length - 1]!.every((c) => c.trim() === '')) records.pop();
  return { records, delimiter: delimiter ?? (parsed.meta.delimiter || ',') };
}

function uniqueColumns(header: readonly string[]): string[] {
  const seen = new Map<string, number>();
  return header.map((raw, i) => {
    const base = raw.trim() || `column ${i + 1}`;
    const n = (seen.get(base) ?? 0) + 1;
    seen.set(base, n);
    return n === 1 ? base : `${base} (${n})`;
  });
}

/** The member's mapping first, then guesses from the headers for the rest; a target is never used twice. */
function buildMapping(
  columns: readonly string[],
  requested: Record<string, ImportTarget> | undefined,
): Map<string, ImportTarget> {
  const asked = new Map(Object.entries(requested ?? {}));
  for (const name of asked.keys()) {
    if (!columns.includes(name))
      throw problem(
        `mapping.${name}`,
        `There is no column "${name}". The columns are: ${columns.join(', ')}.`,
      );
  }
  const mapping = new Map<string, ImportTarget>();
  const taken = new Map<ImportTarget, string>();
  for (const [column, target] of asked) {
    const other = taken.get(target);
    if (other && SINGLE_USE.includes(target))
      throw problem(
        `mapping.${column}`,
        `Both "${other}" and "${column}" are mapped to ${target}: choose one.`,
      );
    taken.set(target, column);
  }
  for (const column of columns) {
    let target = asked.get(column);
    if (!target) {
      target = guessTarget(column);
      if (taken.has(target) && SINGLE_USE.includes(target)) target = 'ignore';
      taken.set(target, column);
    }
    mapping.set(column, target);
  }
  if (!taken.has('takenAt'))
    throw problem('mapping', 'No column holds the date of each test: map one column to takenAt.');
  if (![...mapping.values()].some((t) => isParameterKey(t))) {
    throw problem(
      'mapping',
      'No column holds a reading: map at least one column to a parameter such as pH or nitrate.',
    );
  }
  return mapping;
}

export function parseNumber(cell: string, decimalComma: boolean): number | null {
  const t = cell.trim().replace(/\s+/g, '');
  const re = decimalComma
    ? /^[+-]?(\d+([.,]\d*)?|[.,]\d+)([eE][+-]?\d+)?$/
    : /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;
  if (!re.test(t)) return null;
  return Number(t.replace(',', '.'));
}

function resolveDateFormat(
  layout: Pick<CsvLayout, 'data' | 'cellOf'>,
  asked: DateFormat | undefined,
): DateFormat {
  const cells = layout.data.map((r) => layout.cellOf(r.cells, 'takenAt') ?? '');
  const detected = asked ?? detectDateFormat(cells);
  if (detected === 'ambiguous') {
    const example = cells.map((c) => c.trim()).find(Boolean);
    throw problem(
      'dateFormat',
      `Dates such as "${example}" could be day-first or month-first: choose dmy (31/12/2025) or mdy (12/31/2025).`,
    );
  }
  if (detected === 'mixed')
    throw problem('dateFormat', 'Some dates are day-first and others month-first: make them all the same.');
  return detected === 'unknown' ? 'iso' : detected;
}

/** How the file is laid out: columns, what each holds, units, date format. Throws CsvProblem when it cannot be read. */
export function readLayout(req: CsvImportRequest, defaultTimeZone: string): CsvLayout {
  const { records, delimiter } = readRecords(req.csv.replace(/^\uFEFF/, ''), req.delimiter);
  const header = records[0];
  if (!header) throw problem('csv', 'The file is empty.');
  if (header.length < 2) {
    throw problem(
      'delimiter',
      `Only one column was found ("${header[0]?.slice(0, 60) ?? ''}"). The file may use another separator: choose comma, semicolon, tab or |.`,
    );
  }
  const columns = uniqueColumns(header);
  const data = records
    .slice(1)
    .map((cells, i) => ({ row: i + 2, cells }))
    .filter((r) => r.cells.some((c) => c.trim() !== ''));
  if (data.length === 0) throw problem('csv', 'The file has a header but no rows of readings.');
  if (data.length > IMPORT_MAX_ROWS)
    throw problem('csv', `The file has ${data.length} rows; import at most ${IMPORT_MAX_ROWS} at a time.`);

  const mapping = buildMapping(columns, req.mapping);
  const columnOf = (target: ImportTarget) => columns.find((c) => mapping.get(c) === target);
  const cellOf = (cells: readonly string[], target: ImportTarget) => {
    const i = columns.findIndex((c) => mapping.get(c) === target);
    return i < 0 ? undefined : cells[i];
  };
  // With commas between cells, a comma cannot also be the decimal mark.
  const decimalComma = delimiter !== ',';
  const parameterColumns = columns.flatMap((column, i) => {
    const target = mapping.get(column)!;
    return isParameterKey(target) ? [{ column, i, target }] : [];
  });
  const units: ImportUnits = { ...req.units };
  for (const { column, i, target } of parameterColumns) {
    if (!isMultiUnit(target) || units[target]) continue;
    const samples = data.slice(0, 100).flatMap((r) => {
      const n = parseNumber(r.cells[i] ?? '', decimalComma);
      return n === null ? [] : [n];
    });
    Object.assign(units, { [target]: guessUnit(target, column, samples) });
  }
  return {
    columns,
    delimiter,
    data,
    mapping,
    units,
    dateFormat: resolveDateFormat({ data, cellOf }, req.dateFormat),
    timeZone: req.timeZone ?? defaultTimeZone,
    decimalComma,
    parameterColumns,
    columnOf,
    cellOf,
  };
}
