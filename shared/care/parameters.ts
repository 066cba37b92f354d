/**
 * Canonical units every reading is stored in. Single source of truth: the UI converts
 * from whatever a member's kit shows into these before a reading is saved.
 */
export const PARAMETERS = [
  { key: 'temperature', label: 'Temperature', unit: '°C', decimals: 1 },
  { key: 'salinity', label: 'Salinity', unit: 'PSU', decimals: 1 },
  { key: 'pH', label: 'pH', unit: 'pH', decimals: 2 },
  { key: 'ammonia', label: 'Ammonia (total)', unit: 'mg/L NH3', decimals: 2 },
  { key: 'nitrite', label: 'Nitrite', unit: 'mg/L NO2', decimals: 2 },
  { key: 'nitrate', label: 'Nitrate', unit: 'mg/L NO3', decimals: 1 },
  { key: 'alkalinity', label: 'Alkalinity', unit: 'dKH', decimals: 1 },
  { key: 'calcium', label: 'Calcium', unit: 'mg/L Ca', decimals: 0 },
  { key: 'magnesium', label: 'Magnesium', unit: 'mg/L Mg', decimals: 0 },
  { key: 'phosphate', label: 'Phosphate', unit: 'mg/L PO4', decimals: 2 },
] as const;

/** Values worked out from measured ones; never entered by a member. */
export const DERIVED_PARAMETERS = [
  { key: 'freeAmmonia', label: 'Free ammonia (toxic part)', unit: 'mg/L NH3', decimals: 3 },
] as const;

export type ParameterKey = (typeof PARAMETERS)[number]['key'];
export type DerivedParameterKey = (typeof DERIVED_PARAMETERS)[number]['key'];
/** Anything a profile can set a range for, or a concern can be about. */
export type AnyParameterKey = ParameterKey | DerivedParameterKey;

export interface ParameterInfo {
  key: AnyParameterKey;
  label: string;
  unit: string;
  decimals: number;
}

export const PARAMETER_KEYS: readonly ParameterKey[] = PARAMETERS.map((p) => p.key);
export const ANY_PARAMETER_KEYS: readonly AnyParameterKey[] = [
  ...PARAMETER_KEYS,
  ...DERIVED_PARAMETERS.map((p) => p.key),
];

const INFO: ReadonlyMap<AnyParameterKey, ParameterInfo> = new Map(
  [...PARAMETERS, ...DERIVED_PARAMETERS].map((p) => [p.key, p] as const),
);

export function parameterInfo(key: AnyParameterKey): ParameterInfo {
  const info = INFO.get(key);
  if (!info) throw new Error(`Unknown parameter: ${key}`);
  return info;
}

export function isParameterKey(value: string): value is ParameterKey {
  return (PARAMETER_KEYS as readonly string[]).includes(value);
}

/** Rounds to the parameter's decimals without trailing zeros: 0.50 → "0.5", 35.0 → "35". */
export function formatNumber(key: AnyParameterKey, value: number): string {
  const fixed = value.toFixed(parameterInfo(key).decimals);
  return fixed.includes('.') ? fixed.replace(/\.?0+$/, '') : fixed;
}

/** "Nitrite 0.5 mg/L NO2", "pH 7.9", "Temperature 25 °C". */
export function formatReading(key: AnyParameterKey, value: number): string {
  const info = parameterInfo(key);
  const number = formatNumber(key, value);
  if (key === 'pH') return `pH ${number}`;
  return `${info.label} ${number} ${info.unit}`;
}
