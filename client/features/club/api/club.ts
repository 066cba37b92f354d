import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Role } from '@shared/constants/roles';
import type { CreateInviteInput } from '@shared/schemas/club.schema';
import { api } from '@client/lib/api-client';

export interface ClubMember {
  membershipId: string;
  userId: string;
  displayName: string;
  email?: string;
  role: Role;
  status: 'active' | 'suspended';
  joinedAt: string;
  mentorCapacity?: number;
  menteeCount?: number;
}
export interface PendingInvite {
  id: string;
  email: string;
  role: Role;
  state: 'pending' | 'expired' | 'accepted' | 'revoked';
  expiresAt: string;
  lastSentAt: string;
}
export interface Assignment {
  id: string;
  mentorId: string;
  menteeId: string;
  startedAt: string;
  endedAt: string | null;
}

export interface ClubView {
  id: string;
  name: string;
  slug: string;
  description: string;
  locationText: string;
  timeZone: string;
}

export const clubKeys = {
  all: (clubId: string) => ['club', clubId] as const,
  detail: (clubId: string) => [...clubKeys.all(clubId), 'detail'] as const,
  members: (clubId: string) => [...clubKeys.all(clubId), 'members'] as const,
  invites: (clubId: string) => [...clubKeys.all(clubId), 'invites'] as const,
  assignments: (clubId: string) => [...clubKeys.all(clubId), 'assignments'] as const,
};

export const clubQuery = (clubId: string) =>
  queryOptions({
    queryKey: clubKeys.detail(clubId),
    queryFn: ({ signal }) => api.get<{ club: ClubView }>(`/clubs/${clubId}`, signal).then((r) => r.club),
    enabled: Boolean(clubId),
  });
export const membersQuery = (clubId: string) =>
  queryOptions({
    queryKey: clubKeys.members(clubId),
    queryFn: ({ signal }) => api.get<{ members: ClubMember[] }>(`/clubs/${clubId}/members`, signal),
  });
export const invitesQuery = (clubId: string) =>
  queryOptions({
    queryKey: clubKeys.invites(clubId),
    queryFn: ({ signal }) => api.get<{ invites: PendingInvite[] }>(`/clubs/${clubId}/invites`, signal),
  });
export const assignmentsQuery = (clubId: string) =>
  queryOptions({
    queryKey: clubKeys.assignments(clubId),
    queryFn: ({ signal }) =>
      api.get<{ assignments: Assignment[] }>(`/clubs/${clubId}/mentor-assignments`, signal),
  });

export const useClub = (clubId: string) => useQuery(clubQuery(clubId));
export const useMembers = (clubId: string) => useQuery(membersQuery(clubId));
export const useInvites = (clubId: string, enabled: boolean) =>
  useQuery({ ...invitesQuery(clubId), enabled });
export const useAssignments = (clubId: string) => useQuery(assignmentsQuery(clubId));

/** After any change in a club its members, loads, pairings, invites and requests may all differ: refetch the club's queries. */
export function useClubMutation<I, O>(clubId: string, fn: (input: I) => Promise<O>) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: fn,
    onSuccess: () => qc.invalidateQueries({ queryKey: clubKeys.all(clubId) }),
  });
}

export const useSendInvite = (clubId: string) =>
  useClubMutation(clubId, (i: CreateInviteInput) => api.post(`/clubs/${clubId}/invites`, i));
export const useResendInvite = (clubId: string) =>
  useClubMutation(clubId, (id: string) => api.post(`/clubs/${clubId}/invites/${id}/resend`));
export const useRevokeInvite = (clubId: string) =>
  useClubMutation(clubId, (id: string) => api.delete(`/clubs/${clubId}/invites/${id}`));
export const useAssignMentor = (clubId: string) =>
  useClubMutation(clubId, (i: { mentorId: string; menteeId: string }) =>
    api.post(`/clubs/${clubId}/mentor-assignments`, i),
  );
export const useEndAssignment = (clubId: string) =>
  useClubMutation(clubId, (id: string) => api.post(`/clubs/${clubId}/mentor-assignments/${id}/end`));
