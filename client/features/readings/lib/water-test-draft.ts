import { PARAMETER_KEYS, type ParameterKey } from '@shared/care/parameters';
import { convert } from '@shared/chemistry/units';
import { ENTRY_UNITS, TEST_METHODS, type TestMethod } from '@shared/readings/entry-units';
import { DEFAULT_SG_REFERENCE_TEMP_C } from '@shared/readings/salinity';
import type {
  CreateWaterTestInput,
  UpdateWaterTestInput,
  WaterTestEntriesInput,
} from '@shared/schemas/water-test.schema';
import type { WaterTestView } from '@shared/schemas/tank-views';
import type { UnitPrefs } from '@client/lib/display-units';
import { localInputToIso, parseDecimal, toLocalInput, trimmedOrUndefined } from '@client/lib/form-values';

/** One parameter as the form holds it: strings, as typed. */
export interface EntryDraft {
  value: string;
  unit: string;
  /** '' = not said: the usual method for the parameter is recorded. */
  method: TestMethod | '';
  note: string;
  /** SG only: the instrument's reference temperature, °C. */
  referenceTempC: string;
  /** Hydrometer or conductivity: the water's temperature, in the member's temperature unit. */
  sampleTemp: string;
}

export type EntryDrafts = Record<ParameterKey, EntryDraft>;

export interface WaterTestDraft {
  takenAt: string;
  note: string;
  entries: EntryDrafts;
}

/** What the member last used on this tank for one parameter. */
export interface RememberedEntry {
  unit?: string;
  method?: TestMethod | '';
  referenceTempC?: string;
}

const isMethod = (m: unknown): m is TestMethod => (TEST_METHODS as readonly unknown[]).includes(m);

/** The unit a new entry starts in: what was used last on this tank, else the member's preference, else canonical. */
export function startingUnit(key: ParameterKey, prefs: UnitPrefs, remembered?: RememberedEntry): string {
  const units = ENTRY_UNITS[key] as readonly string[];
  if (remembered?.unit && units.includes(remembered.unit)) return remembered.unit;
  if (key === 'temperature') return prefs.temperatureUnit === 'F' ? '°F' : '°C';
  if (key === 'salinity') return prefs.salinityDisplay === 'sg' ? 'SG' : 'ppt';
  return units[0]!;
}

export function emptyEntry(key: ParameterKey, prefs: UnitPrefs, remembered?: RememberedEntry): EntryDraft {
  return {
    value: '',
    unit: startingUnit(key, prefs, remembered),
    method: isMethod(remembered?.method) ? remembered.method : '',
    note: '',
    referenceTempC: remembered?.referenceTempC ?? String(DEFAULT_SG_REFERENCE_TEMP_C),
    sampleTemp: '',
  };
}

export function newDraft(
  prefs: UnitPrefs,
  remembered: Partial<Record<ParameterKey, RememberedEntry>>,
  now = new Date(),
): WaterTestDraft {
  const entries = Object.fromEntries(
    PARAMETER_KEYS.map((k) => [k, emptyEntry(k, prefs, remembered[k])]),
  ) as EntryDrafts;
  return { takenAt: toLocalInput(now), note: '', entries };
}

const sampleTempFromC = (c: number | undefined, prefs: UnitPrefs) =>
  c === undefined
    ? ''
    : String(Number((prefs.temperatureUnit === 'F' ? convert(c, '°C', '°F') : c).toFixed(1)));

/** An existing test as the form shows it: the values as they were entered, not the converted ones. */
export function draftFromTest(test: WaterTestView, prefs: UnitPrefs): WaterTestDraft {
  const draft = newDraft(prefs, {}, new Date(test.takenAt));
  draft.note = test.note;
  for (const key of PARAMETER_KEYS) {
    const e = test.entries[key] as
      (WaterTestEntriesInput[ParameterKey] & { referenceTempC?: number; sampleTempC?: number }) | undefined;
    if (!e) continue;
    draft.entries[key] = {
      value: String(e.value),
      unit: e.unit ?? draft.entries[key].unit,
      method: e.method ?? '',
      note: e.note ?? '',
      referenceTempC:
        e.referenceTempC === undefined ? draft.entries[key].referenceTempC : String(e.referenceTempC),
      sampleTemp: sampleTempFromC(e.sampleTempC, prefs),
    };
  }
  return draft;
}

export const isFilled = (e: EntryDraft | undefined): e is EntryDraft =>
  e !== undefined && e.value.trim() !== '';

/** One draft entry as the API takes it (numbers may be NaN: the schema names those "Enter a number."). */
export function entryInput(key: ParameterKey, d: EntryDraft, prefs: UnitPrefs): Record<string, unknown> {
  const input: Record<string, unknown> = { value: parseDecimal(d.value), unit: d.unit };
  if (d.method) input.method = d.method;
  const note = trimmedOrUndefined(d.note);
  if (note) input.note = note;
  if (key === 'salinity' && d.unit === 'SG') input.referenceTempC = parseDecimal(d.referenceTempC);
  const hasSampleTemp =
    key === 'salinity' && ((d.unit === 'SG' && d.method === 'hydrometer') || d.unit === 'mS/cm');
  const sample = hasSampleTemp ? parseDecimal(d.sampleTemp) : undefined;
  if (sample !== undefined)
    input.sampleTempC =
      prefs.temperatureUnit === 'F' && !Number.isNaN(sample) ? convert(sample, '°F', '°C') : sample;
  return input;
}

export function draftEntries(
  draft: WaterTestDraft,
  prefs: UnitPrefs,
): Partial<Record<ParameterKey, Record<string, unknown>>> {
  const out: Partial<Record<ParameterKey, Record<string, unknown>>> = {};
  for (const key of PARAMETER_KEYS) {
    const d = draft.entries[key];
    if (isFilled(d)) out[key] = entryInput(key, d, prefs);
  }
  return out;
}

/** The whole draft as the API's create input (not yet checked). */
export function draftToInput(draft: WaterTestDraft, prefs: UnitPrefs): CreateWaterTestInput {
  return {
    takenAt: localInputToIso(draft.takenAt),
    note: draft.note,
    entries: draftEntries(draft, prefs) as CreateWaterTestInput['entries'],
  };
}

/**
 * A checked draft as the PATCH body for the test it edits: every entry on the form is sent, and an entry the test
 * had but the form no longer has is sent as null, which removes it.
 */
export function draftToPatch(
  checked: CreateWaterTestInput,
  original: Pick<WaterTestView, 'entries'>,
): UpdateWaterTestInput {
  const entries: NonNullable<UpdateWaterTestInput['entries']> = {};
  for (const k of PARAMETER_KEYS) {
    const next = checked.entries[k];
    if (next) Object.assign(entries, { [k]: next });
    else if (original.entries[k]) Object.assign(entries, { [k]: null });
  }
  return { takenAt: checked.takenAt, note: checked.note, entries };
}

/** API paths → form fields: the sample temperature is typed in the member's unit under another name. */
export function waterTestFieldOf(path: string): string | null {
  if (path === 'takenAt' || path === 'note') return path;
  const m = /^entries\.(\w+)\.(value|unit|method|note|referenceTempC|sampleTempC)$/.exec(path);
  if (!m || !(PARAMETER_KEYS as readonly string[]).includes(m[1]!)) return null;
  return `entries.${m[1]}.${m[2] === 'sampleTempC' ? 'sampleTemp' : m[2]}`;
}
