import { useParams } from 'react-router';
import { useSession } from '@client/features/auth/components/session-provider';
import { useTank } from '@client/features/tanks/api/tanks';

/** What every page about one tank starts from: the session, the tank named in the URL, and that tank's detail. */
export function useTankRoute() {
  const { tankId = '' } = useParams();
  const session = useSession();
  const clubId = session.activeClub?.clubId ?? '';
  const tank = useTank(clubId, tankId);
  return { ...session, clubId, tankId, tank };
}
