import { useQueryClient } from '@tanstack/react-query';
import { useParams } from 'react-router';
import { asSubject } from '../../../shared/abilities';
import { Card, Notice } from '../../components/ui/card';
import { PageHeader } from '../../components/ui/page-header';
import { Spinner } from '../../components/ui/spinner';
import { useSession } from '../../features/auth/components/session-provider';
import { careKeys } from '../../features/care/api/care';
import { useTank } from '../../features/tanks/api/tanks';
import { useTankReadingsChanged } from '../../features/tanks/api/water-tests';
import { ImportFlow } from '../../features/tanks/components/import/import-flow';
import { TankRouteError } from '../../features/tanks/components/tank-route-error';

export function Component() {
  const { tankId = '' } = useParams();
  const { me, activeClub, ability } = useSession();
  const clubId = activeClub?.clubId ?? '';
  const tank = useTank(clubId, tankId);
  const changed = useTankReadingsChanged(clubId, tankId);
  const qc = useQueryClient();
  if (tank.isError) throw tank.error;
  if (tank.isPending) return <Spinner label="Loading the tank…" />;
  const t = tank.data;
  const allowed = !t.archivedAt && ability.can('create', asSubject('WaterTest', { clubId: t.clubId, ownerId: t.owner.id }));
  return (
    <>
      <PageHeader title="Import a log" subtitle={t.name} />
      <Card>
        {allowed ? (
          <ImportFlow
            clubId={clubId}
            tankId={tankId}
            prefs={me.user}
            timeZone={me.user.timeZone}
            onImported={() => {
              void changed();
              void qc.invalidateQueries({ queryKey: careKeys.tank(tankId) });
            }}
          />
        ) : (
          <Notice tone="warning">Only the keeper of this tank can import tests into it{t.archivedAt ? ', and not while it is archived' : ''}.</Notice>
        )}
      </Card>
    </>
  );
}

export const ErrorBoundary = TankRouteError;
