import { useNavigate, useSearchParams } from 'react-router';
import { AuthCard } from '@client/components/ui/card';
import { SignInForm } from '@client/features/auth/components/sign-in-form';

/** Only same-site paths: a `next` pointing elsewhere is ignored. */
function safeNext(next: string | null): string {
  return next && next.startsWith('/') && !next.startsWith('//') ? next : '/';
}

export function Component() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  return (
    <AuthCard title="Sign in" subtitle="Welcome back to your club.">
      <SignInForm onDone={() => navigate(safeNext(params.get('next')), { replace: true })} />
    </AuthCard>
  );
}
