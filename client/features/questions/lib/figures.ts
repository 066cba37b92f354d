import { formatNumber, parameterInfo, type AnyParameterKey } from '../../../../shared/care/parameters';
import { convert } from '../../../../shared/chemistry/units';
import { OBSERVATION_CHECK_LABELS, OBSERVATION_SCALE_LABELS, OBSERVATION_VALUE_LABELS } from '../../../../shared/constants/tank-labels';
import type { SalinityDisplay, TemperatureUnit } from '../../../../shared/constants/units';
import { salinityAsSpecificGravity } from '../../../../shared/readings/salinity';
import { OBSERVATION_CHECKS, OBSERVATION_SCALES, type TankEventDetails } from '../../../../shared/schemas/tank-event.schema';

/** The reader's display preferences (from /me); the snapshot itself is in canonical units. */
export interface FigurePrefs {
  temperatureUnit: TemperatureUnit;
  salinityDisplay: SalinityDisplay;
}

export function figureUnit(key: AnyParameterKey, prefs: FigurePrefs): string {
  if (key === 'temperature') return prefs.temperatureUnit === 'F' ? '°F' : '°C';
  if (key === 'salinity') return prefs.salinityDisplay === 'sg' ? 'SG' : 'ppt';
  const unit = parameterInfo(key).unit;
  return unit === 'pH' ? '' : unit;
}

/** A canonical value in the reader's unit: °F for °C, SG for practical salinity. */
export function toFigure(key: AnyParameterKey, canonical: number, prefs: FigurePrefs): number {
  if (key === 'temperature' && prefs.temperatureUnit === 'F') return convert(canonical, '°C', '°F');
  if (key === 'salinity' && prefs.salinityDisplay === 'sg') return salinityAsSpecificGravity(canonical);
  return canonical;
}

/** "25.1 °C", "SG 1.0250", "pH 8.1", "40 mg/L NO3". */
export function formatFigure(key: AnyParameterKey, canonical: number, prefs: FigurePrefs): string {
  const value = toFigure(key, canonical, prefs);
  if (key === 'salinity' && prefs.salinityDisplay === 'sg') return `SG ${value.toFixed(4)}`;
  if (key === 'pH') return `pH ${formatNumber(key, value)}`;
  return `${formatNumber(key, value)} ${figureUnit(key, prefs)}`;
}

const SCALES = Object.keys(OBSERVATION_SCALES) as (keyof typeof OBSERVATION_SCALES)[];

/** What an observation recorded, a line per kind of thing seen. */
export function describeObservation(d: TankEventDetails<'observation'>): string[] {
  const seen = SCALES.flatMap((s) => (d[s] ? [`${OBSERVATION_SCALE_LABELS[s]}: ${OBSERVATION_VALUE_LABELS[d[s]!].toLowerCase()}`] : []));
  if (d.breathsPerMinute !== undefined) seen.push(`${d.breathsPerMinute} breaths a minute`);
  const checks = OBSERVATION_CHECKS.filter((c) => d.checks?.[c]).map((c) => OBSERVATION_CHECK_LABELS[c].toLowerCase());
  return [d.animal ? `Watching: ${d.animal}` : '', seen.join(' · '), checks.length ? `Also seen: ${checks.join(', ')}` : '', d.text ?? ''].filter(Boolean);
}

const dateTime = new Intl.DateTimeFormat(undefined, { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' });
const day = new Intl.DateTimeFormat(undefined, { day: 'numeric', month: 'short' });
export const formatDateTime = (iso: string | number) => dateTime.format(typeof iso === 'string' ? Date.parse(iso) : iso);
export const formatDay = (ms: number) => day.format(ms);
