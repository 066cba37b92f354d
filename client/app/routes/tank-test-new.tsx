import { useMemo } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router';
import { parameterInfo } from '@shared/care/parameters';
import { Notice } from '@client/components/ui/card';
import { PageHeader } from '@client/components/ui/page-header';
import { PageSkeleton } from '@client/components/ui/skeleton';
import { WaterTestForm } from '@client/features/readings/components/water-test/water-test-form';
import { loadEntryMemory } from '@client/features/readings/lib/entry-memory';
import { newDraft } from '@client/features/readings/lib/water-test-draft';
import { TankLoadError, TankRouteError } from '@client/features/tanks/components/tank-route-error';
import { useTankProfile } from '@client/lib/care-profiles';
import { firstReadingsFrom } from '@client/lib/test-links';
import { useTankRoute } from '../use-tank-route';

export function Component() {
  const { me, clubId, tankId, tank, mayLog } = useTankRoute();
  const profile = useTankProfile(clubId, tank.data);
  const navigate = useNavigate();
  const memory = useMemo(() => loadEntryMemory(tankId), [tankId]);
  const initial = useMemo(() => newDraft(me.user, memory.entries), [me.user, memory]);
  const [search] = useSearchParams();
  const firstReadings = useMemo(() => firstReadingsFrom(search), [search]);

  if (tank.isError) return <TankLoadError error={tank.error} />;
  if (tank.isPending || !profile) return <PageSkeleton label="Loading the tank…" />;
  const t = tank.data;
  const allowed = mayLog('create', 'WaterTest');

  return (
    <>
      <PageHeader title="Log a water test" subtitle={t.name} />
      {allowed ? (
        <>
          {firstReadings.length ? (
            <p className="mb-2 font-bold text-ink">
              To test today, at the top:{' '}
              {new Intl.ListFormat('en', { type: 'conjunction' }).format(
                firstReadings.map((k) => parameterInfo(k).label),
              )}
              .
            </p>
          ) : null}
          <p className="mb-4 text-sm text-ink-muted">
            Fill in what you tested; leave the rest empty. Not a test?{' '}
            <Link to={`/tanks/${tankId}/entries/new`} className="font-bold text-link underline">
              Log a water change, a dose or what you saw
            </Link>
            .
          </p>
          <WaterTestForm
            clubId={clubId}
            tank={t}
            profile={profile}
            prefs={me.user}
            initial={initial}
            memory={memory}
            lastKnown={t.lastKnown}
            firstReadings={firstReadings}
            onSaved={(saved) => navigate(`/tanks/${tankId}`, { state: { saved } })}
          />
        </>
      ) : (
        <Notice tone="warning">
          {t.archivedAt
            ? 'This tank is archived, so no new tests can be logged. Restore it from the tank page first.'
            : 'Only the keeper of this tank can log tests on it.'}
        </Notice>
      )}
    </>
  );
}

export const ErrorBoundary = TankRouteError;
