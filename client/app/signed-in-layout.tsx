import { FullPageLoading } from '@client/components/ui/skeleton';
import { asSubject } from '@shared/abilities';
import { AppShell, type NavItem } from '@client/components/layouts/app-shell';

import { useMe } from '@client/features/auth/api/me';
import { SessionProvider, useSession } from '@client/features/auth/components/session-provider';
import { UserMenu } from '@client/features/auth/components/user-menu';
import { NotificationBell } from '@client/features/notifications/components/notification-bell';
import { useLiveSocket } from '@client/lib/socket';

function ShellForSession() {
  const { me, activeClub, ability } = useSession();
  useLiveSocket(me.user.id);
  const clubId = activeClub?.clubId ?? '';
  const nav: NavItem[] = [
    { to: '/', label: 'Home', end: true },
    { to: '/tanks', label: 'My tanks' },
    ...(activeClub ? [{ to: '/questions', label: 'Questions' }] : []),
    ...(activeClub ? [{ to: '/meetups', label: 'Meetups' }] : []),
    ...(activeClub && activeClub.role !== 'member'
      ? [{ to: '/desk', label: 'Mentor desk', short: 'Desk' }]
      : []),
    ...(activeClub && ability.can('read', asSubject('Club', { id: clubId }))
      ? [{ to: '/club', label: 'Club' }]
      : []),
  ];
  return (
    <AppShell
      nav={nav}
      headerEnd={
        <div className="flex items-center gap-1">
          <NotificationBell />
          <UserMenu />
        </div>
      }
    />
  );
}

export function SignedInLayout() {
  const { data: me } = useMe();
  if (!me) return <FullPageLoading />;
  return (
    <SessionProvider me={me}>
      <ShellForSession />
    </SessionProvider>
  );
}
