import { Link } from 'react-router';
import { AuthCard } from '@client/components/ui/card';
import { ForgotPasswordForm } from '@client/features/auth/components/password-reset-forms';

export function Component() {
  return (
    <AuthCard title="Forgot your password?" subtitle="We'll e-mail you a link to choose a new one.">
      <ForgotPasswordForm />
      <p className="mt-4 text-center text-sm">
        <Link to="/sign-in" className="font-bold text-link underline">
          Back to sign in
        </Link>
      </p>
    </AuthCard>
  );
}
