import { useParams } from 'react-router';
import { asSubject } from '@shared/abilities';
import { ButtonLink } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/card';
import { PageHeader } from '@client/components/ui/page-header';
import { PageSkeleton } from '@client/components/ui/skeleton';
import { useSession } from '@client/features/auth/components/session-provider';
import { useMeetup } from '@client/features/meetups/api/meetups';
import { AttendanceList } from '@client/features/meetups/components/attendance-list';
import { ClinicResultForm } from '@client/features/meetups/components/clinic-result-form';
import { MeetupRouteError } from '@client/features/meetups/components/meetup-route-error';

export function Component() {
  const { meetupId = '' } = useParams();
  const { activeClub, ability } = useSession();
  const clubId = activeClub?.clubId ?? '';
  const meetup = useMeetup(clubId, meetupId);
  if (!activeClub) return <Notice tone="warning">You are not an active member of a club.</Notice>;
  if (meetup.isError) throw meetup.error;
  if (meetup.isPending) return <PageSkeleton label="Loading the meetup…" />;
  const m = meetup.data;
  const subject = asSubject('Meetup', { clubId: m.clubId, hostId: m.host?.userId ?? null });
  if (!ability.can('checkIn', subject))
    return <Notice tone="warning">Club admins and whoever runs the meetup tick people in.</Notice>;
  const records = m.kind === 'clinic' && ability.can('recordResults', subject);
  return (
    <>
      <PageHeader
        title="Check-in"
        subtitle={`${m.title} · ${m.when}`}
        actions={
          <ButtonLink variant="ghost" to={`/meetups/${m.id}`}>
            ← Back to the meetup
          </ButtonLink>
        }
      />
      <AttendanceList
        clubId={clubId}
        meetupId={m.id}
        renderExtra={
          records ? (row) => <ClinicResultForm clubId={clubId} meetupId={m.id} row={row} /> : undefined
        }
      />
    </>
  );
}

export const ErrorBoundary = MeetupRouteError;
