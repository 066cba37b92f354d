import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { ROLE_LABELS, ROLES } from '@shared/constants/roles';
import { createInviteSchema } from '@shared/schemas/club.schema';
import { Button } from '@client/components/ui/button';
import { Card, Notice } from '@client/components/ui/card';
import { TextField } from '@client/components/ui/field';
import { SelectField } from '@client/components/ui/select';
import { Loading } from '@client/components/ui/skeleton';
import { ConfirmButton } from '@client/components/ui/confirm-dialog';
import { formatDay } from '@client/lib/date-format';
import { fieldsIn, placeServerErrors } from '@client/lib/form-errors';
import { useInvites, useResendInvite, useRevokeInvite, useSendInvite } from '../api/club';

export function InvitePanel({ clubId }: { clubId: string }) {
  const invites = useInvites(clubId, true);
  const send = useSendInvite(clubId);
  const resend = useResendInvite(clubId);
  const revoke = useRevokeInvite(clubId);
  const [notice, setNotice] = useState<{ tone: 'success' | 'error'; text: string }>();
  const { register, handleSubmit, setError, reset, formState } = useForm<
    z.input<typeof createInviteSchema>,
    unknown,
    z.output<typeof createInviteSchema>
  >({
    resolver: zodResolver(createInviteSchema),
    defaultValues: { role: 'member' },
  });

  return (
    <Card>
      <h2 className="text-lg font-extrabold text-ink">Invite someone</h2>
      <form
        noValidate
        className="mt-3 grid gap-3 sm:grid-cols-[1fr_12rem_auto] sm:items-end"
        onSubmit={handleSubmit(async (v) => {
          setNotice(undefined);
          try {
            await send.mutateAsync(v);
            setNotice({ tone: 'success', text: `Invitation sent to ${v.email}.` });
            reset({ email: '', role: v.role });
          } catch (e) {
            const message = placeServerErrors(e, fieldsIn(['email', 'role']), setError);
            if (message) setNotice({ tone: 'error', text: message });
          }
        })}
      >
        <TextField
          label="E-mail"
          type="email"
          inputMode="email"
          error={formState.errors.email?.message}
          {...register('email')}
        />
        <SelectField
          label="As"
          options={ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }))}
          {...register('role')}
        />
        <Button type="submit" busy={formState.isSubmitting}>
          Send invite
        </Button>
      </form>
      {notice ? (
        <div className="mt-3">
          <Notice tone={notice.tone}>{notice.text}</Notice>
        </div>
      ) : null}

      <h3 className="mt-6 text-sm font-extrabold uppercase tracking-wide text-ink-muted">
        Waiting for an answer
      </h3>
      {invites.isPending ? (
        <Loading label="Loading…" />
      ) : invites.isError ? (
        <Notice tone="error">{invites.error.message}</Notice>
      ) : invites.data.invites.length === 0 ? (
        <p className="mt-2 text-ink-muted">No open invitations.</p>
      ) : (
        <ul className="mt-2 divide-y divide-line">
          {invites.data.invites.map((i) => (
            <li key={i.id} className="flex flex-wrap items-center justify-between gap-2 py-3">
              <div>
                <p className="font-bold text-ink">{i.email}</p>
                <p className="text-sm text-ink-muted">
                  {ROLE_LABELS[i.role]} ·{' '}
                  {i.state === 'expired' ? 'expired' : `link works until ${formatDay(i.expiresAt)}`}
                </p>
              </div>
              <div className="flex gap-2">
                <Button
                  variant="secondary"
                  busy={resend.isPending && resend.variables === i.id}
                  onClick={() =>
                    resend.mutate(i.id, {
                      onSuccess: () =>
                        setNotice({
                          tone: 'success',
                          text: `Sent a fresh link to ${i.email}. The old link no longer works.`,
                        }),
                    })
                  }
                >
                  Resend
                </Button>
                <ConfirmButton
                  title="Withdraw this invitation?"
                  question={`The link in ${i.email}'s e-mail will stop working. You can invite them again later.`}
                  confirmLabel="Withdraw it"
                  busy={revoke.isPending && revoke.variables === i.id}
                  onConfirm={() => revoke.mutateAsync(i.id)}
                >
                  Withdraw
                </ConfirmButton>
              </div>
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}
