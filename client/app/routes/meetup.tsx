import { Link, useParams } from 'react-router';
import { asSubject } from '@shared/abilities';
import { MEETUP_KIND_LABELS } from '@shared/constants/meetups';
import { Card, Notice } from '@client/components/ui/card';
import { CautionFor } from '@client/components/ui/cautions';
import { PageHeader } from '@client/components/ui/page-header';
import { Spinner } from '@client/components/ui/spinner';
import { useSession } from '@client/features/auth/components/session-provider';
import { useMeetup } from '@client/features/meetups/api/meetups';
import { CancelMeetup } from '@client/features/meetups/components/cancel-meetup';
import { ClinicBooking } from '@client/features/meetups/components/clinic-booking';
import { MeetupRouteError } from '@client/features/meetups/components/meetup-route-error';
import { RsvpPanel } from '@client/features/meetups/components/rsvp-panel';
import { useTankList } from '@client/features/tanks/api/tanks';

const linkButton = 'inline-flex min-h-touch items-center rounded-full px-4 font-bold';

export function Component() {
  const { meetupId = '' } = useParams();
  const { me, activeClub, ability } = useSession();
  const clubId = activeClub?.clubId ?? '';
  const meetup = useMeetup(clubId, meetupId);
  const isClinic = meetup.data?.kind === 'clinic';
  const tanks = useTankList(clubId, { mine: true, includeArchived: false });
  if (!activeClub) return <Notice tone="warning">You are not an active member of a club.</Notice>;
  if (meetup.isError) throw meetup.error;
  if (meetup.isPending) return <Spinner label="Loading the meetup…" />;
  const m = meetup.data;
  const subject = asSubject('Meetup', { clubId: m.clubId, hostId: m.host?.userId ?? null });
  const manages = ability.can('update', subject);
  const checksIn = ability.can('checkIn', subject);
  const myTanks = (tanks.data?.tanks ?? []).filter((t) => t.owner.id === me.user.id).map((t) => ({ id: t.id, name: t.name }));

  return (
    <>
      <PageHeader
        title={m.title}
        subtitle={`${MEETUP_KIND_LABELS[m.kind]} · ${m.when}`}
        actions={
          m.status === 'scheduled' && (manages || checksIn) ? (
            <>
              {checksIn ? <Link to={`/meetups/${m.id}/check-in`} className={`${linkButton} bg-tide-700 text-white hover:bg-tide-800`}>Check people in</Link> : null}
              {manages ? <Link to={`/meetups/${m.id}/edit`} className={`${linkButton} bg-white text-tide-800 ring-1 ring-tide-200`}>Edit</Link> : null}
            </>
          ) : undefined
        }
      />
      {m.status === 'cancelled' ? <div className="mb-4"><Notice tone="warning">Cancelled: {m.cancelReason}</Notice></div> : null}
      <div className="grid gap-4 lg:grid-cols-[minmax(0,1fr)_minmax(0,24rem)]">
        <div className="space-y-4">
          <Card>
            <dl className="grid gap-3 sm:grid-cols-[8rem_1fr]">
              <dt className="font-bold text-tide-800">When</dt>
              <dd>{m.when}<span className="block text-sm text-tide-600">Club time ({m.timeZone})</span></dd>
              <dt className="font-bold text-tide-800">{m.kind === 'online' ? 'Join' : 'Where'}</dt>
              <dd>
                {m.kind === 'online' && m.onlineUrl ? <a href={m.onlineUrl} rel="noopener noreferrer nofollow" target="_blank" className="font-bold text-tide-700 underline">{m.onlineUrl}</a> : m.placeText}
                {m.mapUrl ? <a href={m.mapUrl} rel="noopener noreferrer nofollow" target="_blank" className="ml-2 font-bold text-tide-700 underline">Map</a> : null}
              </dd>
              {m.host ? (<><dt className="font-bold text-tide-800">Run by</dt><dd>{m.host.displayName}</dd></>) : null}
            </dl>
            {m.description ? <p className="mt-4 whitespace-pre-line text-tide-900">{m.description}</p> : null}
            <a href={`/api/clubs/${m.clubId}/meetups/${m.id}/calendar.ics`} className="mt-4 inline-flex min-h-touch items-center font-bold text-tide-700 underline">Add to my calendar (.ics)</a>
          </Card>
          {m.kind === 'swap' ? <CautionFor kind="buyingAnimals" title="Swapping and buying animals" /> : null}
          {m.kind === 'tour' ? <CautionFor kind="electricity" title="Around other people’s tanks" /> : null}
        </div>
        <div className="space-y-4">
          <RsvpPanel clubId={clubId} meetup={m} />
          {isClinic ? <ClinicBooking key={`${m.mine?.status}-${m.mine?.slotStartsAt}`} clubId={clubId} meetup={m} tanks={myTanks} /> : null}
          {manages && m.status === 'scheduled' ? <CancelMeetup clubId={clubId} meetup={m} /> : null}
        </div>
      </div>
    </>
  );
}

export const ErrorBoundary = MeetupRouteError;
