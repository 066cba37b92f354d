import { useQueryClient } from '@tanstack/react-query';
import { useMemo, useRef, useState } from 'react';
import { useNavigate, useParams } from 'react-router';
import { asSubject } from '../../../shared/abilities';
import { PARAMETER_KEYS } from '../../../shared/care/parameters';
import type { UpdateWaterTestInput } from '../../../shared/schemas/water-test.schema';
import type { WaterTestSaved } from '../../../shared/schemas/tank-views';
import { Button } from '../../components/ui/button';
import { Notice } from '../../components/ui/card';
import { ConfirmDialog } from '../../components/ui/confirm-dialog';
import { PageHeader } from '../../components/ui/page-header';
import { Spinner } from '../../components/ui/spinner';
import { useSession } from '../../features/auth/components/session-provider';
import { careKeys } from '../../features/care/api/care';
import { useTankProfile } from '../../features/tanks/api/care-profiles';
import { useUploadPhotos } from '../../features/tanks/api/photos';
import { useTank } from '../../features/tanks/api/tanks';
import { useDeleteWaterTest, useUpdateWaterTest, useWaterTest } from '../../features/tanks/api/water-tests';
import { TankRouteError } from '../../features/tanks/components/tank-route-error';
import { WaterTestForm } from '../../features/tanks/components/water-test/water-test-form';
import { loadEntryMemory } from '../../features/tanks/lib/entry-memory';
import { PhotoUploadError } from '../../features/tanks/lib/photo-upload-error';
import { draftFromTest } from '../../features/tanks/lib/water-test-draft';

export function Component() {
  const { tankId = '', testId = '' } = useParams();
  const { me, activeClub, ability } = useSession();
  const clubId = activeClub?.clubId ?? '';
  const tank = useTank(clubId, tankId);
  const test = useWaterTest(clubId, tankId, testId);
  const profile = useTankProfile(clubId, tank.data);
  const update = useUpdateWaterTest(clubId, tankId, testId);
  const remove = useDeleteWaterTest(clubId, tankId);
  const upload = useUploadPhotos(clubId);
  const navigate = useNavigate();
  const qc = useQueryClient();
  const saved = useRef<WaterTestSaved | undefined>(undefined);
  const [confirming, setConfirming] = useState(false);
  const memory = useMemo(() => loadEntryMemory(tankId), [tankId]);
  const initial = useMemo(() => (test.data ? draftFromTest(test.data, me.user) : undefined), [test.data, me.user]);

  if (tank.isError) throw tank.error;
  if (test.isError) throw test.error;
  if (tank.isPending || test.isPending || !profile || !initial) return <Spinner label="Loading the test…" />;
  const t = tank.data;
  const allowed = !t.archivedAt && ability.can('update', asSubject('WaterTest', { clubId: t.clubId, ownerId: t.owner.id }));
  const back = (message: string, warnings: string[] = []) => {
    void qc.invalidateQueries({ queryKey: careKeys.tank(tankId) });
    navigate(`/tanks/${tankId}`, { state: { saved: { message, warnings } } });
  };

  return (
    <>
      <PageHeader title="Change a water test" subtitle={t.name} />
      {!allowed ? (
        <Notice tone="warning">Only the keeper of this tank can change its tests{t.archivedAt ? ', and not while it is archived' : ''}.</Notice>
      ) : (
        <div className="space-y-6">
          <WaterTestForm
            tank={t}
            profile={profile}
            prefs={me.user}
            initial={initial}
            memory={memory}
            testId={testId}
            submitLabel="Save changes"
            onSkipPhotos={() => back('Changes saved.')}
            onSave={async (input, photos) => {
              if (!saved.current) {
                const entries: NonNullable<UpdateWaterTestInput['entries']> = {};
                for (const k of PARAMETER_KEYS) {
                  const next = input.entries[k];
                  if (next) Object.assign(entries, { [k]: next });
                  else if (test.data.entries[k]) Object.assign(entries, { [k]: null });
                }
                saved.current = await update.mutateAsync({ takenAt: input.takenAt, note: input.note, entries });
              }
              if (photos.length) {
                try {
                  await upload.mutateAsync({ tankId, files: photos, waterTestId: testId, caption: 'Test colours' });
                } catch (error) {
                  throw new PhotoUploadError(error);
                }
              }
              back('Changes saved. Derived values such as free ammonia were worked out again.', saved.current.warnings.map((w) => w.message));
            }}
          />
          <div className="border-t border-tide-100 pt-4">
            <Button variant="ghost" className="text-ember-700" onClick={() => setConfirming(true)}>Delete this test</Button>
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
                onSuccess: () => back('The test was deleted.'),
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
