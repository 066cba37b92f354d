import type { ParameterKey } from '../care/parameters';
import { ALKALINITY_UNITS, type NitrogenUnit, type TemperatureUnit } from '../chemistry/units';

/** How a reading was taken. */
export const TEST_METHODS = [
  'liquid-kit',
  'strip',
  'digital-meter',
  'refractometer',
  'hydrometer',
  'lab',
] as const;
export type TestMethod = (typeof TEST_METHODS)[number];

// Subsets of the chemistry engine's units (checked by `satisfies`), as tuples so zod can enumerate them.
export const TEMPERATURE_ENTRY_UNITS = ['°C', '°F'] as const satisfies readonly TemperatureUnit[];
export const AMMONIA_ENTRY_UNITS = [
  'mg/L NH3',
  'mg/L NH4',
  'mg/L NH3-N',
  'mg/L NH4-N',
] as const satisfies readonly NitrogenUnit[];
export const NITRITE_ENTRY_UNITS = ['mg/L NO2', 'mg/L NO2-N'] as const satisfies readonly NitrogenUnit[];
export const NITRATE_ENTRY_UNITS = ['mg/L NO3', 'mg/L NO3-N'] as const satisfies readonly NitrogenUnit[];
export const ALKALINITY_ENTRY_UNITS = ALKALINITY_UNITS;
/** SG from a refractometer or hydrometer; ppt/PSU read straight off a scale; conductivity from a meter. */
export const SALINITY_ENTRY_UNITS = ['SG', 'ppt', 'PSU', 'mS/cm'] as const;

export type SalinityEntryUnit = (typeof SALINITY_ENTRY_UNITS)[number];

/** Every unit a member may enter per parameter; the first-listed canonical unit is in each list. */
export const ENTRY_UNITS = {
  temperature: TEMPERATURE_ENTRY_UNITS,
  salinity: SALINITY_ENTRY_UNITS,
  pH: ['pH'],
  ammonia: AMMONIA_ENTRY_UNITS,
  nitrite: NITRITE_ENTRY_UNITS,
  nitrate: NITRATE_ENTRY_UNITS,
  alkalinity: ALKALINITY_ENTRY_UNITS,
  calcium: ['mg/L Ca'],
  magnesium: ['mg/L Mg'],
  phosphate: ['mg/L PO4'],
} as const satisfies Record<ParameterKey, readonly [string, ...string[]]>;

export type EntryUnit<K extends ParameterKey> = (typeof ENTRY_UNITS)[K][number];

/** The method recorded when a member does not say. */
export function defaultMethodFor(parameter: ParameterKey, unit: string): TestMethod {
  if (parameter === 'temperature') return 'digital-meter';
  if (parameter === 'salinity') return unit === 'mS/cm' ? 'digital-meter' : 'refractometer';
  return 'liquid-kit';
}
