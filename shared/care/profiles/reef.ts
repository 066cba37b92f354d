import { COMMON_PRACTICE, commonPractice } from '../provenance';
import { CYCLING_CADENCE_SALT, ESTABLISHED_CADENCE_SALT, FREE_AMMONIA_RANGE, range } from './common';
import type { CareProfile } from './types';

// Bands are common practice, no source. The calcium and magnesium bands are set around natural sea
// water (about 412 mg/kg Ca and 1284 mg/kg Mg at salinity 35; Millero et al. 2008, figures from memory).
export const REEF_PROFILE: CareProfile = {
  key: 'reef',
  name: 'Reef (corals and fish)',
  version: 1,
  systemTypes: ['reef'],
  animals: 'corals and fish',
  ranges: {
    temperature: range('temperature', [24, 27], [23, 28.5]),
    salinity: range('salinity', [34, 36], [32, 37]),
    pH: range('pH', [7.9, 8.4], [7.7, 8.6]),
    ammonia: range('ammonia', [0, 0], [0, 0.1]),
    nitrite: range('nitrite', [0, 0], [0, 0.2]),
    nitrate: range('nitrate', [0, 10], [0, 25], COMMON_PRACTICE, { target: 5 }),
    alkalinity: range('alkalinity', [7, 11], [6, 12]),
    calcium: range(
      'calcium',
      [380, 450],
      [350, 500],
      commonPractice('Set around natural sea water, ~412 mg/kg.'),
    ),
    magnesium: range(
      'magnesium',
      [1250, 1400],
      [1150, 1500],
      commonPractice('Set around natural sea water, ~1284 mg/kg.'),
    ),
    phosphate: range('phosphate', [0, 0.1], [0, 0.25]),
    freeAmmonia: FREE_AMMONIA_RANGE,
  },
  cadences: {
    cycling: CYCLING_CADENCE_SALT,
    established: { ...ESTABLISHED_CADENCE_SALT, calcium: 30, magnesium: 30, phosphate: 14 },
    provenance: COMMON_PRACTICE,
  },
};
