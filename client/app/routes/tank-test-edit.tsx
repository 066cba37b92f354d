import { useMemo, useState } from 'react';
import { useNavigate, useParams } from 'react-router';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/card';
import { ConfirmDialog } from '@client/components/ui/confirm-dialog';
import { PageHeader } from '@client/components/ui/page-header';
import { PageSkeleton } from '@client/components/ui/skeleton';
import { useDeleteWaterTest, useWaterTest } from '@client/features/readings/api/water-tests';
import { WaterTestForm } from '@client/features/readings/components/water-test/water-test-form';
import { loadEntryMemory } from '@client/features/readings/lib/entry-memory';
import { draftFromTest } from '@client/features/readings/lib/water-test-draft';
import { TankLoadError, TankRouteError } from '@client/features/tanks/components/tank-route-error';
import { useTankProfile } from '@client/lib/care-profiles';
import type { SavedNotice } from '@client/lib/saved-notice';
import { useTankRoute } from '../use-tank-route';

export function Component() {
  const { testId = '' } = useParams();
  const { me, clubId, tankId, tank, mayLog } = useTankRoute();
  const test = useWaterTest(clubId, tankId, testId);
  const profile = useTankProfile(clubId, tank.data);
  const remove = useDeleteWaterTest(clubId, tankId);
  const navigate = useNavigate();
  const [confirming, setConfirming] = useState(false);
  const memory = useMemo(() => loadEntryMemory(tankId), [tankId]);
  const initial = useMemo(
    () => (test.data ? draftFromTest(test.data.waterTest, me.user) : undefined),
    [test.data, me.user],
  );

  if (tank.isError) return <TankLoadError error={tank.error} />;
  if (test.isError) return <TankLoadError error={test.error} />;
  if (tank.isPending || test.isPending || !profile || !initial)
    return <PageSkeleton label="Loading the test…" />;
  const t = tank.data;
  const allowed = mayLog('update', 'WaterTest');
  const back = (saved: SavedNotice) => navigate(`/tanks/${tankId}`, { state: { saved } });

  return (
    <>
      <PageHeader title="Change a water test" subtitle={t.name} />
      {!allowed ? (
        <Notice tone="warning">
          Only the keeper of this tank can change its tests
          {t.archivedAt ? ', and not while it is archived' : ''}.
        </Notice>
      ) : (
        <div className="space-y-6">
          <WaterTestForm
            clubId={clubId}
            tank={t}
            profile={profile}
            prefs={me.user}
            initial={initial}
            memory={memory}
            editing={test.data.waterTest}
            lastKnown={test.data.lastKnown}
            submitLabel="Save changes"
            onSaved={back}
          />
          <div className="border-t border-line pt-4">
            <Button variant="ghost" className="text-danger" onClick={() => setConfirming(true)}>
              Delete this test
            </Button>
          </div>
          <ConfirmDialog
            open={confirming}
            title="Delete this test?"
            confirmLabel="Delete it"
            tone="danger"
            busy={remove.isPending}
            onCancel={() => setConfirming(false)}
            onConfirm={() =>
              remove.mutate(testId, {
                onSuccess: () => back({ message: 'The test was deleted.', warnings: [] }),
                onSettled: () => setConfirming(false),
              })
            }
          >
            <p>It disappears from the charts, the table and the care checks. This cannot be undone.</p>
            {remove.isError ? <Notice tone="error">{remove.error.message}</Notice> : null}
          </ConfirmDialog>
        </div>
      )}
    </>
  );
}

export const ErrorBoundary = TankRouteError;
