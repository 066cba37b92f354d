import { Card } from '@client/components/ui/card';
import { PageHeader } from '@client/components/ui/page-header';
import { ProfileForm } from '@client/features/auth/components/profile-form';
import { useSession } from '@client/features/auth/components/session-provider';
import { NotificationPreferences } from '@client/features/notifications/components/notification-preferences';

export function Component() {
  const { me } = useSession();
  return (
    <>
      <PageHeader title="Profile and units" subtitle={me.user.email} />
      <Card>
        <ProfileForm user={me.user} />
      </Card>
      <Card className="mt-5">
        <NotificationPreferences />
      </Card>
    </>
  );
}
