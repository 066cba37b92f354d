import { useMemo } from 'react';
import { Link, useNavigate } from 'react-router';
import { Notice } from '@client/components/ui/card';
import { PageHeader } from '@client/components/ui/page-header';
import { Spinner } from '@client/components/ui/spinner';
import { WaterTestForm } from '@client/features/readings/components/water-test/water-test-form';
import { loadEntryMemory } from '@client/features/readings/lib/entry-memory';
import { newDraft } from '@client/features/readings/lib/water-test-draft';
import { TankRouteError } from '@client/features/tanks/components/tank-route-error';
import { useTankProfile } from '@client/lib/care-profiles';
import { useTankRoute } from '../use-tank-route';

export function Component() {
  const { me, clubId, tankId, tank, mayLog } = useTankRoute();
  const profile = useTankProfile(clubId, tank.data);
  const navigate = useNavigate();
  const memory = useMemo(() => loadEntryMemory(tankId), [tankId]);
  const initial = useMemo(() => newDraft(me.user, memory.entries), [me.user, memory]);

  if (tank.isError) throw tank.error;
  if (tank.isPending || !profile) return <Spinner label="Loading the tank…" />;
  const t = tank.data;
  const allowed = mayLog('create', 'WaterTest');

  return (
    <>
      <PageHeader title="Log a water test" subtitle={t.name} />
      {allowed ? (
        <>
          <p className="mb-4 text-sm text-tide-700">
            Fill in what you tested; leave the rest empty. Not a test?{' '}
            <Link to={`/tanks/${tankId}/entries/new`} className="font-bold text-tide-700 underline">Log a water change, a dose or what you saw</Link>.
          </p>
          <WaterTestForm clubId={clubId} tank={t} profile={profile} prefs={me.user} initial={initial} memory={memory} lastKnown={t.lastKnown} onSaved={(saved) => navigate(`/tanks/${tankId}`, { state: { saved } })} />
        </>
      ) : (
        <Notice tone="warning">{t.archivedAt ? 'This tank is archived, so no new tests can be logged. Restore it from the tank page first.' : 'Only the keeper of this tank can log tests on it.'}</Notice>
      )}
    </>
  );
}

export const ErrorBoundary = TankRouteError;
