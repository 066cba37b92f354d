import { useMemo, useState } from 'react';
import { useNavigate } from 'react-router';
import { asSubject } from '@shared/abilities';
import { Button } from '@client/components/ui/button';
import { Card, Notice } from '@client/components/ui/card';
import { ConfirmDialog } from '@client/components/ui/confirm-dialog';
import { PageHeader } from '@client/components/ui/page-header';
import { PageSkeleton } from '@client/components/ui/skeleton';
import { useSetArchived } from '@client/features/tanks/api/tanks';
import { TankForm } from '@client/features/tanks/components/tank-form/tank-form';
import { TankLoadError, TankRouteError } from '@client/features/tanks/components/tank-route-error';
import { draftFromTank } from '@client/features/tanks/lib/tank-draft';
import { useTankRoute } from '../use-tank-route';

export function Component() {
  const { me, ability, clubId, tankId, tank } = useTankRoute();
  const archive = useSetArchived(clubId, tankId);
  const navigate = useNavigate();
  const [confirming, setConfirming] = useState(false);
  // The form reads `initial` once, on mount: a later refetch of the tank changes this value but not what is on screen.
  const initial = useMemo(
    () => (tank.data ? draftFromTank(tank.data, me.user) : undefined),
    [tank.data, me.user],
  );

  if (tank.isError) return <TankLoadError error={tank.error} />;
  if (tank.isPending || !initial) return <PageSkeleton label="Loading the tank…" />;
  const t = tank.data;
  const allowed = ability.can('update', asSubject('Tank', { clubId: t.clubId, ownerId: t.owner.id }));
  const open = (message: string) =>
    navigate(`/tanks/${tankId}`, { state: { saved: { message, warnings: [] } } });

  if (!allowed) return <Notice tone="warning">Only the keeper of this tank can change it.</Notice>;
  if (t.archivedAt) {
    return (
      <>
        <PageHeader title={t.name} subtitle="Archived" />
        <Notice tone="info">This tank is archived. Restore it to change its details or log new tests.</Notice>
        <Button
          className="mt-4"
          busy={archive.isPending}
          onClick={() => archive.mutate(false, { onSuccess: () => open('The tank is back in your list.') })}
        >
          Restore the tank
        </Button>
      </>
    );
  }
  return (
    <>
      <PageHeader title={`Edit ${t.name}`} />
      <div className="space-y-6">
        <Card>
          <TankForm
            clubId={clubId}
            tankId={tankId}
            prefs={me.user}
            initial={initial}
            submitLabel="Save changes"
            onSaved={() => open('Changes saved.')}
          />
        </Card>
        <Card>
          <h2 className="text-lg font-extrabold text-ink">Archive this tank</h2>
          <p className="mt-1 text-ink-muted">
            Taken the tank down? Archiving hides it from your list but keeps its whole history. You can
            restore it at any time.
          </p>
          <Button variant="secondary" className="mt-3" onClick={() => setConfirming(true)}>
            Archive…
          </Button>
        </Card>
      </div>
      <ConfirmDialog
        open={confirming}
        title={`Archive ${t.name}?`}
        confirmLabel="Archive it"
        busy={archive.isPending}
        onCancel={() => setConfirming(false)}
        onConfirm={() =>
          archive.mutate(true, {
            onSuccess: () => navigate('/tanks', { replace: true }),
            onSettled: () => setConfirming(false),
          })
        }
      >
        <p>
          Its tests, entries and photos stay, readable by you and your mentor. No new tests can be logged
          until you restore it.
        </p>
        {archive.isError ? <Notice tone="error">{archive.error.message}</Notice> : null}
      </ConfirmDialog>
    </>
  );
}

export const ErrorBoundary = TankRouteError;
