import type { ParameterKey } from '../care/parameters';
import { parameterInfo } from '../care/parameters';
import type { ENTRY_UNITS } from '../readings/entry-units';
import type { CSV_DELIMITERS, DateFormat, ImportTarget } from '../schemas/csv-import.schema';

type AnyEntryUnit = (typeof ENTRY_UNITS)[ParameterKey][number];

/** How each entry unit is offered in a unit picker: the kit's basis in plain words. */
export const ENTRY_UNIT_LABELS: Record<AnyEntryUnit, string> = {
  '°C': '°C',
  '°F': '°F',
  SG: 'SG',
  ppt: 'ppt',
  PSU: 'PSU',
  'mS/cm': 'Conductivity mS/cm',
  pH: 'pH',
  'mg/L NH3': 'mg/L as NH3',
  'mg/L NH4': 'mg/L as NH4',
  'mg/L NH3-N': 'mg/L as N (NH3-N)',
  'mg/L NH4-N': 'mg/L as N (NH4-N)',
  'mg/L NO2': 'mg/L as NO2',
  'mg/L NO2-N': 'mg/L as N (NO2-N)',
  'mg/L NO3': 'mg/L as NO3',
  'mg/L NO3-N': 'mg/L as N (NO3-N)',
  dKH: 'dKH',
  'meq/L': 'meq/L',
  'mg/L CaCO3': 'ppm (mg/L CaCO3)',
  'mg/L Ca': 'mg/L',
  'mg/L Mg': 'mg/L',
  'mg/L PO4': 'mg/L',
};

export const DATE_FORMAT_LABELS: Record<DateFormat, string> = {
  iso: 'Year first: 2025-03-31',
  dmy: 'Day first: 31/03/2025',
  mdy: 'Month first: 03/31/2025',
};

export const CSV_DELIMITER_LABELS: Record<(typeof CSV_DELIMITERS)[number], string> = {
  ',': 'Comma ,',
  ';': 'Semicolon ;',
  '\t': 'Tab',
  '|': 'Bar |',
};

export function importTargetLabel(target: ImportTarget): string {
  switch (target) {
    case 'takenAt':
      return 'Date of the test';
    case 'time':
      return 'Time of day';
    case 'note':
      return 'Note';
    case 'record':
      return 'Kind of row (our export)';
    case 'ignore':
      return 'Leave out';
    default:
      return parameterInfo(target).label;
  }
}
