import { isParameterKey, type ParameterKey } from '@shared/care/parameters';
import {
  CSV_DELIMITER_LABELS,
  DATE_FORMAT_LABELS,
  ENTRY_UNIT_LABELS,
  importTargetLabel,
} from '@shared/constants/reading-labels';
import { ENTRY_UNITS } from '@shared/readings/entry-units';
import { SG_REFERENCE_TEMPS_C } from '@shared/readings/salinity';
import {
  CSV_DELIMITERS,
  DATE_FORMATS,
  IMPORT_TARGETS,
  importUnitsSchema,
  type ImportTarget,
  type ImportUnits,
} from '@shared/schemas/csv-import.schema';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/card';
import { Select } from '@client/components/ui/select';
import type { CsvGlance } from '../lib/csv-chunks';
import type { Delimiter, ImportSettings } from './import-settings';

const MULTI_UNIT = Object.keys(importUnitsSchema.shape) as (keyof ImportUnits)[];
const isMultiUnit = (t: ImportTarget): t is keyof ImportUnits => (MULTI_UNIT as string[]).includes(t);

/** Which column holds what, in which unit, and how dates are written. */
export function MappingStep({
  columns,
  glance,
  settings,
  problem,
  busy,
  timeZone,
  onChange,
  onCheck,
  onBack,
}: {
  columns: string[];
  glance: CsvGlance;
  settings: ImportSettings;
  problem?: string;
  busy: boolean;
  timeZone: string;
  onChange: (s: ImportSettings) => void;
  onCheck: () => void;
  onBack: () => void;
}) {
  const sampleOf = (i: number) =>
    glance.rows
      .map((r) => r[i]?.trim())
      .filter(Boolean)
      .slice(0, 3)
      .join(' · ');
  const targets = Object.values(settings.mapping);
  const sgColumn = targets.includes('salinity') && settings.units.salinity === 'SG';
  const setTarget = (column: string, target: ImportTarget) =>
    onChange({ ...settings, mapping: { ...settings.mapping, [column]: target } });
  const setUnit = (p: keyof ImportUnits, unit: string) =>
    onChange({ ...settings, units: { ...settings.units, [p]: unit } });
  return (
    <div className="space-y-5">
      {problem ? <Notice tone="error">{problem}</Notice> : null}
      <p className="text-ink-muted">
        Check what each column holds. Columns set to “Leave out” are not imported.
      </p>
      <ul className="divide-y divide-line rounded-xl ring-1 ring-line">
        {columns.map((column, i) => {
          const target = settings.mapping[column] ?? 'ignore';
          return (
            <li key={column} className="grid gap-2 p-3 sm:grid-cols-[1fr_14rem_14rem] sm:items-center">
              <div className="min-w-0">
                <p className="truncate font-bold text-ink">{column}</p>
                <p className="truncate text-sm text-ink-muted">{sampleOf(i) || 'empty in the first rows'}</p>
              </div>
              <Select
                aria-label={`What “${column}” holds`}
                className="w-full"
                value={target}
                onChange={(e) => setTarget(column, e.target.value as ImportTarget)}
              >
                {IMPORT_TARGETS.map((t) => (
                  <option key={t} value={t}>
                    {importTargetLabel(t)}
                  </option>
                ))}
              </Select>
              {isParameterKey(target) && isMultiUnit(target) ? (
                <Select
                  aria-label={`Unit of “${column}”`}
                  className="w-full"
                  value={settings.units[target] ?? ''}
                  onChange={(e) => setUnit(target, e.target.value)}
                >
                  <option value="">Guess from the numbers</option>
                  {(ENTRY_UNITS[target as ParameterKey] as readonly string[]).map((u) => (
                    <option key={u} value={u}>
                      {ENTRY_UNIT_LABELS[u as keyof typeof ENTRY_UNIT_LABELS]}
                    </option>
                  ))}
                </Select>
              ) : (
                <span className="hidden sm:block" />
              )}
            </li>
          );
        })}
      </ul>
      <div className="grid gap-4 sm:grid-cols-3">
        <label className="text-sm font-bold text-ink-soft">
          Dates are written
          <Select
            className="w-full"
            value={settings.dateFormat ?? ''}
            onChange={(e) =>
              onChange({
                ...settings,
                dateFormat: (e.target.value || undefined) as ImportSettings['dateFormat'],
              })
            }
          >
            <option value="">Work it out from the file</option>
            {DATE_FORMATS.map((f) => (
              <option key={f} value={f}>
                {DATE_FORMAT_LABELS[f]}
              </option>
            ))}
          </Select>
          <span className="mt-1 block font-normal text-ink-muted">
            Times without a time zone count as {timeZone}.
          </span>
        </label>
        <label className="text-sm font-bold text-ink-soft">
          Cells are separated by
          <Select
            className="w-full"
            value={settings.delimiter ?? ''}
            onChange={(e) =>
              onChange({ ...settings, delimiter: (e.target.value || undefined) as Delimiter | undefined })
            }
          >
            <option value="">Work it out from the file</option>
            {CSV_DELIMITERS.map((d) => (
              <option key={d} value={d}>
                {CSV_DELIMITER_LABELS[d]}
              </option>
            ))}
          </Select>
        </label>
        {sgColumn ? (
          <label className="text-sm font-bold text-ink-soft">
            SG instrument's reference
            <Select
              className="w-full"
              value={String(settings.salinityReferenceTempC ?? '')}
              onChange={(e) =>
                onChange({
                  ...settings,
                  salinityReferenceTempC: e.target.value ? Number(e.target.value) : undefined,
                })
              }
            >
              <option value="">25 °C (the usual)</option>
              {SG_REFERENCE_TEMPS_C.map((c) => (
                <option key={c} value={String(c)}>
                  {Number(c.toFixed(1))} °C
                </option>
              ))}
            </Select>
          </label>
        ) : null}
      </div>
      <div className="flex flex-wrap gap-2">
        <Button busy={busy} onClick={onCheck}>
          Check the rows
        </Button>
        <Button variant="ghost" onClick={onBack}>
          Choose another file
        </Button>
      </div>
    </div>
  );
}
