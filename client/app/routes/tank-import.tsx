import { Card, Notice } from '@client/components/ui/card';
import { PageHeader } from '@client/components/ui/page-header';
import { PageSkeleton } from '@client/components/ui/skeleton';
import { ImportFlow } from '@client/features/import/components/import-flow';
import { TankLoadError, TankRouteError } from '@client/features/tanks/components/tank-route-error';
import { useTankRoute } from '../use-tank-route';

export function Component() {
  const { me, clubId, tankId, tank, mayLog } = useTankRoute();
  if (tank.isError) return <TankLoadError error={tank.error} />;
  if (tank.isPending) return <PageSkeleton label="Loading the tank…" />;
  const t = tank.data;
  const allowed = mayLog('create', 'WaterTest');
  return (
    <>
      <PageHeader title="Import a log" subtitle={t.name} />
      <Card>
        {allowed ? (
          <ImportFlow clubId={clubId} tankId={tankId} prefs={me.user} timeZone={me.user.timeZone} />
        ) : (
          <Notice tone="warning">
            Only the keeper of this tank can import tests into it
            {t.archivedAt ? ', and not while it is archived' : ''}.
          </Notice>
        )}
      </Card>
    </>
  );
}

export const ErrorBoundary = TankRouteError;
