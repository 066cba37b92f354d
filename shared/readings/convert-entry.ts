import { parameterInfo, type ParameterKey } from '../care/parameters';
import { convert, type Unit } from '../chemistry/units';

/** Units whose conversion needs more than a factor (a temperature pair, a density model): handled by salinity.ts. */
export const NON_LINEAR_SALINITY_UNITS = ['SG', 'mS/cm'] as const;

export function isLinearEntry(parameter: ParameterKey, unit: string): boolean {
  return !(parameter === 'salinity' && (NON_LINEAR_SALINITY_UNITS as readonly string[]).includes(unit));
}

// Units the chemistry engine does not list convert one-to-one: pH, mg/L of Ca, Mg, PO4 have a single unit,
// and ppt is treated as practical salinity (they differ by about 0.5 %, less than a hobby instrument resolves).
function chemistryUnit(unit: string): Unit | null {
  return unit === '°C' ||
    unit === '°F' ||
    unit.startsWith('mg/L N') ||
    ['dKH', 'meq/L', 'mg/L CaCO3'].includes(unit)
    ? (unit as Unit)
    : null;
}

/** A reading in an entry unit → the parameter's canonical unit (not for SG or conductivity). */
export function toCanonical(parameter: ParameterKey, value: number, unit: string): number {
  const from = chemistryUnit(unit);
  if (!from) return value;
  return convert(value, from, parameterInfo(parameter).unit as Unit);
}

/** The inverse of toCanonical: what a canonical value reads as in one of the entry units. */
export function fromCanonical(parameter: ParameterKey, value: number, unit: string): number {
  const to = chemistryUnit(unit);
  if (!to) return value;
  return convert(value, parameterInfo(parameter).unit as Unit, to);
}
