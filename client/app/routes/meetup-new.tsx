import { useMemo, useState } from 'react';
import { useNavigate } from 'react-router';
import { asSubject } from '@shared/abilities';
import { utcToClubTime } from '@shared/meetups/club-time';
import { Card, Notice } from '@client/components/ui/card';
import { PageHeader } from '@client/components/ui/page-header';
import { PageSkeleton } from '@client/components/ui/skeleton';
import { useSession } from '@client/features/auth/components/session-provider';
import { useClub, useMembers } from '@client/features/club/api/club';
import { useCreateMeetup } from '@client/features/meetups/api/meetups';
import { MeetupForm } from '@client/features/meetups/components/meetup-form';
import { MeetupRouteError } from '@client/features/meetups/components/meetup-route-error';
import { blankMeetup, hostsAmong } from '@client/features/meetups/lib/meetup-form-values';

const WEEK = 7 * 86_400_000;

export function Component() {
  const { activeClub, ability } = useSession();
  const clubId = activeClub?.clubId ?? '';
  const club = useClub(clubId);
  const members = useMembers(clubId);
  const create = useCreateMeetup(clubId);
  const navigate = useNavigate();
  const timeZone = club.data?.timeZone ?? 'UTC';
  const [openedAt] = useState(() => Date.now());
  const initial = useMemo(
    () => blankMeetup(utcToClubTime(new Date(openedAt + WEEK), timeZone)),
    [openedAt, timeZone],
  );
  if (!activeClub) return <Notice tone="warning">You are not an active member of a club.</Notice>;
  if (!ability.can('create', asSubject('Meetup', { clubId })))
    return <Notice tone="warning">Club admins plan meetups.</Notice>;
  if (club.isPending || members.isPending) return <PageSkeleton label="Loading…" />;
  return (
    <>
      <PageHeader title="Plan a meetup" subtitle={activeClub.clubName} />
      <Card>
        <MeetupForm
          initial={initial}
          timeZone={timeZone}
          hosts={hostsAmong(members.data?.members ?? [])}
          submitLabel="Plan the meetup"
          onCreate={async (input) => navigate(`/meetups/${(await create.mutateAsync(input)).meetup.id}`)}
        />
      </Card>
    </>
  );
}

export const ErrorBoundary = MeetupRouteError;
