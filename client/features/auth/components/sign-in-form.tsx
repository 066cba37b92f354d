import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router';
import type { z } from 'zod';
import { signInSchema } from '@shared/schemas/auth.schema';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/card';
import { TextField } from '@client/components/ui/field';
import { fieldsIn, useSaveErrors } from '@client/lib/form-errors';
import { useSignIn } from '../api/mutations';

type Input = z.input<typeof signInSchema>;

export function SignInForm({ onDone }: { onDone: () => void }) {
  const signIn = useSignIn();
  const { register, handleSubmit, setError, formState } = useForm<
    Input,
    unknown,
    z.output<typeof signInSchema>
  >({
    resolver: zodResolver(signInSchema),
  });
  const { formError, attempt } = useSaveErrors(fieldsIn(['email', 'password']), setError);
  const submit = handleSubmit((values) =>
    attempt(async () => {
      await signIn.mutateAsync(values);
      onDone();
    }),
  );
  return (
    <form onSubmit={submit} noValidate className="space-y-4">
      {formError ? <Notice tone="error">{formError}</Notice> : null}
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        inputMode="email"
        error={formState.errors.email?.message}
        {...register('email')}
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        error={formState.errors.password?.message}
        {...register('password')}
      />
      <Button type="submit" busy={formState.isSubmitting} className="w-full">
        Sign in
      </Button>
      <p className="text-center text-sm">
        <Link to="/forgot-password" className="font-bold text-link underline">
          Forgot your password?
        </Link>
      </p>
    </form>
  );
}
