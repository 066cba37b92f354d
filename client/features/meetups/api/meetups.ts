import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  BookingInput,
  CreateMeetupInput,
  MeetupListWhen,
  RsvpInput,
  UpdateMeetupInput,
} from '@shared/schemas/meetup.schema';
import type {
  AttendanceHistoryView,
  AttendanceListView,
  AttendanceRowView,
  CalendarFeedView,
  MeetupDetailView,
  MeetupSummaryView,
} from '@shared/schemas/meetup-views';
import type { CreateWaterTestInput } from '@shared/schemas/water-test.schema';
import type { WaterTestSaved } from '@shared/schemas/tank-views';
import { api, ApiError } from '@client/lib/api-client';
import { useTankRecordsChanged } from '@client/lib/tank-keys';

export const meetupKeys = {
  all: (clubId: string) => ['meetups', clubId] as const,
  lists: (clubId: string) => [...meetupKeys.all(clubId), 'list'] as const,
  list: (clubId: string, when: MeetupListWhen) => [...meetupKeys.lists(clubId), when] as const,
  detail: (clubId: string, meetupId: string) => [...meetupKeys.all(clubId), 'one', meetupId] as const,
  attendance: (clubId: string, meetupId: string) =>
    [...meetupKeys.all(clubId), 'attendance', meetupId] as const,
  history: (clubId: string, userId: string) => [...meetupKeys.all(clubId), 'history', userId] as const,
  feed: () => ['calendar-feed'] as const,
};

const base = (clubId: string) => `/clubs/${clubId}/meetups`;

export const meetupListQuery = (clubId: string, when: MeetupListWhen) =>
  queryOptions({
    queryKey: meetupKeys.list(clubId, when),
    queryFn: ({ signal }) =>
      api
        .get<{ meetups: MeetupSummaryView[] }>(`${base(clubId)}?when=${when}`, signal)
        .then((r) => r.meetups),
    enabled: Boolean(clubId),
  });

export const meetupQuery = (clubId: string, meetupId: string) =>
  queryOptions({
    queryKey: meetupKeys.detail(clubId, meetupId),
    queryFn: ({ signal }) =>
      api.get<{ meetup: MeetupDetailView }>(`${base(clubId)}/${meetupId}`, signal).then((r) => r.meetup),
    enabled: Boolean(clubId && meetupId),
  });

export const attendanceQuery = (clubId: string, meetupId: string) =>
  queryOptions({
    queryKey: meetupKeys.attendance(clubId, meetupId),
    queryFn: ({ signal }) => api.get<AttendanceListView>(`${base(clubId)}/${meetupId}/attendance`, signal),
    enabled: Boolean(clubId && meetupId),
  });

export const useMeetups = (clubId: string, when: MeetupListWhen) => useQuery(meetupListQuery(clubId, when));
export const useMeetup = (clubId: string, meetupId: string) => useQuery(meetupQuery(clubId, meetupId));
export const useAttendance = (clubId: string, meetupId: string) =>
  useQuery(attendanceQuery(clubId, meetupId));
export const useAttendanceHistory = (clubId: string, userId: string) =>
  useQuery({
    queryKey: meetupKeys.history(clubId, userId),
    queryFn: ({ signal }) =>
      api.get<AttendanceHistoryView>(`/clubs/${clubId}/members/${userId}/attendance`, signal),
    enabled: Boolean(clubId && userId),
  });
export const useCalendarFeed = () =>
  useQuery({
    queryKey: meetupKeys.feed(),
    queryFn: ({ signal }) => api.get<CalendarFeedView>('/me/calendar-feed', signal),
  });

/** A changed meetup: store the server's copy and refetch the lists and check-in list around it. */
function useMeetupSaved(clubId: string) {
  const qc = useQueryClient();
  return (meetup: MeetupDetailView) => {
    qc.setQueryData(meetupKeys.detail(clubId, meetup.id), meetup);
    void qc.invalidateQueries({ queryKey: meetupKeys.lists(clubId) });
    void qc.invalidateQueries({ queryKey: meetupKeys.attendance(clubId, meetup.id) });
    return meetup;
  };
}

function useMeetupMutation<I>(clubId: string, send: (input: I) => Promise<{ meetup: MeetupDetailView }>) {
  const saved = useMeetupSaved(clubId);
  return useMutation({ mutationFn: send, onSuccess: ({ meetup }) => saved(meetup) });
}

