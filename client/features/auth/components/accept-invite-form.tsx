import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { ROLE_LABELS } from '@shared/constants/roles';
import { newAccountFormSchema } from '@shared/schemas/auth.schema';
import { Button, ButtonLink } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/card';
import { TextField } from '@client/components/ui/field';
import { Loading } from '@client/components/ui/skeleton';
import { ApiError } from '@client/lib/api-client';
import { fieldsIn, useSaveErrors } from '@client/lib/form-errors';
import { useMe } from '../api/me';
import { useInvitePreview } from '../api/invite-preview';
import { useAcceptInvite } from '../api/mutations';

type Input = z.input<typeof newAccountFormSchema>;

export function AcceptInviteForm({ token, onDone }: { token: string; onDone: (clubId: string) => void }) {
  const preview = useInvitePreview(token);
  const me = useMe();
  const accept = useAcceptInvite();
  const { register, handleSubmit, setError, formState } = useForm<Input>({
    resolver: zodResolver(newAccountFormSchema),
  });
  const { formError, attempt } = useSaveErrors(fieldsIn(['displayName', 'password']), setError);

  if (!token)
    return <Notice tone="error">This link is missing its code. Open the link from your e-mail again.</Notice>;
  if (preview.isPending) return <Loading label="Checking your invitation…" />;
  if (preview.isError) {
    const message =
      preview.error instanceof ApiError && preview.error.isNotFound
        ? 'This invitation link is not valid. Check that you copied all of it.'
        : preview.error.message;
    return <Notice tone="error">{message}</Notice>;
  }
  const invite = preview.data;
  const intro = (
    <p className="mb-4 text-ink-soft">
      <strong>{invite.clubName}</strong> invites <strong>{invite.email}</strong> to join as{' '}
      {ROLE_LABELS[invite.role].toLowerCase()}.
    </p>
  );

  const acceptAs = (values?: { displayName: string; password: string }) =>
    attempt(async () => {
      const res = await accept.mutateAsync({ token, ...values });
      onDone(res.clubId);
    });

  if (invite.accountExists) {
    const signedInAsInvitee = me.data?.user.email === invite.email;
    return (
      <div className="space-y-4">
        {intro}
        {formError ? <Notice tone="error">{formError}</Notice> : null}
        {signedInAsInvitee ? (
          <Button className="w-full" busy={accept.isPending} onClick={() => void acceptAs()}>
            Join {invite.clubName}
          </Button>
        ) : (
          <>
            <Notice>
              You already have a Shoalwise account. Sign in as {invite.email}, then open this link again.
            </Notice>
            <ButtonLink
              to={`/sign-in?next=${encodeURIComponent(`/invites/accept?token=${token}`)}`}
              className="w-full"
            >
              Sign in
            </ButtonLink>
          </>
        )}
      </div>
    );
  }

  return (
    <form
      onSubmit={handleSubmit((v) => acceptAs({ displayName: v.displayName, password: v.password }))}
      noValidate
      className="space-y-4"
    >
      {intro}
      {formError ? <Notice tone="error">{formError}</Notice> : null}
      <TextField
        label="Your name"
        autoComplete="name"
        hint="Shown to your club."
        error={formState.errors.displayName?.message}
        {...register('displayName')}
      />
      <TextField
        label="Choose a password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters. A short sentence works well."
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
        Create my account and join
      </Button>
    </form>
  );
}
