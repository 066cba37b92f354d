import { Link } from 'react-router';
import { PARAMETER_KEYS, parameterInfo, type ParameterKey } from '@shared/care/parameters';
import { SYSTEM_TYPE_LABELS } from '@shared/constants/tank-labels';
import type { TankView } from '@shared/schemas/tank-views';
import { Loading, Skeleton } from '@client/components/ui/skeleton';
import { VerdictIcon, verdictTone } from '@client/components/ui/verdict-mark';
import { RelativeTime } from '@client/components/ui/relative-time';
import { verdictFor } from '@client/lib/bands';
import { useTankProfile } from '@client/lib/care-profiles';
import { formatDisplay, formatVolume, type UnitPrefs } from '@client/lib/display-units';
import { latestValues } from '@client/lib/latest-values';
import { useRecentTests } from '../../api/recent-tests';
import { freshness, shortestCadenceDays, type Freshness } from '../../lib/freshness';
import { ArchivedBadge, PhaseBadge } from '../badges';

const CYCLE_FIRST: readonly ParameterKey[] = ['ammonia', 'nitrite', 'nitrate', 'temperature'];

const FIGURES = 4;
const FRESHNESS_TONE: Record<Freshness, string> = {
  fresh: 'text-ink-muted',
  due: 'text-watch',
  stale: 'text-danger',
  never: 'text-ink-muted',
};

function LastTested({ at, level }: { at: string | null; level: Freshness }) {
  if (!at)
    return <p className={`text-sm font-bold ${FRESHNESS_TONE.never}`}>No tests yet: log the first one.</p>;
  const word = level === 'stale' ? ' · overdue for a test' : level === 'due' ? ' · a test is due' : '';
  return (
    <p className={`flex items-center gap-1.5 text-sm font-bold ${FRESHNESS_TONE[level]}`}>
      {level !== 'fresh' ? <VerdictIcon level={level === 'stale' ? 'danger' : 'caution'} /> : null}
      <span>
        Last test <RelativeTime at={at} />
        {word}
      </span>
    </p>
  );
}

/** One tank in the list: its latest figures in the member's units and how long since the last test. */
export function TankCard({
  tank,
  prefs,
  showOwner,
}: {
  tank: TankView;
  prefs: UnitPrefs;
  showOwner: boolean;
}) {
  const recent = useRecentTests(tank.clubId, tank.id);
  const profile = useTankProfile(tank.clubId, tank);
  const latest = latestValues(recent.data ?? []);
  const lastAt = recent.data?.[0]?.takenAt ?? null;
  // While cycling, the nitrogen figures are the story; afterwards the parameters in their usual order.
  const order: readonly ParameterKey[] =
    tank.phase === 'cycling'
      ? [...CYCLE_FIRST, ...PARAMETER_KEYS.filter((k) => !CYCLE_FIRST.includes(k))]
      : PARAMETER_KEYS;
  const figures = order.filter((k) => latest[k]).slice(0, FIGURES);
  const level = freshness(lastAt, shortestCadenceDays(profile, tank.phase));

  return (
    <li
      className={`rounded-card shadow-card ring-focus focus-within:ring-2 ${tank.archivedAt ? 'bg-tint' : 'bg-surface'}`}
    >
      <Link to={`/tanks/${tank.id}`} className="block p-4 sm:p-5">
        <div className="flex flex-wrap items-start justify-between gap-2">
          <div>
            <h2 className="text-lg font-extrabold text-ink">{tank.name}</h2>
            <p className="text-sm text-ink-muted">
              {SYSTEM_TYPE_LABELS[tank.systemType]} · {formatVolume(tank.volumeL, prefs)}
            </p>
            {showOwner ? (
              <p className="text-sm font-semibold text-ink-muted">Kept by {tank.owner.displayName}</p>
            ) : null}
          </div>
          <div className="flex gap-1">
            {tank.archivedAt ? <ArchivedBadge /> : null}
            <PhaseBadge phase={tank.phase} />
          </div>
        </div>
        {recent.isPending ? (
          <div className="mt-3 grid grid-cols-2 gap-2">
            {[0, 1, 2, 3].map((i) => (
              <Skeleton key={i} className="h-11" />
            ))}
          </div>
        ) : figures.length ? (
          <dl className="mt-3 grid grid-cols-2 gap-2">
            {figures.map((k) => {
              const v = latest[k]!.value;
              const verdict = verdictFor(k, v, profile, prefs);
              return (
                <div key={k} className="rounded-lg bg-tint px-3 py-1.5">
                  <dt className="truncate text-xs font-bold text-ink-muted">{parameterInfo(k).label}</dt>
                  <dd
                    className={`flex items-center gap-1 font-extrabold ${verdict ? verdictTone(verdict.level) : 'text-ink'}`}
                  >
                    {verdict ? <VerdictIcon level={verdict.level} direction={verdict.direction} /> : null}
                    <span className="text-ink">{formatDisplay(k, v, prefs)}</span>
                    {verdict ? <span className="sr-only">{verdict.text}</span> : null}
                  </dd>
                </div>
              );
            })}
          </dl>
        ) : null}
        <div className="mt-3">
          {recent.isError ? (
            <p className="text-sm text-danger">Could not load the latest tests.</p>
          ) : recent.isPending ? null : (
            <LastTested at={lastAt} level={level} />
          )}
        </div>
      </Link>
    </li>
  );
}

export function TankListSkeleton() {
  return (
    <Loading label="Loading your tanks…">
      <div className="grid gap-4 sm:grid-cols-2">
        {[0, 1, 2].map((i) => (
          <div key={i} className="rounded-card bg-surface p-5 shadow-card ring-1 ring-line">
            <Skeleton className="h-5 w-2/3" />
            <Skeleton className="mt-2 h-4 w-1/2" />
            <div className="mt-4 grid grid-cols-2 gap-2">
              {[0, 1, 2, 3].map((j) => (
                <Skeleton key={j} className="h-11" />
              ))}
            </div>
          </div>
        ))}
      </div>
    </Loading>
  );
}
