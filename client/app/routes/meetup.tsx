import { useParams } from 'react-router';
import { asSubject } from '@shared/abilities';
import { MEETUP_KIND_LABELS } from '@shared/constants/meetups';
import { ButtonLink } from '@client/components/ui/button';
import { Card, Notice } from '@client/components/ui/card';
import { CautionFor } from '@client/components/ui/cautions';
import { PageHeader } from '@client/components/ui/page-header';
import { PageSkeleton } from '@client/components/ui/skeleton';
import { useSession } from '@client/features/auth/components/session-provider';
import { useMeetup } from '@client/features/meetups/api/meetups';
import { CancelMeetup } from '@client/features/meetups/components/cancel-meetup';
import { ClinicBooking } from '@client/features/meetups/components/clinic-booking';
import { MeetupRouteError } from '@client/features/meetups/components/meetup-route-error';
import { RsvpPanel } from '@client/features/meetups/components/rsvp-panel';
import { useTankList } from '@client/features/tanks/api/tanks';

export function Component() {
  const { meetupId = '' } = useParams();
  const { me, activeClub, ability } = useSession();
  const clubId = activeClub?.clubId ?? '';
  const meetup = useMeetup(clubId, meetupId);
  const isClinic = meetup.data?.kind === 'clinic';
  const tanks = useTankList(clubId, { mine: true, includeArchived: false });
  if (!activeClub) return <Notice tone="warning">You are not an active member of a club.</Notice>;
  if (meetup.isError) throw meetup.error;
  if (meetup.isPending) return <PageSkeleton label="Loading the meetup…" />;
  const m = meetup.data;
  const subject = asSubject('Meetup', { clubId: m.clubId, hostId: m.host?.userId ?? null });
  const manages = ability.can('update', subject);
  const checksIn = ability.can('checkIn', subject);
  const myTanks = (tanks.data?.tanks ?? [])
    .filter((t) => t.owner.id === me.user.id)
    .map((t) => ({ id: t.id, name: t.name }));

  return (
    <>
      <PageHeader
        title={m.title}
        subtitle={`${MEETUP_KIND_LABELS[m.kind]} · ${m.when}`}
        actions={
          m.status === 'scheduled' && (manages || checksIn) ? (
            <>
              {checksIn ? <ButtonLink to={`/meetups/${m.id}/check-in`}>Check people in</ButtonLink> : null}
              {manages ? (
                <ButtonLink variant="secondary" to={`/meetups/${m.id}/edit`}>
                  Edit
                </ButtonLink>
              ) : null}
            </>
          ) : undefined
        }
      />
      {m.status === 'cancelled' ? (
        <div className="mb-4">
          <Notice tone="warning">Cancelled: {m.cancelReason}</Notice>
        </div>
      ) : null}
      <div className="grid gap-4 lg:grid-cols-[minmax(0,1fr)_minmax(0,24rem)]">
        <div className="space-y-4">
          <Card>
            <dl className="grid gap-3 sm:grid-cols-[8rem_1fr]">
              <dt className="font-bold text-ink-soft">When</dt>
              <dd>
                {m.when}
                <span className="block text-sm text-ink-muted">Club time ({m.timeZone})</span>
              </dd>
              <dt className="font-bold text-ink-soft">{m.kind === 'online' ? 'Join' : 'Where'}</dt>
              <dd>
                {m.kind === 'online' && m.onlineUrl ? (
                  <a
                    href={m.onlineUrl}
                    rel="noopener noreferrer nofollow"
                    target="_blank"
                    className="font-bold text-link underline"
                  >
                    {m.onlineUrl}
                  </a>
                ) : (
                  m.placeText
                )}
                {m.mapUrl ? (
                  <a
                    href={m.mapUrl}
                    rel="noopener noreferrer nofollow"
                    target="_blank"
                    className="ml-2 font-bold text-link underline"
                  >
                    Map
                  </a>
                ) : null}
              </dd>
              {m.host ? (
                <>
                  <dt className="font-bold text-ink-soft">Run by</dt>
                  <dd>{m.host.displayName}</dd>
                </>
              ) : null}
            </dl>
            {m.description ? <p className="mt-4 whitespace-pre-line text-ink">{m.description}</p> : null}
            <a
              href={`/api/clubs/${m.clubId}/meetups/${m.id}/calendar.ics`}
              className="mt-4 inline-flex min-h-touch items-center font-bold text-link underline"
            >
              Add to my calendar (.ics)
            </a>
          </Card>
          {m.kind === 'swap' ? <CautionFor kind="buyingAnimals" title="Swapping and buying animals" /> : null}
          {m.kind === 'tour' ? <CautionFor kind="electricity" title="Around other people’s tanks" /> : null}
        </div>
        <div className="space-y-4">
          <RsvpPanel clubId={clubId} meetup={m} />
          {isClinic ? (
            <ClinicBooking
              key={`${m.mine?.status}-${m.mine?.slotStartsAt}`}
              clubId={clubId}
              meetup={m}
              tanks={myTanks}
            />
          ) : null}
          {manages && m.status === 'scheduled' ? <CancelMeetup clubId={clubId} meetup={m} /> : null}
        </div>
      </div>
    </>
  );
}

export const ErrorBoundary = MeetupRouteError;
