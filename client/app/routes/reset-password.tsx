import { useNavigate, useSearchParams } from 'react-router';
import { AuthCard } from '@client/components/ui/card';
import { ResetPasswordForm } from '@client/features/auth/components/password-reset-forms';

export function Component() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  return (
    <AuthCard title="Choose a new password">
      <ResetPasswordForm token={params.get('token') ?? ''} onDone={() => navigate('/', { replace: true })} />
    </AuthCard>
  );
}
