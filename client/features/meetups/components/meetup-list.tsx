import { Link } from 'react-router';
import type { MeetupListWhen } from '@shared/schemas/meetup.schema';
import { Notice } from '@client/components/ui/card';
import { Loading } from '@client/components/ui/skeleton';
import { useMeetups } from '../api/meetups';
import { KindBadge, MyAnswer, Places } from './meetup-badges';

export function MeetupList({ clubId, when }: { clubId: string; when: MeetupListWhen }) {
  const list = useMeetups(clubId, when);
  if (list.isPending) return <Loading label="Loading meetups…" />;
  if (list.isError) return <Notice tone="error">{list.error.message}</Notice>;
  if (!list.data.length)
    return (
      <Notice>
        {when === 'upcoming'
          ? 'Nothing planned yet. When the club plans a meetup, it shows here.'
          : 'No past meetups yet.'}
      </Notice>
    );
  return (
    <ul aria-label={when === 'upcoming' ? 'Upcoming meetups' : 'Past meetups'} className="space-y-3">
      {list.data.map((m) => (
        <li key={m.id}>
          <Link
            to={`/meetups/${m.id}`}
            className="block rounded-card bg-surface p-4 shadow-card hover:ring-2 hover:ring-line"
          >
            <div className="flex flex-wrap items-center gap-2">
              <KindBadge kind={m.kind} />
              {m.status === 'cancelled' ? (
                <span className="rounded-full bg-danger-soft px-3 py-1 text-xs font-extrabold text-danger">
                  ✕ Cancelled
                </span>
              ) : (
                <MyAnswer mine={m.mine} />
              )}
            </div>
            <h2
              className={`mt-2 text-lg font-extrabold text-ink ${m.status === 'cancelled' ? 'line-through' : ''}`}
            >
              {m.title}
            </h2>
            <p className="text-ink-soft">{m.when}</p>
            <p className="text-sm text-ink-muted">{m.kind === 'online' ? 'Online' : m.placeText}</p>
            <div className="mt-1">
              <Places meetup={m} />
            </div>
          </Link>
        </li>
      ))}
    </ul>
  );
}
