import { COMMON_PRACTICE } from '../provenance';
import { CYCLING_CADENCE_SALT, ESTABLISHED_CADENCE_SALT, FREE_AMMONIA_RANGE, range } from './common';
import type { CareProfile, ParameterRange } from './types';

// Every band here is common practice, no source. Seahorses are kept with far less nitrate than
// fish-only tanks, and nothing measurable of ammonia or nitrite.
const SHARED_SEAHORSE_RANGES: Partial<
  Record<'salinity' | 'pH' | 'ammonia' | 'nitrite' | 'nitrate', ParameterRange>
> = {
  salinity: range('salinity', [31, 35], [29, 36]),
  pH: range('pH', [8.0, 8.4], [7.8, 8.6]),
  ammonia: range('ammonia', [0, 0], [0, 0.1]),
  nitrite: range('nitrite', [0, 0], [0, 0.1]),
  nitrate: range('nitrate', [0, 10], [0, 20], COMMON_PRACTICE, { target: 5 }),
};

const SEAHORSE_READINESS = {
  food: 'Seahorses eat frozen or live foods (such as mysis or copepods), not flakes, and need feeding several times a day.',
  quarantine: 'Keep new seahorses in a separate quarantine tank before they join the display.',
  equipment: 'Gentle flow and places to hold on with their tails.',
};

/** Larger species such as Hippocampus erectus, H. reidi and H. kuda, kept cooler than most marine tanks. */
export const SEAHORSE_LARGE_PROFILE: CareProfile = {
  key: 'seahorse-large',
  name: 'Seahorses (larger species, e.g. H. erectus, H. reidi, H. kuda)',
  version: 1,
  systemTypes: ['seahorse'],
  animals: 'seahorses',
  ranges: {
    temperature: range('temperature', [22, 25], [20, 27]),
    ...SHARED_SEAHORSE_RANGES,
    alkalinity: range('alkalinity', [7, 11], [6, 12]),
    calcium: range('calcium', [350, 450], [300, 500]),
    magnesium: range('magnesium', [1200, 1400], [1100, 1500]),
    freeAmmonia: FREE_AMMONIA_RANGE,
  },
  cadences: {
    cycling: CYCLING_CADENCE_SALT,
    established: { ...ESTABLISHED_CADENCE_SALT, calcium: 30, magnesium: 30 },
    provenance: COMMON_PRACTICE,
  },
  readinessNotes: SEAHORSE_READINESS,
};

/**
 * Dwarf seahorse, H. zosterae. Kept a little warmer; keepers' figures vary (roughly 22–27 °C),
 * so the band below is common practice, no source. Small tanks change fast: test more often.
 */
export const SEAHORSE_DWARF_PROFILE: CareProfile = {
  key: 'seahorse-dwarf',
  name: 'Dwarf seahorses (H. zosterae)',
  version: 1,
  systemTypes: ['seahorse'],
  animals: 'dwarf seahorses',
  ranges: {
    temperature: range('temperature', [23, 26], [21, 28]),
    ...SHARED_SEAHORSE_RANGES,
    alkalinity: range('alkalinity', [7, 11], [6, 12]),
    freeAmmonia: FREE_AMMONIA_RANGE,
  },
  cadences: {
    cycling: CYCLING_CADENCE_SALT,
    established: {
      ...ESTABLISHED_CADENCE_SALT,
      ammonia: 3,
      nitrite: 3,
      nitrate: 3,
      temperature: 3,
      salinity: 3,
    },
    provenance: COMMON_PRACTICE,
  },
  readinessNotes: {
    ...SEAHORSE_READINESS,
    food: 'Dwarf seahorses eat live foods (such as newly hatched brine shrimp) and need feeding several times a day.',
  },
};
