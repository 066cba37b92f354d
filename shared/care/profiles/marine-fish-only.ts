import { COMMON_PRACTICE } from '../provenance';
import { CYCLING_CADENCE_SALT, ESTABLISHED_CADENCE_SALT, FREE_AMMONIA_RANGE, range } from './common';
import type { CareProfile } from './types';

// Every band here is common practice, no source, unless its provenance says otherwise.
export const MARINE_FISH_ONLY_PROFILE: CareProfile = {
  key: 'marine-fish-only',
  name: 'Marine fish-only',
  version: 1,
  systemTypes: ['marine-fish-only'],
  animals: 'marine fish',
  ranges: {
    temperature: range('temperature', [24, 27], [22, 29]),
    // Fish-only tanks are often kept a little below natural sea water (~35).
    salinity: range('salinity', [31, 35], [28, 37]),
    pH: range('pH', [7.9, 8.4], [7.7, 8.6]),
    ammonia: range('ammonia', [0, 0], [0, 0.25]),
    nitrite: range('nitrite', [0, 0], [0, 0.5]),
    nitrate: range('nitrate', [0, 40], [0, 80], COMMON_PRACTICE, { target: 20 }),
    alkalinity: range('alkalinity', [7, 11], [6, 13]),
    freeAmmonia: FREE_AMMONIA_RANGE,
  },
  cadences: {
    cycling: CYCLING_CADENCE_SALT,
    established: ESTABLISHED_CADENCE_SALT,
    provenance: COMMON_PRACTICE,
  },
};
