import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PackedRules } from '@shared/abilities';
import type { Role } from '@shared/constants/roles';
import type { SalinityDisplay, TemperatureUnit, VolumeUnit } from '@shared/constants/units';
import { api, ApiError } from '@client/lib/api-client';

export interface MeUser {
  id: string;
  email: string;
  displayName: string;
  experienceLevel: 'beginner' | 'some-experience' | 'experienced';
  temperatureUnit: TemperatureUnit;
  volumeUnit: VolumeUnit;
  salinityDisplay: SalinityDisplay;
  timeZone: string;
}
export interface MeMembership {
  clubId: string;
  clubName: string;
  clubSlug: string;
  role: Role;
  status: 'active' | 'suspended';
}
export interface Me {
  user: MeUser;
  memberships: MeMembership[];
  rules: PackedRules;
}

export const authKeys = {
  me: ['auth', 'me'] as const,
};

/** The signed-in person, or null when signed out (a 401 is an answer here, not an error). */
export const meQuery = () =>
  queryOptions({
    queryKey: authKeys.me,
    queryFn: async ({ signal }) => {
      try {
        return await api.get<Me>('/me', signal);
      } catch (e) {
        if (e instanceof ApiError && e.isUnauthenticated) return null;
        throw e;
      }
    },
    staleTime: 60_000,
  });

export const useMe = () => useQuery(meQuery());
