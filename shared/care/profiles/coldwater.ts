import { COMMON_PRACTICE } from '../provenance';
import { CYCLING_CADENCE_FRESH, ESTABLISHED_CADENCE_FRESH, FREE_AMMONIA_RANGE, range } from './common';
import type { CareProfile } from './types';

// Every band here is common practice, no source, unless its provenance says otherwise.
export const COLDWATER_PROFILE: CareProfile = {
  key: 'coldwater',
  name: 'Coldwater (unheated freshwater)',
  version: 1,
  systemTypes: ['coldwater'],
  animals: 'coldwater fish',
  ranges: {
    temperature: range('temperature', [15, 23], [10, 26]),
    pH: range('pH', [7.0, 8.0], [6.5, 8.5]),
    ammonia: range('ammonia', [0, 0], [0, 0.5]),
    nitrite: range('nitrite', [0, 0], [0, 0.25]),
    nitrate: range('nitrate', [0, 20], [0, 40], COMMON_PRACTICE, { target: 10 }),
    alkalinity: range('alkalinity', [4, 10], [2, 14]),
    freeAmmonia: FREE_AMMONIA_RANGE,
  },
  cadences: {
    cycling: CYCLING_CADENCE_FRESH,
    established: ESTABLISHED_CADENCE_FRESH,
    provenance: COMMON_PRACTICE,
  },
};
