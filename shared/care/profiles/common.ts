import { parameterInfo, type AnyParameterKey } from '../parameters';
import { COMMON_PRACTICE, SOURCES, type Provenance } from '../provenance';
import type { Band, Cadence, ParameterRange } from './types';

export function range(
  parameter: AnyParameterKey,
  ideal: Band,
  caution: Band,
  provenance: Provenance = COMMON_PRACTICE,
  extra: Pick<ParameterRange, 'danger' | 'target'> = {},
): ParameterRange {
  return { ideal, caution, unit: parameterInfo(parameter).unit, provenance, ...extra };
}

/** Free NH3 above the published long-term guidance for fish is urgent on every profile. */
export const FREE_AMMONIA_LIMIT_MG_L = 0.02;

export const FREE_AMMONIA_RANGE: ParameterRange = range(
  'freeAmmonia',
  [0, FREE_AMMONIA_LIMIT_MG_L],
  [0, FREE_AMMONIA_LIMIT_MG_L],
  SOURCES.epa1976RedBook,
);

/** Daily ammonia/nitrite while a tank cycles (common practice, no source). */
export const CYCLING_CADENCE_FRESH: Cadence = { ammonia: 1, nitrite: 1, nitrate: 2, pH: 3, temperature: 3 };
export const CYCLING_CADENCE_SALT: Cadence = { ...CYCLING_CADENCE_FRESH, salinity: 3 };

/** Weekly basics on an established tank (common practice, no source). */
export const ESTABLISHED_CADENCE_FRESH: Cadence = {
  ammonia: 7,
  nitrite: 7,
  nitrate: 7,
  pH: 7,
  temperature: 7,
  alkalinity: 30,
};
export const ESTABLISHED_CADENCE_SALT: Cadence = {
  ammonia: 7,
  nitrite: 7,
  nitrate: 7,
  pH: 7,
  temperature: 7,
  salinity: 7,
  alkalinity: 30,
};
