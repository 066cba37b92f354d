import { practicalSalinityFromConductivity } from '../chemistry/practical-salinity';
import {
  REFERENCE_TEMP_60F_C,
  REFERENCE_TEMP_77F_C,
  salinityFromSpecificGravity,
  specificGravityFromSalinity,
} from '../chemistry/specific-gravity';
import type { TestMethod } from './entry-units';

/** Where the sample temperature used for an SG or conductivity reading came from. */
export type SampleTempSource = 'entry' | 'reference' | 'this-test' | 'last-known' | 'assumed';

export interface SalinityDerivation {
  from: 'SG' | 'mS/cm';
  reading: number;
  referenceTempC?: number;
  referenceTempSource?: 'entry' | 'assumed';
  sampleTempC: number;
  sampleTempSource: SampleTempSource;
}

export interface SalinityEntryLike {
  value: number;
  unit: string;
  method?: TestMethod;
  referenceTempC?: number;
  sampleTempC?: number;
}

/** The usual references; 15.56 typed for 60 °F snaps to the exact value. */
export const SG_REFERENCE_TEMPS_C = [REFERENCE_TEMP_60F_C, REFERENCE_TEMP_77F_C] as const;
export const DEFAULT_SG_REFERENCE_TEMP_C = REFERENCE_TEMP_77F_C;
/** Conductivity meters show values compensated to 25 °C unless told otherwise. */
export const CONDUCTIVITY_COMPENSATED_TO_C = 25;

function snapReference(t: number): number {
  return Math.abs(t - REFERENCE_TEMP_60F_C) < 0.01 ? REFERENCE_TEMP_60F_C : t;
}

export interface SalinityOutcome {
  salinity: number;
  derivation: SalinityDerivation;
}

/**
 * Practical salinity from an SG or conductivity entry. A refractometer compensates for temperature, so its
 * sample counts as being at the reference; a hydrometer floats in water at the tank's temperature.
 * Throws RangeError (from the chemistry engine) when the reading cannot mean any salinity at those temperatures.
 */
export function salinityFromEntry(
  entry: SalinityEntryLike,
  waterTemp?: { value: number; source: 'this-test' | 'last-known' },
): SalinityOutcome {
  if (entry.unit === 'mS/cm') {
    const sampleTempC = entry.sampleTempC ?? CONDUCTIVITY_COMPENSATED_TO_C;
    const salinity = practicalSalinityFromConductivity({ mScm: entry.value, tempC: sampleTempC });
    return {
      salinity,
      derivation: {
        from: 'mS/cm',
        reading: entry.value,
        sampleTempC,
        sampleTempSource: entry.sampleTempC === undefined ? 'assumed' : 'entry',
      },
    };
  }
  const referenceTempC = snapReference(entry.referenceTempC ?? DEFAULT_SG_REFERENCE_TEMP_C);
  let sampleTempC = referenceTempC;
  let sampleTempSource: SampleTempSource = 'reference';
  if (entry.sampleTempC !== undefined) {
    sampleTempC = entry.sampleTempC;
    sampleTempSource = 'entry';
  } else if (entry.method !== 'refractometer' && waterTemp) {
    sampleTempC = waterTemp.value;
    sampleTempSource = waterTemp.source;
  }
  const salinity = salinityFromSpecificGravity({ sg: entry.value, sampleTempC, referenceTempC });
  return {
    salinity,
    derivation: {
      from: 'SG',
      reading: entry.value,
      referenceTempC,
      referenceTempSource: entry.referenceTempC === undefined ? 'assumed' : 'entry',
      sampleTempC,
      sampleTempSource,
    },
  };
}

/** Practical salinity shown as SG, as an instrument referenced (and compensated) to `referenceTempC` would read it. */
export function salinityAsSpecificGravity(
  salinity: number,
  referenceTempC: number = DEFAULT_SG_REFERENCE_TEMP_C,
): number {
  return specificGravityFromSalinity({ salinity, sampleTempC: referenceTempC, referenceTempC });
}
