import { asSubject } from '@shared/abilities';
import { Notice } from '@client/components/ui/card';
import { useSession } from '@client/features/auth/components/session-provider';
import { TankList } from '@client/features/tanks/components/list/tank-list';
import { TankRouteError } from '@client/features/tanks/components/tank-route-error';

export function Component() {
  const { me, activeClub, ability } = useSession();
  if (!activeClub)
    return (
      <Notice tone="warning">You are not an active member of a club, so there are no tanks to show.</Notice>
    );
  const { clubId } = activeClub;
  return (
    <TankList
      clubId={clubId}
      clubName={activeClub.clubName}
      userId={me.user.id}
      prefs={me.user}
      oversees={activeClub.role !== 'member'}
      canCreate={ability.can('create', asSubject('Tank', { clubId, ownerId: me.user.id }))}
    />
  );
}

export const ErrorBoundary = TankRouteError;
