import { PARAMETER_KEYS, type ParameterKey } from '../care/parameters';
import { toMs } from '../care/time';
import { EOS80_SALINITY_RANGE } from '../chemistry/seawater-density';
import { PSS78_SALINITY_RANGE } from '../chemistry/practical-salinity';
import { specificGravityFromSalinity } from '../chemistry/specific-gravity';
import type { WaterTestEntries } from '../schemas/water-test.schema';
import { isLinearEntry, toCanonical } from './convert-entry';
import { defaultMethodFor } from './entry-units';
import {
  deriveFreeAmmonia,
  type FreeAmmoniaDerivation,
  type LastKnown,
  type TankChemistryContext,
} from './free-ammonia';
import type { ReadingIssue } from './issues';
import { impossibleReading, unusualReading } from './plausibility';
import { salinityFromEntry, type SalinityDerivation, type SalinityEntryLike } from './salinity';

/** How derived values were worked out; stored with the reading. */
export interface DerivedInfo {
  freeAmmonia?: FreeAmmoniaDerivation;
  salinity?: SalinityDerivation;
}

export type CanonicalValues = Partial<Record<ParameterKey, number>>;

export interface NormalizeContext extends TankChemistryContext {
  /** ISO time; readings more than FUTURE_TOLERANCE_MS after it are refused. */
  now: string;
  /** The test's id, when it has one (editing), so it never counts as its own "last known" value. */
  testId?: string;
  /** The tank's most recent earlier temperature, pH and salinity, for free ammonia. */
  lastKnown?: LastKnown;
}

export interface NormalizedWaterTest {
  takenAt: string;
  /** Canonical units (see PARAMETERS). */
  values: CanonicalValues;
  /** Free NH3, mg/L NH3, or null when there is no ammonia reading or it could not be worked out. */
  freeAmmonia: number | null;
  /** The entries as entered, with the default method filled in where none was given. */
  entries: WaterTestEntries;
  derived: DerivedInfo;
  /** Unusual but possible values: saved, with these shown to the member. */
  warnings: ReadingIssue[];
  /** Values that cannot be right: nothing is saved while there are any. */
  errors: ReadingIssue[];
}

/** Clocks on phones drift; a reading a few minutes "in the future" is still now. */
export const FUTURE_TOLERANCE_MS = 5 * 60_000;

const round5 = (n: number) => n.toFixed(5).replace(/0+$/, '');

function salinityError(
  entry: SalinityEntryLike,
  sampleTempC: number | undefined,
  referenceTempC: number | undefined,
): string {
  if (entry.unit === 'mS/cm') {
    return `Conductivity ${entry.value} mS/cm at ${sampleTempC ?? 25} °C is outside the salinity scale (practical salinity ${PSS78_SALINITY_RANGE.min}–${PSS78_SALINITY_RANGE.max}).`;
  }
  const at = (s: number) =>
    specificGravityFromSalinity({
      salinity: s,
      sampleTempC: sampleTempC ?? 25,
      referenceTempC: referenceTempC ?? 25,
    });
  return `Specific gravity ${entry.value} with water at ${sampleTempC ?? 25} °C is outside what fresh to very salty water reads (${round5(at(EOS80_SALINITY_RANGE.min))}–${round5(at(EOS80_SALINITY_RANGE.max))}).`;
}

function convertSalinity(
  entry: SalinityEntryLike,
  temperature: number | undefined,
  out: { values: CanonicalValues; derived: DerivedInfo; warnings: ReadingIssue[]; errors: ReadingIssue[] },
): void {
  const waterTemp =
    temperature === undefined ? undefined : { value: temperature, source: 'this-test' as const };
  try {
    const { salinity, derivation } = salinityFromEntry(entry, waterTemp);
    out.values.salinity = salinity;
    out.derived.salinity = derivation;
    if (entry.unit === 'SG' && entry.method === 'hydrometer' && derivation.sampleTempSource === 'reference') {
      out.warnings.push({
        path: 'entries.salinity.sampleTempC',
        message:
          'No water temperature was given, so the hydrometer was read as if the water were at its reference temperature.',
      });
    }
    const unusual = unusualReading('salinity', salinity, 'PSU');
    if (unusual) out.warnings.push({ path: 'entries.salinity.value', message: unusual });
  } catch (error) {
    if (!(error instanceof RangeError)) throw error;
    const sample =
      entry.sampleTempC ??
      (entry.unit === 'SG' && entry.method !== 'refractometer' ? temperature : undefined) ??
      entry.referenceTempC;
    out.errors.push({
      path: 'entries.salinity.value',
      message: salinityError(entry, sample, entry.referenceTempC),
    });
  }
}

/**
 * Turns the entries of one water test, as a member typed them, into what is stored: canonical values, derived
 * values (salinity from SG or conductivity, free ammonia) with how they were worked out, and warnings/errors.
 * Pure: the client runs it for a live preview of exactly what the server will store.
 */
export function normalizeWaterTest(
  input: { takenAt: string; entries: WaterTestEntries },
  ctx: NormalizeContext,
): NormalizedWaterTest {
  const out = {
    values: {} as CanonicalValues,
    derived: {} as DerivedInfo,
    warnings: [] as ReadingIssue[],
    errors: [] as ReadingIssue[],
  };
  const entries: Record<string, unknown> = {};
  if (toMs(input.takenAt) > toMs(ctx.now) + FUTURE_TOLERANCE_MS) {
    out.errors.push({
      path: 'takenAt',
      message: 'That time is in the future: give the time the water was tested.',
    });
  }
  let nonLinearSalinity: SalinityEntryLike | undefined;
  for (const key of PARAMETER_KEYS) {
    const entry = input.entries[key];
    if (!entry) continue;
    const filled = { ...entry, method: entry.method ?? defaultMethodFor(key, entry.unit) };
    entries[key] = filled;
    const path = `entries.${key}.value`;
    const impossible = impossibleReading(key, entry.value, entry.unit);
    if (impossible) {
      out.errors.push({ path, message: impossible });
      continue;
    }
    const unusual = unusualReading(key, entry.value, entry.unit);
    if (unusual) out.warnings.push({ path, message: unusual });
    if (isLinearEntry(key, entry.unit)) out.values[key] = toCanonical(key, entry.value, entry.unit);
    else nonLinearSalinity = filled;
  }
  // SG and conductivity need the sample temperature, which may be this test's own temperature reading.
  if (nonLinearSalinity) convertSalinity(nonLinearSalinity, out.values.temperature, out);

  let freeAmmonia: number | null = null;
  if (out.errors.length === 0) {
    const derivation = deriveFreeAmmonia(
      { id: ctx.testId ?? 'new-test', takenAt: input.takenAt, values: out.values },
      ctx.lastKnown ?? {},
      ctx,
    );
    if (derivation) {
      out.derived.freeAmmonia = derivation;
      freeAmmonia = derivation.value;
    }
  }
  return {
    takenAt: input.takenAt,
    values: out.values,
    freeAmmonia,
    entries: entries as WaterTestEntries,
    derived: out.derived,
    warnings: out.warnings,
    errors: out.errors,
  };
}
