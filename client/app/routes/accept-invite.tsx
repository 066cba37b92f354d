import { useNavigate, useSearchParams } from 'react-router';
import { AuthCard } from '@client/components/ui/card';
import { AcceptInviteForm } from '@client/features/auth/components/accept-invite-form';

export function Component() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  return (
    <AuthCard title="Join your club" subtitle="You've been invited to Shoalwise.">
      <AcceptInviteForm
        token={params.get('token') ?? ''}
        onDone={(clubId) => {
          localStorage.setItem('shoalwise.activeClub', clubId);
          navigate('/', { replace: true });
        }}
      />
    </AuthCard>
  );
}
