import { formatNumber, parameterInfo, type AnyParameterKey } from '@shared/care/parameters';
import type { SalinityDisplay, TemperatureUnit, VolumeUnit } from '@shared/constants/units';
import { convert } from '@shared/chemistry/units';
import { salinityAsSpecificGravity } from '@shared/readings/salinity';

/** The member's reading preferences (from /me): every screen shows canonical values in these units. */
export interface UnitPrefs {
  temperatureUnit: TemperatureUnit;
  volumeUnit: VolumeUnit;
  salinityDisplay: SalinityDisplay;
}
/** What showing a parameter's value needs (volumes aside). */
export type ReadingPrefs = Pick<UnitPrefs, 'temperatureUnit' | 'salinityDisplay'>;

/** SG reads to the fourth decimal on the instruments keepers use. */
const SG_DECIMALS = 4;

const usesSg = (key: AnyParameterKey, prefs: ReadingPrefs) =>
  key === 'salinity' && prefs.salinityDisplay === 'sg';
const usesF = (key: AnyParameterKey, prefs: ReadingPrefs) =>
  key === 'temperature' && prefs.temperatureUnit === 'F';

/** The unit a parameter is shown in for this member: °F instead of °C, SG or ppt instead of PSU. */
export function displayUnit(key: AnyParameterKey, prefs: ReadingPrefs): string {
  if (usesF(key, prefs)) return '°F';
  if (key === 'salinity') return prefs.salinityDisplay === 'sg' ? 'SG' : 'ppt';
  const unit = parameterInfo(key).unit;
  return unit === 'pH' ? '' : unit;
}

/** A canonical value in the member's unit (monotonic, so band edges convert the same way). */
export function toDisplay(key: AnyParameterKey, canonical: number, prefs: ReadingPrefs): number {
  if (usesF(key, prefs)) return convert(canonical, '°C', '°F');
  if (usesSg(key, prefs)) return salinityAsSpecificGravity(canonical);
  return canonical;
}

export function displayDecimals(key: AnyParameterKey, prefs: ReadingPrefs): number {
  return usesSg(key, prefs) ? SG_DECIMALS : parameterInfo(key).decimals;
}

/** "77.4", "1.0245", "0.25": the member's unit, the parameter's usual decimals, no trailing zeros. */
export function formatDisplayNumber(key: AnyParameterKey, canonical: number, prefs: ReadingPrefs): string {
  const value = toDisplay(key, canonical, prefs);
  if (usesSg(key, prefs)) return value.toFixed(SG_DECIMALS);
  return formatNumber(key, value);
}

/** "77.4 °F", "SG 1.0245", "pH 8.1", "5 mg/L NO3". */
export function formatDisplay(key: AnyParameterKey, canonical: number, prefs: ReadingPrefs): string {
  const number = formatDisplayNumber(key, canonical, prefs);
  if (key === 'pH') return `pH ${number}`;
  if (usesSg(key, prefs)) return `SG ${number}`;
  return `${number} ${displayUnit(key, prefs)}`;
}

const VOLUME_UNIT: Record<VolumeUnit, 'L' | 'US gal'> = { L: 'L', USgal: 'US gal' };

export function volumeUnitOf(prefs: Pick<UnitPrefs, 'volumeUnit'>): 'L' | 'US gal' {
  return VOLUME_UNIT[prefs.volumeUnit];
}

/** Litres in the member's volume unit. */
export function volumeToDisplay(litres: number, prefs: Pick<UnitPrefs, 'volumeUnit'>): number {
  return convert(litres, 'L', volumeUnitOf(prefs));
}

/** "200 L", "52.8 US gal"; small volumes keep one decimal. */
export function formatVolume(litres: number, prefs: Pick<UnitPrefs, 'volumeUnit'>): string {
  const value = volumeToDisplay(litres, prefs);
  const text = value >= 100 ? Math.round(value).toString() : String(Number(value.toFixed(1)));
  return `${text} ${volumeUnitOf(prefs)}`;
}

/** "pH 8.1", "25.1 °C", "SG 1.0250", "Nitrate 5 mg/L NO3": a value that says what it is. */
export function formatLabelled(key: AnyParameterKey, canonical: number, prefs: ReadingPrefs): string {
  const text = formatDisplay(key, canonical, prefs);
  return key === 'pH' || key === 'temperature' || key === 'salinity'
    ? text
    : `${parameterInfo(key).label} ${text}`;
}
