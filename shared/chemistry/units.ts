import { MEQ_PER_L_PER_DKH, MG_PER_L_CACO3_PER_MEQ, MOLAR_MASSES } from './atomic-weights';
import { requireFinite, requireOneOf } from './validate';

export const NITROGEN_UNITS = [
  'mg/L NH3',
  'mg/L NH3-N',
  'mg/L NH4',
  'mg/L NH4-N',
  'mg/L NO2',
  'mg/L NO2-N',
  'mg/L NO3',
  'mg/L NO3-N',
] as const;
export const ALKALINITY_UNITS = ['dKH', 'meq/L', 'mg/L CaCO3'] as const;
export const TEMPERATURE_UNITS = ['°C', '°F', 'K'] as const;
export const VOLUME_UNITS = ['L', 'US gal', 'UK gal'] as const;
export const UNITS = [...NITROGEN_UNITS, ...ALKALINITY_UNITS, ...TEMPERATURE_UNITS, ...VOLUME_UNITS] as const;

export type NitrogenUnit = (typeof NITROGEN_UNITS)[number];
export type AlkalinityUnit = (typeof ALKALINITY_UNITS)[number];
export type TemperatureUnit = (typeof TEMPERATURE_UNITS)[number];
export type VolumeUnit = (typeof VOLUME_UNITS)[number];
export type Unit = (typeof UNITS)[number];

/**
 * Conversion families. NH3, NH4+ and their "-N" forms are all ways of reporting total ammonia
 * nitrogen, so they inter-convert; nitrite and nitrate are different substances and never do.
 */
export type UnitFamily = 'total-ammonia' | 'nitrite' | 'nitrate' | 'alkalinity' | 'temperature' | 'volume';

/** Exact by definition: US gallon = 231 in³, imperial gallon = 4.54609 L. */
export const LITRES_PER_US_GALLON = 3.785411784;
export const LITRES_PER_UK_GALLON = 4.54609;
export const ZERO_CELSIUS_IN_KELVIN = 273.15;

interface UnitSpec {
  family: UnitFamily;
  /** Multiply a value in this unit by `toBase` to get the family's base quantity (linear units only). */
  toBase: number;
}

// Nitrogen base: mmol/L of nitrogen atoms. An ion unit divides by the ion's molar mass, a "-N" unit by N's.
const nitrogen = (family: UnitFamily, molarMass: number): UnitSpec => ({ family, toBase: 1 / molarMass });

const LINEAR_UNITS: Record<Exclude<Unit, TemperatureUnit>, UnitSpec> = {
  'mg/L NH3': nitrogen('total-ammonia', MOLAR_MASSES.NH3),
  'mg/L NH3-N': nitrogen('total-ammonia', MOLAR_MASSES.N),
  'mg/L NH4': nitrogen('total-ammonia', MOLAR_MASSES.NH4),
  'mg/L NH4-N': nitrogen('total-ammonia', MOLAR_MASSES.N),
  'mg/L NO2': nitrogen('nitrite', MOLAR_MASSES.NO2),
  'mg/L NO2-N': nitrogen('nitrite', MOLAR_MASSES.N),
  'mg/L NO3': nitrogen('nitrate', MOLAR_MASSES.NO3),
  'mg/L NO3-N': nitrogen('nitrate', MOLAR_MASSES.N),
  // Alkalinity base: meq/L.
  dKH: { family: 'alkalinity', toBase: MEQ_PER_L_PER_DKH },
  'meq/L': { family: 'alkalinity', toBase: 1 },
  'mg/L CaCO3': { family: 'alkalinity', toBase: 1 / MG_PER_L_CACO3_PER_MEQ },
  // Volume base: litres.
  L: { family: 'volume', toBase: 1 },
  'US gal': { family: 'volume', toBase: LITRES_PER_US_GALLON },
  'UK gal': { family: 'volume', toBase: LITRES_PER_UK_GALLON },
};

export const UNIT_FAMILIES: Readonly<Record<UnitFamily, readonly Unit[]>> = {
  'total-ammonia': ['mg/L NH3', 'mg/L NH3-N', 'mg/L NH4', 'mg/L NH4-N'],
  nitrite: ['mg/L NO2', 'mg/L NO2-N'],
  nitrate: ['mg/L NO3', 'mg/L NO3-N'],
  alkalinity: ALKALINITY_UNITS,
  temperature: TEMPERATURE_UNITS,
  volume: VOLUME_UNITS,
};

function isTemperatureUnit(unit: Unit): unit is TemperatureUnit {
  return (TEMPERATURE_UNITS as readonly string[]).includes(unit);
}

export function unitFamily(unit: Unit): UnitFamily {
  const checked = requireOneOf('unit', unit, UNITS);
  return isTemperatureUnit(checked) ? 'temperature' : LINEAR_UNITS[checked].family;
}

function toKelvin(value: number, unit: TemperatureUnit): number {
  if (unit === 'K') return value;
  if (unit === '°C') return value + ZERO_CELSIUS_IN_KELVIN;
  return ((value - 32) * 5) / 9 + ZERO_CELSIUS_IN_KELVIN;
}

function fromKelvin(kelvin: number, unit: TemperatureUnit): number {
  if (unit === 'K') return kelvin;
  if (unit === '°C') return kelvin - ZERO_CELSIUS_IN_KELVIN;
  return ((kelvin - ZERO_CELSIUS_IN_KELVIN) * 9) / 5 + 32;
}

/**
 * Convert a value between two units of the same family. Throws RangeError for an unknown unit, a
 * pair from different families (°C → L, NO3 → NO2), a non-finite value, a negative amount, or a
 * temperature below absolute zero.
 */
export function convert(value: number, from: Unit, to: Unit): number {
  const fromUnit = requireOneOf('from', from, UNITS);
  const toUnit = requireOneOf('to', to, UNITS);
  const fromFamily = unitFamily(fromUnit);
  const toFamily = unitFamily(toUnit);
  if (fromFamily !== toFamily) {
    throw new RangeError(
      `cannot convert '${fromUnit}' (${fromFamily}) to '${toUnit}' (${toFamily}): only units of the same family convert`,
    );
  }
  const v = requireFinite('value', value, fromUnit);

  if (isTemperatureUnit(fromUnit) && isTemperatureUnit(toUnit)) {
    const kelvin = toKelvin(v, fromUnit);
    if (kelvin < 0) {
      throw new RangeError(`value must not be below absolute zero (0 K); got ${v} ${fromUnit}`);
    }
    return fromUnit === toUnit ? v : fromKelvin(kelvin, toUnit);
  }
  if (isTemperatureUnit(fromUnit) || isTemperatureUnit(toUnit)) {
    throw new RangeError(`cannot convert '${fromUnit}' to '${toUnit}'`); // unreachable: families already match
  }
  if (v < 0) {
    throw new RangeError(`value must be a finite number ≥ 0 ${fromUnit}; got ${v}`);
  }
  if (fromUnit === toUnit) return v;
  return (v * LINEAR_UNITS[fromUnit].toBase) / LINEAR_UNITS[toUnit].toBase;
}
