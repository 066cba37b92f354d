import { pureWaterDensity, PURE_WATER_TEMP_RANGE_C } from './pure-water-density';
import { solveIncreasing } from './root-finding';
import { EOS80_SALINITY_RANGE, EOS80_TEMP_RANGE_C, seawaterDensity } from './seawater-density';
import { requireInRange, requireObject, requirePositive } from './validate';

// Specific gravity here is ρ(sample at sampleTempC) / ρ(pure water at referenceTempC), the way
// hydrometers and refractometers are calibrated. Instrument effects (thermal expansion of a glass
// hydrometer, a refractometer's own compensation) are not modelled.

/** 60 °F, the classic hydrometer reference (15.56 °C). */
export const REFERENCE_TEMP_60F_C = ((60 - 32) * 5) / 9;
/** 77 °F = 25 °C, the other common reference. */
export const REFERENCE_TEMP_77F_C = 25;
/** Any reference inside the pure-water formula's validity is accepted. */
export const REFERENCE_TEMP_RANGE_C = PURE_WATER_TEMP_RANGE_C;

export interface SpecificGravityInput {
  salinity: number;
  sampleTempC: number;
  referenceTempC: number;
}

function checkTemperatures(
  sampleTempC: unknown,
  referenceTempC: unknown,
): { sample: number; reference: number } {
  const sample = requireInRange(
    'sampleTempC',
    sampleTempC,
    EOS80_TEMP_RANGE_C.min,
    EOS80_TEMP_RANGE_C.max,
    '°C',
    'EOS-80',
  );
  const reference = requireInRange(
    'referenceTempC',
    referenceTempC,
    REFERENCE_TEMP_RANGE_C.min,
    REFERENCE_TEMP_RANGE_C.max,
    '°C',
    'Tanaka et al. 2001 pure-water density',
  );
  return { sample, reference };
}

export function specificGravityFromSalinity(input: SpecificGravityInput): number {
  const { salinity, sampleTempC, referenceTempC } = requireObject('input', input);
  const { sample, reference } = checkTemperatures(sampleTempC, referenceTempC);
  return seawaterDensity(salinity as number, sample) / pureWaterDensity(reference);
}

export interface SalinityFromSpecificGravityInput {
  sg: number;
  sampleTempC: number;
  referenceTempC: number;
}

/** Practical salinity from a specific-gravity reading; inverts specificGravityFromSalinity. */
export function salinityFromSpecificGravity(input: SalinityFromSpecificGravityInput): number {
  const { sg, sampleTempC, referenceTempC } = requireObject('input', input);
  const reading = requirePositive('sg', sg);
  const { sample, reference } = checkTemperatures(sampleTempC, referenceTempC);
  const pure = pureWaterDensity(reference);
  const sgAt = (s: number): number => seawaterDensity(s, sample) / pure;

  // Density rises monotonically with salinity over the EOS-80 range, so the bracket ends bound the SG.
  const lowest = sgAt(EOS80_SALINITY_RANGE.min);
  const highest = sgAt(EOS80_SALINITY_RANGE.max);
  if (reading < lowest || reading > highest) {
    throw new RangeError(
      `sg must be between ${lowest.toFixed(5)} and ${highest.toFixed(5)} at ${sample} °C against pure water at ` +
        `${reference} °C (salinity ${EOS80_SALINITY_RANGE.min}–${EOS80_SALINITY_RANGE.max}); got ${reading}`,
    );
  }
  return solveIncreasing(sgAt, reading, EOS80_SALINITY_RANGE.min, EOS80_SALINITY_RANGE.max);
}
