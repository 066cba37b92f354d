import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { requestPasswordResetSchema, resetPasswordFormSchema } from '@shared/schemas/auth.schema';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/card';
import { TextField } from '@client/components/ui/field';
import { fieldsIn, useSaveErrors } from '@client/lib/form-errors';
import { useRequestPasswordReset, useResetPassword } from '../api/mutations';

export function ForgotPasswordForm() {
  const request = useRequestPasswordReset();
  const { register, handleSubmit, setError, formState } = useForm<
    z.input<typeof requestPasswordResetSchema>,
    unknown,
    z.output<typeof requestPasswordResetSchema>
  >({
    resolver: zodResolver(requestPasswordResetSchema),
  });
  const { formError, attempt } = useSaveErrors(fieldsIn(['email']), setError);
  if (request.isSuccess)
    return (
      <Notice tone="success">{request.data.message} Check your inbox; the link works for 30 minutes.</Notice>
    );
  return (
    <form
      noValidate
      className="space-y-4"
      onSubmit={handleSubmit((v) => attempt(() => request.mutateAsync(v.email)))}
    >
      {formError ? <Notice tone="error">{formError}</Notice> : null}
      <TextField
        label="Your e-mail"
        type="email"
        autoComplete="email"
        inputMode="email"
        error={formState.errors.email?.message}
        {...register('email')}
      />
      <Button type="submit" className="w-full" busy={formState.isSubmitting}>
        Send me a reset link
      </Button>
    </form>
  );
}

export function ResetPasswordForm({ token, onDone }: { token: string; onDone: () => void }) {
  const reset = useResetPassword();
  const { register, handleSubmit, setError, formState } = useForm<z.input<typeof resetPasswordFormSchema>>({
    resolver: zodResolver(resetPasswordFormSchema),
  });
  const { formError, attempt } = useSaveErrors(fieldsIn(['password']), setError);
  if (!token)
    return <Notice tone="error">This link is missing its code. Open the link from your e-mail again.</Notice>;
  return (
    <form
      noValidate
      className="space-y-4"
      onSubmit={handleSubmit((v) =>
        attempt(async () => {
          await reset.mutateAsync({ token, password: v.password });
          onDone();
        }),
      )}
    >
      {formError ? <Notice tone="error">{formError}</Notice> : null}
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters. This signs you out on every other device."
        error={formState.errors.password?.message}
        {...register('password')}
      />
      <TextField
        label="Type it again"
        type="password"
        autoComplete="new-password"
        error={formState.errors.confirmPassword?.message}
        {...register('confirmPassword')}
      />
      <Button type="submit" className="w-full" busy={formState.isSubmitting}>
        Save my new password
      </Button>
    </form>
  );
}
