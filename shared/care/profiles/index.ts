import type { SystemType } from '../system-types';
import { BRACKISH_PROFILE } from './brackish';
import { COLDWATER_PROFILE } from './coldwater';
import { MARINE_FISH_ONLY_PROFILE } from './marine-fish-only';
import { REEF_PROFILE } from './reef';
import { SEAHORSE_DWARF_PROFILE, SEAHORSE_LARGE_PROFILE } from './seahorse';
import { TROPICAL_FRESHWATER_PROFILE } from './tropical-freshwater';
import type { CareProfile } from './types';

export type { Band, Cadence, CareProfile, ParameterRange } from './types';
export { careProfileSchema, type CareProfileInput } from './schema';
export { FREE_AMMONIA_LIMIT_MG_L, FREE_AMMONIA_RANGE } from './common';
export {
  BRACKISH_PROFILE,
  COLDWATER_PROFILE,
  MARINE_FISH_ONLY_PROFILE,
  REEF_PROFILE,
  SEAHORSE_DWARF_PROFILE,
  SEAHORSE_LARGE_PROFILE,
  TROPICAL_FRESHWATER_PROFILE,
};

export const BUILT_IN_PROFILES: readonly CareProfile[] = [
  TROPICAL_FRESHWATER_PROFILE,
  COLDWATER_PROFILE,
  BRACKISH_PROFILE,
  MARINE_FISH_ONLY_PROFILE,
  REEF_PROFILE,
  SEAHORSE_LARGE_PROFILE,
  SEAHORSE_DWARF_PROFILE,
];

const DEFAULTS: Record<SystemType, CareProfile> = {
  'tropical-freshwater': TROPICAL_FRESHWATER_PROFILE,
  coldwater: COLDWATER_PROFILE,
  brackish: BRACKISH_PROFILE,
  'marine-fish-only': MARINE_FISH_ONLY_PROFILE,
  reef: REEF_PROFILE,
  seahorse: SEAHORSE_LARGE_PROFILE,
};

export function defaultProfileFor(systemType: SystemType): CareProfile {
  return DEFAULTS[systemType];
}

export function builtInProfile(key: string): CareProfile | undefined {
  return BUILT_IN_PROFILES.find((p) => p.key === key);
}
