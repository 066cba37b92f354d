import { COMMON_PRACTICE } from '../provenance';
import { CYCLING_CADENCE_FRESH, ESTABLISHED_CADENCE_FRESH, FREE_AMMONIA_RANGE, range } from './common';
import type { CareProfile } from './types';

// Every band here is common practice, no source, unless its provenance says otherwise.
export const TROPICAL_FRESHWATER_PROFILE: CareProfile = {
  key: 'tropical-freshwater-community',
  name: 'Tropical freshwater community',
  version: 1,
  systemTypes: ['tropical-freshwater'],
  animals: 'tropical fish',
  ranges: {
    temperature: range('temperature', [24, 27], [22, 29]),
    pH: range('pH', [6.5, 7.8], [6.0, 8.2]),
    // An established tank reads zero: any measurable ammonia or nitrite is at least caution.
    ammonia: range('ammonia', [0, 0], [0, 0.5]),
    // Fresh water lacks the chloride that blunts nitrite in sea water, so the caution band is narrow.
    nitrite: range('nitrite', [0, 0], [0, 0.25]),
    nitrate: range('nitrate', [0, 20], [0, 40], COMMON_PRACTICE, { target: 10 }),
    alkalinity: range('alkalinity', [3, 8], [2, 12]),
    freeAmmonia: FREE_AMMONIA_RANGE,
  },
  cadences: {
    cycling: CYCLING_CADENCE_FRESH,
    established: ESTABLISHED_CADENCE_FRESH,
    provenance: COMMON_PRACTICE,
  },
};