export const useCreateMeetup = (clubId: string) =>
  useMeetupMutation(clubId, (input: CreateMeetupInput) =>
    api.post<{ meetup: MeetupDetailView }>(base(clubId), input),
  );
export const useUpdateMeetup = (clubId: string, meetupId: string) =>
  useMeetupMutation(clubId, (input: UpdateMeetupInput) =>
    api.patch<{ meetup: MeetupDetailView }>(`${base(clubId)}/${meetupId}`, input),
  );
export const useCancelMeetup = (clubId: string, meetupId: string) =>
  useMeetupMutation(clubId, (reason: string) =>
    api.post<{ meetup: MeetupDetailView }>(`${base(clubId)}/${meetupId}/cancel`, { reason }),
  );
export const useRsvp = (clubId: string, meetupId: string) =>
  useMeetupMutation(clubId, (input: RsvpInput) =>
    api.put<{ meetup: MeetupDetailView }>(`${base(clubId)}/${meetupId}/rsvp`, input),
  );
export const useBookSlot = (clubId: string, meetupId: string) =>
  useMeetupMutation(clubId, (input: BookingInput) =>
    api.put<{ meetup: MeetupDetailView }>(`${base(clubId)}/${meetupId}/booking`, input),
  );

export function useClearSlot(clubId: string, meetupId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api.delete(`${base(clubId)}/${meetupId}/booking`),
    onSuccess: () => qc.invalidateQueries({ queryKey: meetupKeys.detail(clubId, meetupId) }),
  });
}

type Tick = { userId: string; present: boolean };

/**
 * Ticking someone in at the door, on a phone that may be on a poor connection: the list changes at once, the
 * request is retried (the PUT sets a state, so sending it twice is harmless) and paused while offline; a tick that
 * finally fails puts that one row back as it was. After the last pending tick the list is fetched again, so it
 * matches the server, other people's ticks included.
 */
export function useCheckIn(clubId: string, meetupId: string) {
  const qc = useQueryClient();
  const key = meetupKeys.attendance(clubId, meetupId);
  const mutationKey = [...key, 'tick'];
  const setRow = (userId: string, change: (row: AttendanceRowView) => AttendanceRowView) =>
    qc.setQueryData<AttendanceListView>(
      key,
      (d) => d && { ...d, rows: d.rows.map((r) => (r.userId === userId ? change(r) : r)) },
    );
  return useMutation({
    mutationKey,
    mutationFn: ({ userId, present }: Tick) =>
      api.put<{ row: AttendanceRowView }>(`${base(clubId)}/${meetupId}/attendance/${userId}`, { present }),
    // A lost connection or a hiccup on the server is worth another try; a refusal (4xx) will not change.
    retry: (failures, error) => failures < 3 && !(error instanceof ApiError && error.status < 500),
    retryDelay: (attempt) => Math.min(1_000 * 2 ** attempt, 8_000),
    onMutate: async ({ userId, present }: Tick) => {
      await qc.cancelQueries({ queryKey: key });
      const before = qc.getQueryData<AttendanceListView>(key)?.rows.find((r) => r.userId === userId);
      setRow(userId, (r) => ({ ...r, checkedIn: present }));
      return { before };
    },
    onError: (_error, { userId }, context) => {
      if (context?.before) setRow(userId, () => context.before!);
    },
    onSuccess: ({ row }) => setRow(row.userId, () => row),
    onSettled: () => {
      if (qc.isMutating({ mutationKey }) <= 1) void qc.invalidateQueries({ queryKey: key });
    },
  });
}

/** The clinic's mentor saves a sample's results onto the member's tank. */
export function useRecordClinicResult(clubId: string, meetupId: string) {
  const qc = useQueryClient();
  const changed = useTankRecordsChanged(clubId);
  return useMutation({
    mutationFn: ({ userId, input }: { userId: string; tankId: string; input: CreateWaterTestInput }) =>
      api.post<WaterTestSaved>(`${base(clubId)}/${meetupId}/bookings/${userId}/water-tests`, input),
    onSuccess: (_saved, { tankId }) => {
      changed(tankId);
      void qc.invalidateQueries({ queryKey: meetupKeys.attendance(clubId, meetupId) });
    },
  });
}

export function useResetCalendarFeed() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<CalendarFeedView>('/me/calendar-feed/reset'),
    onSuccess: (feed) => qc.setQueryData(meetupKeys.feed(), feed),
  });
}
