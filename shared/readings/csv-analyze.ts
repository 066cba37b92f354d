import { isParameterKey } from '../care/parameters';
import { IMPORT_LISTED_ISSUES, type CsvImportRequest } from '../schemas/csv-import.schema';
import type { ImportPreview, ImportRowIssue } from '../schemas/tank-views';
import { createWaterTestSchema } from '../schemas/water-test.schema';
import { parseDateCell } from './csv-dates';
import { isMultiUnit, parseNumber, readLayout, type CsvLayout } from './csv-layout';
import type { TankChemistryContext } from './free-ammonia';
import { normalizeWaterTest, type NormalizedWaterTest } from './normalize-water-test';

export interface AnalyzeContext extends TankChemistryContext {
  now: string;
  /** Used for times written without an offset unless the request names one. */
  timeZone: string;
  /** Times (ms) of tests already on the tank. */
  existingTakenAt: ReadonlySet<number>;
}

export interface AnalyzedRow {
  row: number;
  normalized: NormalizedWaterTest;
  note: string;
}

export interface CsvAnalysis {
  preview: ImportPreview;
  /** The rows a commit saves: valid and not already on the tank. */
  rows: AnalyzedRow[];
}

type RowOutcome =
  | { kind: 'other-record' }
  | { kind: 'invalid'; issues: ImportRowIssue[] }
  | { kind: 'valid'; row: AnalyzedRow; warnings: ImportRowIssue[] };

/** Our own export writes a quote before cells that would look like formulas; take it off again. */
const unescapeFormula = (cell: string) => (/^'[=+\-@\t\r]/.test(cell) ? cell.slice(1) : cell);

/** The column a schema or normalizer path points at ("entries.pH.value" → the pH column). */
function columnFor(layout: CsvLayout, path: string): string {
  const [first, second] = path.split('.');
  if (first === 'takenAt') return layout.columnOf('takenAt')!;
  if (first === 'note') return layout.columnOf('note') ?? 'note';
  if (first === 'entries' && second && isParameterKey(second)) return layout.columnOf(second) ?? second;
  return path;
}

function readRow(
  layout: CsvLayout,
  req: CsvImportRequest,
  ctx: AnalyzeContext,
  row: number,
  cells: string[],
): RowOutcome {
  const record = layout.cellOf(cells, 'record')?.trim();
  if (record && record !== 'water-test') return { kind: 'other-record' };
  const issues: ImportRowIssue[] = [];
  const issue = (field: string, message: string) => issues.push({ row, field, message });
  if (cells.length > layout.columns.length)
    issue('(row)', `This row has ${cells.length} cells but the header has ${layout.columns.length}.`);
  const when = parseDateCell(
    layout.cellOf(cells, 'takenAt') ?? '',
    layout.cellOf(cells, 'time'),
    layout.dateFormat,
    layout.timeZone,
  );
  if ('error' in when) issue(layout.columnOf('takenAt')!, when.error);
  const entries: Record<string, unknown> = {};
  for (const { column, i, target } of layout.parameterColumns) {
    const cell = cells[i]?.trim() ?? '';
    if (cell === '') continue;
    const value = parseNumber(cell, layout.decimalComma);
    if (value === null) {
      issue(column, `"${cell.slice(0, 40)}" is not a number.`);
      continue;
    }
    const unit = isMultiUnit(target) ? layout.units[target] : undefined;
    const method = req.methods?.[target];
    const reference =
      unit === 'SG' && req.salinityReferenceTempC !== undefined
        ? { referenceTempC: req.salinityReferenceTempC }
        : {};
    entries[target] = { value, ...(unit ? { unit } : {}), ...(method ? { method } : {}), ...reference };
  }
  if (issues.length === 0 && Object.keys(entries).length === 0) issue('(row)', 'This row has no readings.');
  if (issues.length || 'error' in when) return { kind: 'invalid', issues };

  const note = unescapeFormula(layout.cellOf(cells, 'note')?.trim() ?? '');
  const parsed = createWaterTestSchema.safeParse({ takenAt: when.iso, entries, note });
  if (!parsed.success) {
    for (const i of parsed.error.issues) issue(columnFor(layout, i.path.map(String).join('.')), i.message);
    return { kind: 'invalid', issues };
  }
  const normalized = normalizeWaterTest(parsed.data, ctx);
  for (const e of normalized.errors) issue(columnFor(layout, e.path), e.message);
  if (issues.length) return { kind: 'invalid', issues };
  const warnings = normalized.warnings.map((w) => ({
    row,
    field: columnFor(layout, w.path),
    message: w.message,
  }));
  return { kind: 'valid', row: { row, normalized, note: parsed.data.note }, warnings };
}

/**
 * Reads a CSV of water tests the way a preview shows it and a commit saves it: every row goes through the same
 * schema and normalizer as a test typed into the form. Pure; throws CsvProblem for a file that cannot be read.
 */
export function analyzeCsv(req: CsvImportRequest, ctx: AnalyzeContext): CsvAnalysis {
  const layout = readLayout(req, ctx.timeZone);
  const errors: ImportRowIssue[] = [];
  const warnings: ImportRowIssue[] = [];
  const rows: AnalyzedRow[] = [];
  const seen = new Set<number>(ctx.existingTakenAt);
  const counts = { invalid: 0, duplicates: 0, skipped: 0 };
  for (const { row, cells } of layout.data) {
    const outcome = readRow(layout, req, ctx, row, cells);
    if (outcome.kind === 'other-record') counts.skipped++;
    else if (outcome.kind === 'invalid') {
      counts.invalid++;
      errors.push(...outcome.issues);
    } else {
      warnings.push(...outcome.warnings);
      // A test at the same moment as one already on the tank (or earlier in the file) is the same test.
      const ms = Date.parse(outcome.row.normalized.takenAt);
      if (seen.has(ms)) counts.duplicates++;
      else {
        seen.add(ms);
        rows.push(outcome.row);
      }
    }
  }
  return {
    rows,
    preview: {
      columns: layout.columns,
      delimiter: layout.delimiter,
      mapping: Object.fromEntries(layout.mapping),
      units: layout.units,
      dateFormat: layout.dateFormat,
      timeZone: layout.timeZone,
      rows: layout.data.length,
      valid: rows.length,
      ...counts,
      errors: errors.slice(0, IMPORT_LISTED_ISSUES),
      errorCount: errors.length,
      warnings: warnings.slice(0, IMPORT_LISTED_ISSUES),
      warningCount: warnings.length,
      sample: rows
        .slice(0, 5)
        .map((r) => ({ row: r.row, takenAt: r.normalized.takenAt, values: r.normalized.values })),
    },
  };
}
