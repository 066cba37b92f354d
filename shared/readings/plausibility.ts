import { parameterInfo, type ParameterKey } from '../care/parameters';
import { fromCanonical, isLinearEntry, toCanonical } from './convert-entry';

export type Range = readonly [min: number, max: number];

export interface Plausibility {
  /** Outside: not a reading any tank can give — a typo; refused. */
  possible: Range;
  /** Outside (but possible): accepted with a warning to check it. */
  usual: Range;
}

/**
 * The one table of what a reading can be, in canonical units. Ranges are common practice, no source:
 * wide enough for any aquarium (a cycling tank dosed with ammonia, soft-water tanks at 0 dKH, lagoon
 * salinities), narrow enough to catch a slipped decimal point.
 */
export const PLAUSIBILITY: Readonly<Record<ParameterKey, Plausibility>> = {
  temperature: { possible: [-2, 45], usual: [10, 35] },
  salinity: { possible: [0, 45], usual: [0, 40] },
  pH: { possible: [0, 14], usual: [5.5, 9.5] },
  ammonia: { possible: [0, 20], usual: [0, 8] },
  nitrite: { possible: [0, 50], usual: [0, 10] },
  nitrate: { possible: [0, 1000], usual: [0, 200] },
  alkalinity: { possible: [0, 40], usual: [0, 20] },
  calcium: { possible: [0, 2000], usual: [0, 600] },
  magnesium: { possible: [0, 3000], usual: [0, 1800] },
  phosphate: { possible: [0, 20], usual: [0, 3] },
};

/** Instrument scales checked as read, before any conversion (common practice, no source). */
export const INSTRUMENT_PLAUSIBILITY = {
  SG: { possible: [0.99, 1.04], usual: [0.998, 1.03] },
  'mS/cm': { possible: [0, 80], usual: [0, 65] },
} as const satisfies Record<string, Plausibility>;

const inside = (v: number, [min, max]: Range) => v >= min && v <= max;

function trim(n: number): string {
  const rounded = Number(n.toPrecision(6));
  return Number.isInteger(rounded) ? rounded.toFixed(1) : String(rounded);
}

/** "pH", "Nitrate … mg/L NO3", "Specific gravity". */
function describe(parameter: ParameterKey, value: number, unit: string): string {
  if (parameter === 'pH') return `pH ${value}`;
  if (unit === 'SG') return `Specific gravity ${value}`;
  if (unit === 'mS/cm') return `Conductivity ${value} mS/cm`;
  return `${parameterInfo(parameter).label} ${value} ${unit}`;
}

interface Scale {
  plausibility: Plausibility;
  /** Maps an entered value onto the scale the ranges are in; null when it cannot be converted at all. */
  toScale(v: number): number | null;
  /** Shows a value of the ranges' scale in the entered unit. */
  fromScale(v: number): number;
}

function scaleFor(parameter: ParameterKey, unit: string): Scale {
  if (!isLinearEntry(parameter, unit)) {
    const plausibility = INSTRUMENT_PLAUSIBILITY[unit as keyof typeof INSTRUMENT_PLAUSIBILITY];
    return { plausibility, toScale: (v) => v, fromScale: (v) => v };
  }
  return {
    plausibility: PLAUSIBILITY[parameter],
    toScale: (v) => {
      try {
        return toCanonical(parameter, v, unit);
      } catch (error) {
        if (error instanceof RangeError) return null; // e.g. below absolute zero
        throw error;
      }
    },
    fromScale: (v) => fromCanonical(parameter, v, unit),
  };
}

function rangeText(scale: Scale, range: Range, unit: string): string {
  const [lo, hi] = range.map((v) => trim(scale.fromScale(v)).replace(/\.0$/, ''));
  const suffix = unit === 'pH' || unit === 'SG' ? '' : ` ${unit}`;
  return `${lo}–${hi}${suffix}`;
}

/** A slipped decimal point: the first of value/10, /100, /1000 that would be a usual reading. */
function suggestion(scale: Scale, value: number): number | null {
  for (const divisor of [10, 100, 1000]) {
    const candidate = scale.toScale(value / divisor);
    if (candidate !== null && inside(candidate, scale.plausibility.usual)) return value / divisor;
  }
  return null;
}

/** Refuses a value no tank can have: "pH 80 is not possible — did you mean 8.0?". */
export function impossibleReading(parameter: ParameterKey, value: number, unit: string): string | null {
  const scale = scaleFor(parameter, unit);
  const onScale = scale.toScale(value);
  if (onScale !== null && inside(onScale, scale.plausibility.possible)) return null;
  const what = describe(parameter, value, unit);
  const guess = value > 0 ? suggestion(scale, value) : null;
  if (guess !== null) return `${what} is not possible — did you mean ${trim(guess)}?`;
  return `${what} is not possible: readings go from ${rangeText(scale, scale.plausibility.possible, unit)}.`;
}

/** Flags a possible but unusual value: "pH 5.2 is unusual (most tanks read 5.5–9.5): check the reading.". */
export function unusualReading(parameter: ParameterKey, value: number, unit: string): string | null {
  const scale = scaleFor(parameter, unit);
  const onScale = scale.toScale(value);
  if (onScale === null || inside(onScale, scale.plausibility.usual)) return null;
  return `${describe(parameter, value, unit)} is unusual (most tanks read ${rangeText(scale, scale.plausibility.usual, unit)}): check the reading.`;
}
