import { useQueryClient } from '@tanstack/react-query';
import { useMemo, useRef } from 'react';
import { Link, useNavigate, useParams } from 'react-router';
import { asSubject } from '../../../shared/abilities';
import type { WaterTestSaved } from '../../../shared/schemas/tank-views';
import { Notice } from '../../components/ui/card';
import { PageHeader } from '../../components/ui/page-header';
import { Spinner } from '../../components/ui/spinner';
import { useSession } from '../../features/auth/components/session-provider';
import { careKeys } from '../../features/care/api/care';
import { useTankProfile } from '../../features/tanks/api/care-profiles';
import { useUploadPhotos } from '../../features/tanks/api/photos';
import { useTank } from '../../features/tanks/api/tanks';
import { useCreateWaterTest } from '../../features/tanks/api/water-tests';
import { TankRouteError } from '../../features/tanks/components/tank-route-error';
import { WaterTestForm } from '../../features/tanks/components/water-test/water-test-form';
import { loadEntryMemory, saveEntryMemory } from '../../features/tanks/lib/entry-memory';
import { PhotoUploadError } from '../../features/tanks/lib/photo-upload-error';
import type { SavedNotice } from '../../features/tanks/lib/saved-notice';
import { newDraft } from '../../features/tanks/lib/water-test-draft';

export function Component() {
  const { tankId = '' } = useParams();
  const { me, activeClub, ability } = useSession();
  const clubId = activeClub?.clubId ?? '';
  const tank = useTank(clubId, tankId);
  const profile = useTankProfile(clubId, tank.data);
  const create = useCreateWaterTest(clubId, tankId);
  const upload = useUploadPhotos(clubId);
  const navigate = useNavigate();
  const qc = useQueryClient();
  const saved = useRef<WaterTestSaved | undefined>(undefined);
  const memory = useMemo(() => loadEntryMemory(tankId), [tankId]);
  const initial = useMemo(() => newDraft(me.user, memory.entries), [me.user, memory]);

  if (tank.isError) throw tank.error;
  if (tank.isPending || !profile) return <Spinner label="Loading the tank…" />;
  const t = tank.data;
  const allowed = !t.archivedAt && ability.can('create', asSubject('WaterTest', { clubId: t.clubId, ownerId: t.owner.id }));

  const finish = () => {
    const s = saved.current;
    const count = s ? Object.keys(s.waterTest.values).length : 0;
    const notice: SavedNotice = {
      message: `Test saved: ${count} ${count === 1 ? 'reading' : 'readings'}. ${s?.warnings.length ? 'Have another look at:' : 'It is on the charts.'}`,
      toCharts: true,
      warnings: s?.warnings.map((w) => w.message) ?? [],
    };
    void qc.invalidateQueries({ queryKey: careKeys.tank(tankId) });
    navigate(`/tanks/${tankId}`, { state: { saved: notice } });
  };

  return (
    <>
      <PageHeader title="Log a water test" subtitle={t.name} />
      {allowed ? (
        <>
          <p className="mb-4 text-sm text-tide-700">
            Fill in what you tested; leave the rest empty. Not a test?{' '}
            <Link to={`/tanks/${tankId}/entries/new`} className="font-bold text-tide-700 underline">Log a water change, a dose or what you saw</Link>.
          </p>
          <WaterTestForm
            tank={t}
            profile={profile}
            prefs={me.user}
            initial={initial}
            memory={memory}
            onSkipPhotos={finish}
            onSave={async (input, photos, draft) => {
              if (!saved.current) {
                saved.current = await create.mutateAsync(input);
                saveEntryMemory(tankId, draft);
              }
              if (photos.length) {
                try {
                  await upload.mutateAsync({ tankId, files: photos, waterTestId: saved.current.waterTest.id, caption: 'Test colours' });
                } catch (error) {
                  throw new PhotoUploadError(error);
                }
              }
              finish();
            }}
          />
        </>
      ) : (
        <Notice tone="warning">{t.archivedAt ? 'This tank is archived, so no new tests can be logged. Restore it from the tank page first.' : 'Only the keeper of this tank can log tests on it.'}</Notice>
      )}
    </>
  );
}

export const ErrorBoundary = TankRouteError;
