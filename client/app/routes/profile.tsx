import { Card } from '../../components/ui/card';
import { PageHeader } from '../../components/ui/page-header';
import { ProfileForm } from '../../features/auth/components/profile-form';
import { useSession } from '../../features/auth/components/session-provider';

export function Component() {
  const { me } = useSession();
  return (
    <>
      <PageHeader title="Profile and units" subtitle={me.user.email} />
      <Card>
        <ProfileForm user={me.user} />
      </Card>
    </>
  );
}
