import { useMemo } from 'react';
import { useNavigate } from 'react-router';
import { asSubject } from '@shared/abilities';
import { defaultProfileFor } from '@shared/care/profiles';
import { SYSTEM_TYPES } from '@shared/care/system-types';
import { Card, Notice } from '@client/components/ui/card';
import { PageHeader } from '@client/components/ui/page-header';
import { useSession } from '@client/features/auth/components/session-provider';
import { TankForm } from '@client/features/tanks/components/tank-form/tank-form';
import { TankRouteError } from '@client/features/tanks/components/tank-route-error';
import { newTankDraft } from '@client/features/tanks/lib/tank-draft';

export function Component() {
  const { me, activeClub, ability } = useSession();
  const clubId = activeClub?.clubId ?? '';
  const navigate = useNavigate();
  const initial = useMemo(
    () => newTankDraft(me.user, SYSTEM_TYPES[0], defaultProfileFor(SYSTEM_TYPES[0]).key),
    [me.user],
  );
  if (!activeClub || !ability.can('create', asSubject('Tank', { clubId, ownerId: me.user.id }))) {
    return <Notice tone="warning">You need to be an active member of a club to add a tank.</Notice>;
  }
  return (
    <>
      <PageHeader title="Add a tank" subtitle="You can change all of this later." />
      <Card>
        <TankForm
          clubId={clubId}
          prefs={me.user}
          initial={initial}
          submitLabel="Add the tank"
          onSaved={(tank) =>
            navigate(`/tanks/${tank.id}`, {
              replace: true,
              state: {
                saved: {
                  message: 'Tank added. Log your first water test whenever you are ready.',
                  warnings: [],
                },
              },
            })
          }
        />
      </Card>
    </>
  );
}

export const ErrorBoundary = TankRouteError;
