/** Care profiles as the club sees them: one cache for every screen that reads or edits them. */
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { CareProfile, SystemType } from '@shared/care';
import { builtInProfile, defaultProfileFor } from '@shared/care/profiles';
import type { CopyCareProfileInput } from '@shared/schemas/care-profile.schema';
import { api } from './api-client';

export interface ProfileSummary {
  key: string;
  name: string;
  version: number;
  systemTypes: SystemType[];
  animals: string;
  source: 'built-in' | 'club';
  id?: string;
  basedOnKey?: string;
}
export interface ProfileDetail {
  profile: CareProfile;
  source: 'built-in' | 'club';
  id?: string;
  basedOnKey?: string;
  history: {
    version: number;
    note: string;
    changes: string[];
    changedById: string | null;
    changedAt: string;
  }[];
}

export const profileKeys = {
  all: (clubId: string) => ['care-profiles', clubId] as const,
  detail: (clubId: string, key: string) => [...profileKeys.all(clubId), key] as const,
};

export const profilesQuery = (clubId: string) =>
  queryOptions({
    queryKey: profileKeys.all(clubId),
    queryFn: ({ signal }) =>
      api.get<{ profiles: ProfileSummary[] }>(`/clubs/${clubId}/care-profiles`, signal),
    staleTime: 60_000,
  });
export const profileQuery = (clubId: string, key: string) =>
  queryOptions({
    queryKey: profileKeys.detail(clubId, key),
    queryFn: ({ signal }) =>
      api.get<ProfileDetail>(`/clubs/${clubId}/care-profiles/${encodeURIComponent(key)}`, signal),
    staleTime: 60_000,
  });

export const useProfiles = (clubId: string) => useQuery(profilesQuery(clubId));
/** One profile with its history; waits while `key` is not known yet. */
export const useProfile = (clubId: string, key: string | undefined) =>
  useQuery({ ...profileQuery(clubId, key ?? ''), enabled: Boolean(key) });

/**
 * The profile a tank follows: the club's answer once loaded, the built-in of that key (or the kind's default)
 * meanwhile, so forms, cards and charts never wait on it.
 */
type ProfiledTank = { careProfileKey: string; systemType: SystemType };
export function useTankProfile(clubId: string, tank: ProfiledTank): CareProfile;
export function useTankProfile(clubId: string, tank: ProfiledTank | undefined): CareProfile | undefined;
export function useTankProfile(clubId: string, tank: ProfiledTank | undefined): CareProfile | undefined {
  const fetched = useProfile(clubId, tank?.careProfileKey);
  if (!tank) return undefined;
  return fetched.data?.profile ?? builtInProfile(tank.careProfileKey) ?? defaultProfileFor(tank.systemType);
}

export function useCopyProfile(clubId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (i: CopyCareProfileInput) =>
      api.post<{ id: string; key: string; version: number }>(`/clubs/${clubId}/care-profiles`, i),
    onSuccess: () => qc.invalidateQueries({ queryKey: profileKeys.all(clubId) }),
  });
}

export function useSaveProfile(clubId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (i: { id: string; definition: CareProfile; baseVersion: number; note: string }) =>
      api.put<{ profile: CareProfile; changes: string[] }>(`/clubs/${clubId}/care-profiles/${i.id}`, {
        definition: i.definition,
        baseVersion: i.baseVersion,
        note: i.note,
      }),
    onSuccess: () => qc.invalidateQueries({ queryKey: profileKeys.all(clubId) }),
  });
}
