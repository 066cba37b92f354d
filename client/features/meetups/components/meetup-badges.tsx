import { MEETUP_KIND_LABELS } from '@shared/constants/meetups';
import type { MeetupSummaryView, MyRsvpView } from '@shared/schemas/meetup-views';

export function KindBadge({ kind }: { kind: MeetupSummaryView['kind'] }) {
  return (
    <span className="rounded-full bg-tint px-3 py-1 text-xs font-extrabold text-ink-muted">
      {MEETUP_KIND_LABELS[kind]}
    </span>
  );
}

/** The viewer's own answer, in words with a mark (never colour alone). */
export function MyAnswer({ mine }: { mine: MyRsvpView | null }) {
  if (!mine) return null;
  if (mine.status === 'going')
    return (
      <span className="rounded-full bg-ok-soft px-3 py-1 text-xs font-extrabold text-ok">
        ✓ {mine.checkedIn ? 'You were there' : 'You’re going'}
      </span>
    );
  if (mine.status === 'waitlisted')
    return (
      <span className="rounded-full bg-watch-soft px-3 py-1 text-xs font-extrabold text-watch">
        ⏳ Waitlist, number {mine.waitlistPosition}
      </span>
    );
  return (
    <span className="rounded-full bg-tint px-3 py-1 text-xs font-extrabold text-ink-muted">✕ Not going</span>
  );
}

export function Places({
  meetup,
}: {
  meetup: Pick<MeetupSummaryView, 'goingCount' | 'capacity' | 'waitlistCount'>;
}) {
  const left = meetup.capacity - meetup.goingCount;
  return (
    <span className="text-sm font-semibold text-ink-muted">
      {meetup.goingCount} of {meetup.capacity} places taken{left <= 0 ? ' · full' : ''}
      {meetup.waitlistCount ? ` · ${meetup.waitlistCount} waiting` : ''}
    </span>
  );
}
