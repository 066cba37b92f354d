import { useState } from 'react';
import { Link } from 'react-router';
import type { AttendanceRowView } from '@shared/schemas/meetup-views';
import { Notice } from '@client/components/ui/card';
import { TextField } from '@client/components/ui/field';
import { Loading } from '@client/components/ui/skeleton';
import { utcToClubTime } from '@shared/meetups/club-time';
import { useAttendance, useCheckIn } from '../api/meetups';

/**
 * The list at the door, made for a phone: one big tap per person. Ticks show at once and are sent in the
 * background; a tick that could not be saved turns back and says so on that row.
 */
export function AttendanceList({
  clubId,
  meetupId,
  renderExtra,
}: {
  clubId: string;
  meetupId: string;
  renderExtra?: (row: AttendanceRowView) => React.ReactNode;
}) {
  const list = useAttendance(clubId, meetupId);
  const tick = useCheckIn(clubId, meetupId);
  const [failed, setFailed] = useState<Record<string, string>>({});
  const [search, setSearch] = useState('');
  if (list.isPending) return <Loading label="Loading the list…" />;
  if (list.isError) throw list.error;
  const { rows, meetup } = list.data;
  const here = rows.filter((r) => r.checkedIn).length;
  const shown = rows.filter((r) => r.displayName.toLowerCase().includes(search.trim().toLowerCase()));

  const toggle = (row: AttendanceRowView) => {
    setFailed(({ [row.userId]: _gone, ...rest }) => rest);
    tick.mutate(
      { userId: row.userId, present: !row.checkedIn },
      { onError: (e) => setFailed((f) => ({ ...f, [row.userId]: `Not saved: ${e.message} Tap again.` })) },
    );
  };

  return (
    <section aria-label="Check-in" className="space-y-3">
      <p className="text-lg font-extrabold text-ink" aria-live="polite">
        {here} of {rows.filter((r) => r.status === 'going').length} here
      </p>
      {rows.length > 8 ? (
        <TextField
          label="Find a name"
          type="search"
          value={search}
          onChange={(e) => setSearch(e.target.value)}
        />
      ) : null}
      {rows.length === 0 ? <Notice>Nobody has said they are coming yet.</Notice> : null}
      <ul
        aria-label="People expected"
        className="divide-y divide-line overflow-hidden rounded-card bg-surface shadow-card"
      >
        {shown.map((r) => (
          <li key={r.userId} className="p-2">
            <button
              type="button"
              aria-pressed={r.checkedIn}
              aria-label={`${r.displayName}: ${r.checkedIn ? 'here' : 'not ticked in'}`}
              onClick={() => toggle(r)}
              className={`flex min-h-14 w-full items-center gap-3 rounded-xl px-3 text-left ${r.checkedIn ? 'bg-ok-soft' : 'hover:bg-tint'}`}
            >
              <span
                aria-hidden
                className={`grid size-8 shrink-0 place-items-center rounded-full text-lg font-extrabold ${r.checkedIn ? 'bg-ok text-on-accent' : 'ring-2 ring-focus text-transparent'}`}
              >
                ✓
              </span>
              <span className="min-w-0 flex-1">
                <span className="block truncate font-bold text-ink">{r.displayName}</span>
                <span className="block text-sm text-ink-muted">
                  {r.status === 'waitlisted'
                    ? `Waitlist ${r.waitlistPosition}`
                    : r.checkedIn
                      ? 'Here'
                      : 'Expected'}
                  {r.slotStartsAt
                    ? ` · slot ${utcToClubTime(r.slotStartsAt, meetup.timeZone).slice(11)}`
                    : ''}
                  {r.tank ? ` · water from ${r.tank.name}` : ''}
                </span>
              </span>
            </button>
            {failed[r.userId] ? (
              <p role="alert" className="px-3 pt-1 text-sm font-semibold text-danger">
                {failed[r.userId]}
              </p>
            ) : null}
            <div className="flex flex-wrap items-center gap-3 px-3 pb-2">
              {renderExtra?.(r)}
              <Link to={`/meetups/attendance/${r.userId}`} className="text-sm font-bold text-link underline">
                Past attendance
              </Link>
            </div>
          </li>
        ))}
      </ul>
    </section>
  );
}
