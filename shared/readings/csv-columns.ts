import { DERIVED_PARAMETERS, PARAMETERS, type ParameterKey } from '../care/parameters';
import type { ImportTarget, ImportUnits } from '../schemas/csv-import.schema';

const words = (key: string) => key.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase();

/** Export header of a measured or derived parameter, naming its unit: "nitrate (mg/L NO3)", "pH". */
export function parameterHeader(key: ParameterKey | 'freeAmmonia'): string {
  const info = [...PARAMETERS, ...DERIVED_PARAMETERS].find((p) => p.key === key);
  if (!info || info.unit === 'pH') return key === 'pH' ? 'pH' : words(key);
  return `${words(key)} (${info.unit})`;
}

// Order matters: the first pattern that matches a header wins ("free ammonia" before "ammonia", "salinity at 25 °C"
// before temperature, "ph" only as a word).
const TARGET_PATTERNS: readonly [RegExp, ImportTarget][] = [
  [/^(record|type|kind|entry)$/, 'record'],
  [/free\s*ammonia|un-?ionized|free\s*nh3/, 'ignore'],
  [/^time$|^hour|^time of day/, 'time'],
  [/date|taken|when|timestamp|^at$/, 'takenAt'],
  [/note|comment|remark/, 'note'],
  [/salin|\bsg\b|specific\s*gravity|density|conductiv|\bppt\b|\bpsu\b/, 'salinity'],
  [/temp|°\s*[cf]\b|celsius|fahrenheit/, 'temperature'],
  [/\bph\b/, 'pH'],
  [/ammon|\bnh[34]\b|\btan\b/, 'ammonia'],
  [/nitrite|\bno2\b/, 'nitrite'],
  [/nitrate|\bno3\b/, 'nitrate'],
  [/alk|\bd?kh\b|carbonate\s*hardness/, 'alkalinity'],
  [/calc|^ca(\s|\(|$)/, 'calcium'],
  [/magnes|^mg(\s|\(|$)/, 'magnesium'],
  [/phosph|\bpo4\b/, 'phosphate'],
];

export function guessTarget(header: string): ImportTarget {
  const h = header.trim().toLowerCase();
  return TARGET_PATTERNS.find(([re]) => re.test(h))?.[1] ?? 'ignore';
}

function median(values: readonly number[]): number | undefined {
  if (values.length === 0) return undefined;
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

/** The unit a column is most likely in, from its header and, failing that, its numbers. */
export function guessUnit<K extends keyof ImportUnits>(
  parameter: K,
  header: string,
  samples: readonly number[],
): NonNullable<ImportUnits[K]> {
  const h = header.toLowerCase();
  const mid = median(samples);
  const asN = /-\s*n\b|\bas\s+n\b|\btan\b/.test(h);
  const pick = (): string => {
    switch (parameter) {
      case 'temperature':
        return /°\s*f|\(f\)|\bf\b|fahrenheit|deg\s*f/.test(h) ||
          (!/°\s*c|\(c\)|celsius/.test(h) && mid !== undefined && mid > 45)
          ? '°F'
          : '°C';
      case 'salinity':
        if (/\bsg\b|specific|gravity|density/.test(h)) return 'SG';
        if (/ms\s*\/\s*cm|conductiv/.test(h)) return 'mS/cm';
        if (/psu|practical/.test(h)) return 'PSU';
        if (/ppt|‰|g\s*\/\s*kg/.test(h)) return 'ppt';
        if (mid !== undefined && mid > 0.98 && mid < 1.05) return 'SG';
        return mid !== undefined && mid > 45 ? 'mS/cm' : 'ppt';
      case 'ammonia':
        if (asN) return /nh4/.test(h) ? 'mg/L NH4-N' : 'mg/L NH3-N';
        return /nh4/.test(h) ? 'mg/L NH4' : 'mg/L NH3';
      case 'nitrite':
        return asN ? 'mg/L NO2-N' : 'mg/L NO2';
      case 'nitrate':
        return asN ? 'mg/L NO3-N' : 'mg/L NO3';
      default:
        if (/meq/.test(h)) return 'meq/L';
        return /caco3|ppm|mg\s*\/\s*l/.test(h) ? 'mg/L CaCO3' : 'dKH';
    }
  };
  return pick() as NonNullable<ImportUnits[K]>;
}
