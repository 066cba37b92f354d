import { Link } from 'react-router';
import { CYCLE_STAGE_WORDS } from '@shared/constants/tank-labels';
import type { DeskRow } from '@shared/schemas/desk.schema';
import { Card, Notice } from '@client/components/ui/card';
import { SeverityBadge } from '@client/components/ui/severity-badge';
import { relativeTime } from '@client/lib/relative-time';
import { LINK_BUTTON } from './link-button';

/** One piece of a page's data: undefined while it loads, or the error to say. */
export interface Part<T> {
  data: T | undefined;
  error?: string;
}

export interface WorkRequests {
  open: { id: string; name: string; at: string }[];
}
export interface WorkInvites {
  waiting: number;
  expired: number;
}

function Loading({ label }: { label: string }) {
  return (
    <div aria-busy aria-label={label} className="mt-2 space-y-2">
      {[0, 1].map((i) => (
        <div key={i} className="h-12 animate-pulse rounded-xl bg-tint" />
      ))}
    </div>
  );
}

function DeskTop({ desk, max }: { desk: Part<{ rows: DeskRow[]; total: number }>; max: number }) {
  if (desk.error) return <Notice tone="error">{desk.error}</Notice>;
  if (!desk.data) return <Loading label="Loading the desk" />;
  const { rows, total } = desk.data;
  if (total === 0)
    return (
      <p className="mt-1 text-sm text-ink-muted">
        No mentees’ tanks yet. When a club admin pairs you with a beginner, their tanks appear here.
      </p>
    );
  return (
    <>
      <ol className="mt-2 space-y-2" aria-label="Tanks most in need">
        {rows.slice(0, max).map((r) => (
          <li key={r.tankId}>
            <Link
              to={`/tanks/${r.tankId}`}
              className="block rounded-xl bg-surface px-3 py-2 ring-1 ring-line hover:bg-tint"
            >
              <p className="flex flex-wrap items-center gap-2">
                {r.worstConcern ? <SeverityBadge severity={r.worstConcern.severity} /> : null}
                <span className="font-bold text-ink">{r.name}</span>
                <span className="text-sm text-ink-muted">· {r.owner.displayName}</span>
              </p>
              <p className="mt-0.5 text-sm text-ink-soft">
                {r.worstConcern
                  ? r.worstConcern.reason
                  : `All calm · ${r.phase === 'established' && r.cycleStage !== 'setback' ? 'established' : CYCLE_STAGE_WORDS[r.cycleStage]}`}
              </p>
              <p className="mt-0.5 text-xs text-ink-muted">
                {r.lastTestAt ? `Tested ${relativeTime(r.lastTestAt)}` : 'Never tested'}
                {r.unansweredQuestions
                  ? ` · ${r.unansweredQuestions} question${r.unansweredQuestions === 1 ? '' : 's'} waiting`
                  : ''}
              </p>
            </Link>
          </li>
        ))}
      </ol>
      <Link to="/desk" className={`${LINK_BUTTON.primary} mt-3 w-full sm:w-auto`}>
        Open the mentor desk ({total} tank{total === 1 ? '' : 's'})
      </Link>
    </>
  );
}

function Requests({ requests }: { requests: Part<WorkRequests> }) {
  if (requests.error) return <Notice tone="error">{requests.error}</Notice>;
  if (!requests.data) return <Loading label="Loading mentor requests" />;
  const { open } = requests.data;
  if (!open.length) return <p className="mt-1 text-sm text-ink-muted">Nobody is waiting for a mentor.</p>;
  return (
    <>
      <ul className="mt-2 space-y-1 text-sm text-ink-soft">
        {open.slice(0, 3).map((r) => (
          <li key={r.id}>
            <strong className="text-ink">{r.name}</strong> asked {relativeTime(r.at)}
          </li>
        ))}
        {open.length > 3 ? <li>and {open.length - 3} more</li> : null}
      </ul>
      <Link to="/club" className={`${LINK_BUTTON.secondary} mt-2`}>
        {open.length === 1 ? `Pair ${open[0]!.name} with a mentor` : 'Pair them with mentors'}
      </Link>
    </>
  );
}

function Invites({ invites }: { invites: Part<WorkInvites> }) {
  if (invites.error) return <Notice tone="error">{invites.error}</Notice>;
  if (!invites.data) return <Loading label="Loading invites" />;
  const { waiting, expired } = invites.data;
  if (!waiting && !expired)
    return (
      <p className="mt-1 text-sm text-ink-muted">
        No invites waiting. Invite new members from the club page.
      </p>
    );
  return (
    <>
      <p className="mt-1 text-sm text-ink-soft">
        {waiting ? `${waiting} not accepted yet` : ''}
        {waiting && expired ? '; ' : ''}
        {expired ? `${expired} expired: send a new link if they still want to join` : ''}.
      </p>
      <Link to="/club" className={`${LINK_BUTTON.secondary} mt-2`}>
        See invites
      </Link>
    </>
  );
}

/** A mentor's or admin's home leads to their work: the desk's most worrying tanks, people waiting for a mentor, invites. */
export function MentorWork({
  desk,
  requests,
  invites,
  deskMax,
  wholeClub,
}: {
  desk: Part<{ rows: DeskRow[]; total: number }>;
  requests?: Part<WorkRequests>;
  invites?: Part<WorkInvites>;
  deskMax: number;
  /** An admin's desk holds every tank of the club, not only mentees'. */
  wholeClub: boolean;
}) {
  return (
    <Card>
      <h2 className="text-lg font-extrabold text-ink">
        {wholeClub ? 'The club’s tanks' : 'Your mentees’ tanks'}, most in need first
      </h2>
      <DeskTop desk={desk} max={deskMax} />
      {requests ? (
        <section className="mt-5 border-t border-line pt-4" aria-labelledby="work-requests">
          <h2 id="work-requests" className="text-lg font-extrabold text-ink">
            Waiting for a mentor
          </h2>
          <Requests requests={requests} />
        </section>
      ) : null}
      {invites ? (
        <section className="mt-5 border-t border-line pt-4" aria-labelledby="work-invites">
          <h2 id="work-invites" className="text-lg font-extrabold text-ink">
            Invites
          </h2>
          <Invites invites={invites} />
        </section>
      ) : null}
    </Card>
  );
}
