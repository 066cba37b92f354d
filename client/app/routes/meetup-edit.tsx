import { useMemo } from 'react';
import { useNavigate, useParams } from 'react-router';
import { Card, Notice } from '@client/components/ui/card';
import { PageHeader } from '@client/components/ui/page-header';
import { PageSkeleton } from '@client/components/ui/skeleton';
import { useSession } from '@client/features/auth/components/session-provider';
import { useMembers } from '@client/features/club/api/club';
import { useMeetup, useUpdateMeetup } from '@client/features/meetups/api/meetups';
import { MeetupForm } from '@client/features/meetups/components/meetup-form';
import { MeetupRouteError } from '@client/features/meetups/components/meetup-route-error';
import { hostsAmong, valuesOf } from '@client/features/meetups/lib/meetup-form-values';

export function Component() {
  const { meetupId = '' } = useParams();
  const { activeClub } = useSession();
  const clubId = activeClub?.clubId ?? '';
  const meetup = useMeetup(clubId, meetupId);
  const members = useMembers(clubId);
  const update = useUpdateMeetup(clubId, meetupId);
  const navigate = useNavigate();
  const initial = useMemo(() => (meetup.data ? valuesOf(meetup.data) : null), [meetup.data]);
  if (!activeClub) return <Notice tone="warning">You are not an active member of a club.</Notice>;
  if (meetup.isError) throw meetup.error;
  if (!initial || !meetup.data || members.isPending) return <PageSkeleton label="Loading the meetup…" />;
  const m = meetup.data;
  if (m.status === 'cancelled')
    return <Notice tone="warning">This meetup was cancelled; it can no longer be changed.</Notice>;
  return (
    <>
      <PageHeader title="Change the meetup" subtitle={m.title} />
      <Card>
        <MeetupForm
          key={m.id}
          initial={initial}
          timeZone={m.timeZone}
          hosts={hostsAmong(members.data?.members ?? [])}
          expected={m.goingCount + m.waitlistCount}
          submitLabel="Save changes"
          onUpdate={async (patch) => {
            await update.mutateAsync(patch);
            navigate(`/meetups/${m.id}`);
          }}
        />
      </Card>
    </>
  );
}

export const ErrorBoundary = MeetupRouteError;
