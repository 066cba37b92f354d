import { queryOptions, useQuery } from '@tanstack/react-query';
import type {
  AcceptMentorRequestInput,
  CreateMentorRequestInput,
  DeclineMentorRequestInput,
} from '@shared/schemas/mentor-request.schema';
import type { MentorRequestView, MyMentorRequestView } from '@shared/schemas/notification-views';
import { api } from '@client/lib/api-client';
import { clubKeys, useClubMutation } from './club';

export const mentorRequestKeys = {
  open: (clubId: string) => [...clubKeys.all(clubId), 'mentor-requests', 'open'] as const,
  mine: (clubId: string) => [...clubKeys.all(clubId), 'mentor-requests', 'mine'] as const,
};

export const openRequestsQuery = (clubId: string) =>
  queryOptions({
    queryKey: mentorRequestKeys.open(clubId),
    queryFn: ({ signal }) =>
      api.get<{ requests: MentorRequestView[] }>(`/clubs/${clubId}/mentor-requests`, signal),
  });
export const myRequestQuery = (clubId: string) =>
  queryOptions({
    queryKey: mentorRequestKeys.mine(clubId),
    queryFn: ({ signal }) => api.get<MyMentorRequestView>(`/clubs/${clubId}/mentor-requests/mine`, signal),
  });

export const useOpenRequests = (clubId: string) => useQuery(openRequestsQuery(clubId));
export const useMyRequest = (clubId: string) => useQuery(myRequestQuery(clubId));

export const useAskForMentor = (clubId: string) =>
  useClubMutation(clubId, (input: CreateMentorRequestInput) =>
    api.post<{ request: MentorRequestView }>(`/clubs/${clubId}/mentor-requests`, input),
  );
export const useAcceptRequest = (clubId: string) =>
  useClubMutation(clubId, ({ id, ...input }: AcceptMentorRequestInput & { id: string }) =>
    api.post(`/clubs/${clubId}/mentor-requests/${id}/accept`, input),
  );
export const useDeclineRequest = (clubId: string) =>
  useClubMutation(clubId, ({ id, ...input }: DeclineMentorRequestInput & { id: string }) =>
    api.post(`/clubs/${clubId}/mentor-requests/${id}/decline`, input),
  );
export const useSetCapacity = (clubId: string) =>
  useClubMutation(clubId, ({ userId, capacity }: { userId: string; capacity: number }) =>
    api.patch(`/clubs/${clubId}/mentors/${userId}/capacity`, { capacity }),
  );
