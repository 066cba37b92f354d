import { useState } from 'react';
import { asSubject } from '@shared/abilities';
import type { MeetupListWhen } from '@shared/schemas/meetup.schema';
import { ButtonLink } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/card';
import { PageHeader } from '@client/components/ui/page-header';
import { Segmented } from '@client/components/ui/segmented';
import { useSession } from '@client/features/auth/components/session-provider';
import { CalendarFeedCard } from '@client/features/meetups/components/calendar-feed-card';
import { MeetupList } from '@client/features/meetups/components/meetup-list';
import { MeetupRouteError } from '@client/features/meetups/components/meetup-route-error';

const TABS: { value: MeetupListWhen; label: string }[] = [
  { value: 'upcoming', label: 'Coming up' },
  { value: 'past', label: 'Past' },
];

export function Component() {
  const { me, activeClub, ability } = useSession();
  const [when, setWhen] = useState<MeetupListWhen>('upcoming');
  if (!activeClub) return <Notice tone="warning">You are not an active member of a club.</Notice>;
  const clubId = activeClub.clubId;
  const plans = ability.can('create', asSubject('Meetup', { clubId }));
  return (
    <>
      <PageHeader
        title="Meetups"
        subtitle={`What ${activeClub.clubName} has planned. Times are the club’s local time.`}
        actions={plans ? <ButtonLink to="/meetups/new">Plan a meetup</ButtonLink> : undefined}
      />
      <div className="mb-4 flex flex-wrap items-center justify-between gap-3">
        <Segmented label="Which meetups" options={TABS} value={when} onChange={setWhen} inline />
        <ButtonLink variant="ghost" to={`/meetups/attendance/${me.user.id}`}>
          My attendance
        </ButtonLink>
      </div>
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_minmax(0,22rem)]">
        <MeetupList clubId={clubId} when={when} />
        <CalendarFeedCard />
      </div>
    </>
  );
}

export const ErrorBoundary = MeetupRouteError;
