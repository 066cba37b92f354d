import { useParams } from 'react-router';
import { asSubject } from '@shared/abilities';
import { useSession } from '@client/features/auth/components/session-provider';
import { useTank } from '@client/features/tanks/api/tanks';

/** What every page about one tank starts from: the session, the tank named in the URL, and that tank's detail. */
export function useTankRoute() {
  const { tankId = '' } = useParams();
  const session = useSession();
  const clubId = session.activeClub?.clubId ?? '';
  const tank = useTank(clubId, tankId);
  const t = tank.data;
  /** Whether the viewer may add or change this kind of record on the tank now: never while it is archived. */
  const mayLog = (action: 'create' | 'update', what: 'Tank' | 'WaterTest' | 'TankEvent') =>
    Boolean(
      t &&
      !t.archivedAt &&
      session.ability.can(action, asSubject(what, { clubId: t.clubId, ownerId: t.owner.id })),
    );
  return { ...session, clubId, tankId, tank, mayLog };
}
