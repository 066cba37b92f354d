import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Role } from '@shared/constants/roles';
import { api } from '@client/lib/api-client';

export interface InvitePreview {
  clubName: string;
  email: string;
  role: Role;
  accountExists: boolean;
  expiresAt: string;
}

export const invitePreviewQuery = (token: string) =>
  queryOptions({
    queryKey: ['auth', 'invite', token] as const,
    queryFn: ({ signal }) => api.get<InvitePreview>(`/invites/${encodeURIComponent(token)}`, signal),
    retry: false,
    staleTime: Infinity,
  });

export const useInvitePreview = (token: string) =>
  useQuery({ ...invitePreviewQuery(token), enabled: token.length > 0 });
