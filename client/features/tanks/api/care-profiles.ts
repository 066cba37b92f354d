import { queryOptions, useQuery } from '@tanstack/react-query';
import { builtInProfile, defaultProfileFor, type CareProfile } from '../../../../shared/care/profiles';
import type { SystemType } from '../../../../shared/care/system-types';
import { api } from '../../../lib/api-client';
import { tankKeys } from './keys';

/** One line of the club's profile list (built-in profiles and the club's own copies). */
export interface CareProfileSummary {
  key: string;
  name: string;
  version: number;
  systemTypes: SystemType[];
  animals: string;
  source: 'built-in' | 'club';
}

export const careProfilesQuery = (clubId: string) =>
  queryOptions({
    queryKey: tankKeys.profiles(clubId),
    queryFn: ({ signal }) => api.get<{ profiles: CareProfileSummary[] }>(`/clubs/${clubId}/care-profiles`, signal).then((r) => r.profiles),
    staleTime: 5 * 60_000,
  });

export const careProfileQuery = (clubId: string, key: string) =>
  queryOptions({
    queryKey: tankKeys.profile(clubId, key),
    queryFn: ({ signal }) => api.get<{ profile: CareProfile }>(`/clubs/${clubId}/care-profiles/${encodeURIComponent(key)}`, signal).then((r) => r.profile),
    staleTime: 5 * 60_000,
  });

export const useCareProfiles = (clubId: string) => useQuery(careProfilesQuery(clubId));
export const useCareProfile = (clubId: string, key: string | undefined) => useQuery({ ...careProfileQuery(clubId, key ?? ''), enabled: Boolean(key) });

/**
 * The profile a tank follows: the club's answer once loaded, the built-in of that key (or the kind's default)
 * meanwhile, so forms and charts never wait on it.
 */
export function useTankProfile(clubId: string, tank: { careProfileKey: string; systemType: SystemType } | undefined): CareProfile | undefined {
  const fetched = useCareProfile(clubId, tank?.careProfileKey);
  if (!tank) return undefined;
  return fetched.data ?? builtInProfile(tank.careProfileKey) ?? defaultProfileFor(tank.systemType);
}
