import { Link } from 'react-router';
import { MEETUP_KIND_LABELS } from '@shared/constants/meetups';
import { Card, Notice } from '@client/components/ui/card';
import { PageHeader } from '@client/components/ui/page-header';
import { Loading } from '@client/components/ui/skeleton';
import { useAttendanceHistory } from '../api/meetups';

const ANSWER = { going: 'Said going', waitlisted: 'On the waitlist', 'not-going': 'Said not going' } as const;

export function AttendanceHistory({
  clubId,
  userId,
  isSelf,
}: {
  clubId: string;
  userId: string;
  isSelf: boolean;
}) {
  const history = useAttendanceHistory(clubId, userId);
  if (history.isPending) return <Loading label="Loading attendance…" />;
  if (history.isError) throw history.error;
  const h = history.data;
  return (
    <>
      <PageHeader
        title={isSelf ? 'My meetups' : `${h.member.displayName}’s meetups`}
        subtitle={`Came to ${h.attended} · said going but not ticked in at ${h.missed}`}
      />
      {h.rows.length === 0 ? <Notice>No meetups answered yet.</Notice> : null}
      <Card className="p-0">
        <ul className="divide-y divide-line">
          {h.rows.map((r) => (
            <li key={r.meetup.id} className="flex flex-wrap items-center justify-between gap-2 p-4">
              <div>
                <Link to={`/meetups/${r.meetup.id}`} className="font-bold text-ink underline">
                  {r.meetup.title}
                </Link>
                <p className="text-sm text-ink-muted">
                  {MEETUP_KIND_LABELS[r.meetup.kind]} · {r.meetup.when}
                </p>
              </div>
              <span
                className={`rounded-full px-3 py-1 text-xs font-extrabold ${r.checkedIn ? 'bg-ok-soft text-ok' : 'bg-tint text-ink-muted'}`}
              >
                {r.meetup.status === 'cancelled'
                  ? '✕ Cancelled'
                  : r.checkedIn
                    ? '✓ Was there'
                    : ANSWER[r.rsvp]}
              </span>
            </li>
          ))}
        </ul>
      </Card>
    </>
  );
}
