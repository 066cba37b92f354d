import { useState } from 'react';
import type { MeetupDetailView } from '@shared/schemas/meetup-views';
import { Button } from '@client/components/ui/button';
import { Card, Notice } from '@client/components/ui/card';
import { useRsvp } from '../api/meetups';
import { MyAnswer, Places } from './meetup-badges';

/** Going or not going; when the places are gone, "going" joins the waitlist and says where in line you are. */
export function RsvpPanel({ clubId, meetup }: { clubId: string; meetup: MeetupDetailView }) {
  const rsvp = useRsvp(clubId, meetup.id);
  const status = meetup.mine?.status;
  const [openedAt] = useState(() => Date.now());
  const open = meetup.status === 'scheduled' && Date.parse(meetup.startsAt) > openedAt;
  const full = meetup.goingCount >= meetup.capacity;
  return (
    <Card>
      <h2 className="text-lg font-extrabold text-ink">Are you coming?</h2>
      <div className="mt-1 flex flex-wrap items-center gap-2">
        <Places meetup={meetup} />
        <MyAnswer mine={meetup.mine} />
      </div>
      {status === 'waitlisted' ? (
        <p className="mt-2 text-sm text-ink-soft">
          All places are taken. You are number {meetup.mine?.waitlistPosition} in line: when someone drops
          out, the place goes to the next person and we e-mail them.
        </p>
      ) : null}
      {open ? (
        <div className="mt-4 flex flex-wrap gap-2">
          <Button
            variant={status === 'going' || status === 'waitlisted' ? 'secondary' : 'primary'}
            aria-pressed={status === 'going' || status === 'waitlisted'}
            busy={rsvp.isPending && rsvp.variables?.response === 'going'}
            onClick={() => rsvp.mutate({ response: 'going' })}
          >
            {full && status !== 'going' ? 'Join the waitlist' : 'I’m going'}
          </Button>
          <Button
            variant="secondary"
            aria-pressed={status === 'not-going'}
            busy={rsvp.isPending && rsvp.variables?.response === 'not-going'}
            onClick={() => rsvp.mutate({ response: 'not-going' })}
          >
            {status === 'going'
              ? 'I can’t come after all'
              : status === 'waitlisted'
                ? 'Leave the waitlist'
                : 'Not going'}
          </Button>
        </div>
      ) : (
        <p className="mt-3 text-sm text-ink-muted">
          {meetup.status === 'cancelled'
            ? 'This meetup was cancelled.'
            : 'Answers are closed: it has started.'}
        </p>
      )}
      {rsvp.isError ? (
        <div className="mt-3">
          <Notice tone="error">{rsvp.error.message}</Notice>
        </div>
      ) : null}
    </Card>
  );
}
