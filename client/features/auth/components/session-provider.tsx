import { AbilityProvider } from '@casl/react';
import { createContext, useContext, useMemo, useState, type ReactNode } from 'react';
import { createAbility, unpackAbilityRules, type AppAbility } from '@shared/abilities';
import type { Me, MeMembership } from '../api/me';

interface Session {
  me: Me;
  ability: AppAbility;
  activeClub: MeMembership | undefined;
  setActiveClubId(clubId: string): void;
}

const SessionContext = createContext<Session | null>(null);
const ACTIVE_CLUB_KEY = 'shoalwise.activeClub';

/** The signed-in person, their rules (the server's, unpacked: never a second copy) and the club they are looking at. */
export function SessionProvider({ me, children }: { me: Me; children: ReactNode }) {
  const ability = useMemo(() => createAbility(unpackAbilityRules(me.rules)), [me.rules]);
  const [activeClubId, setActive] = useState(() => localStorage.getItem(ACTIVE_CLUB_KEY));
  const active = me.memberships.filter((m) => m.status === 'active');
  const activeClub = active.find((m) => m.clubId === activeClubId) ?? active[0];
  const value = useMemo<Session>(
    () => ({
      me,
      ability,
      activeClub,
      setActiveClubId(clubId) {
        localStorage.setItem(ACTIVE_CLUB_KEY, clubId);
        setActive(clubId);
      },
    }),
    [me, ability, activeClub],
  );
  return (
    <SessionContext.Provider value={value}>
      <AbilityProvider value={ability}>{children}</AbilityProvider>
    </SessionContext.Provider>
  );
}

export function useSession(): Session {
  const s = useContext(SessionContext);
  if (!s) throw new Error('useSession outside SessionProvider');
  return s;
}
