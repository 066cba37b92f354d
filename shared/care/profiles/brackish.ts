import { COMMON_PRACTICE } from '../provenance';
import { CYCLING_CADENCE_SALT, FREE_AMMONIA_RANGE, range } from './common';
import type { CareProfile } from './types';

// Every band here is common practice, no source. Brackish species differ widely in the salt they
// want; clubs should copy this profile and narrow the salinity band for their animals.
export const BRACKISH_PROFILE: CareProfile = {
  key: 'brackish',
  name: 'Brackish',
  version: 1,
  systemTypes: ['brackish'],
  animals: 'brackish fish',
  ranges: {
    temperature: range('temperature', [24, 28], [22, 30]),
    salinity: range('salinity', [5, 20], [2, 25]),
    pH: range('pH', [7.5, 8.4], [7.0, 8.6]),
    ammonia: range('ammonia', [0, 0], [0, 0.5]),
    nitrite: range('nitrite', [0, 0], [0, 0.5]),
    nitrate: range('nitrate', [0, 20], [0, 40], COMMON_PRACTICE, { target: 10 }),
    freeAmmonia: FREE_AMMONIA_RANGE,
  },
  cadences: {
    cycling: CYCLING_CADENCE_SALT,
    established: { ammonia: 7, nitrite: 7, nitrate: 7, pH: 7, temperature: 7, salinity: 7 },
    provenance: COMMON_PRACTICE,
  },
};
