import { MEETUP_KIND_LABELS } from '@shared/constants/meetups';
import type { MeetupSummaryView, MyRsvpView } from '@shared/schemas/meetup-views';

export function KindBadge({ kind }: { kind: MeetupSummaryView['kind'] }) {
  return <span className="rounded-full bg-tide-50 px-3 py-1 text-xs font-extrabold text-tide-700">{MEETUP_KIND_LABELS[kind]}</span>;
}

/** The viewer's own answer, in words with a mark (never colour alone). */
export function MyAnswer({ mine }: { mine: MyRsvpView | null }) {
  if (!mine) return null;
  if (mine.status === 'going') return <span className="rounded-full bg-kelp-100 px-3 py-1 text-xs font-extrabold text-kelp-700">✓ {mine.checkedIn ? 'You were there' : 'You’re going'}</span>;
  if (mine.status === 'waitlisted') return <span className="rounded-full bg-amber-100 px-3 py-1 text-xs font-extrabold text-amber-700">⏳ Waitlist, number {mine.waitlistPosition}</span>;
  return <span className="rounded-full bg-tide-50 px-3 py-1 text-xs font-extrabold text-tide-600">✕ Not going</span>;
}

export function Places({ meetup }: { meetup: Pick<MeetupSummaryView, 'goingCount' | 'capacity' | 'waitlistCount'> }) {
  const left = meetup.capacity - meetup.goingCount;
  return (
    <span className="text-sm font-semibold text-tide-700">
      {meetup.goingCount} of {meetup.capacity} places taken{left <= 0 ? ' · full' : ''}
      {meetup.waitlistCount ? ` · ${meetup.waitlistCount} waiting` : ''}
    </span>
  );
}
