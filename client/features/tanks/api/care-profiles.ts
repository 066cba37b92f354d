import { useQuery } from '@tanstack/react-query';
import { builtInProfile, defaultProfileFor, type CareProfile } from '../../../../shared/care/profiles';
import type { SystemType } from '../../../../shared/care/system-types';
import { profileQuery, profilesQuery } from '../../../lib/care-profiles';

export const useCareProfiles = (clubId: string) => useQuery({ ...profilesQuery(clubId), select: (r) => r.profiles });
export const useCareProfile = (clubId: string, key: string | undefined) =>
  useQuery({ ...profileQuery(clubId, key ?? ''), enabled: Boolean(key), select: (r) => r.profile });

/**
 * The profile a tank follows: the club's answer once loaded, the built-in of that key (or the kind's default)
 * meanwhile, so forms and charts never wait on it.
 */
export function useTankProfile(clubId: string, tank: { careProfileKey: string; systemType: SystemType } | undefined): CareProfile | undefined {
  const fetched = useCareProfile(clubId, tank?.careProfileKey);
  if (!tank) return undefined;
  return fetched.data ?? builtInProfile(tank.careProfileKey) ?? defaultProfileFor(tank.systemType);
}
