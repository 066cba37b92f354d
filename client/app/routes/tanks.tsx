import { asSubject } from '../../../shared/abilities';
import { Notice } from '../../components/ui/card';
import { useSession } from '../../features/auth/components/session-provider';
import { TankList } from '../../features/tanks/components/list/tank-list';
import { TankRouteError } from '../../features/tanks/components/tank-route-error';

export function Component() {
  const { me, activeClub, ability } = useSession();
  if (!activeClub) return <Notice tone="warning">You are not an active member of a club, so there are no tanks to show.</Notice>;
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
