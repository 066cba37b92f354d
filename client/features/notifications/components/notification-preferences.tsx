import {
  EMAIL_MODE_LABELS,
  EMAIL_MODES,
  NOTIFICATION_KIND_LABELS,
  NOTIFICATION_KINDS,
  type EmailMode,
  type NotificationKind,
} from '@shared/constants/notifications';
import { Notice } from '@client/components/ui/card';
import { SelectField } from '@client/components/ui/select';
import { Loading } from '@client/components/ui/skeleton';
import { useToast } from '@client/components/ui/toast';
import { usePreferences, useUpdatePreferences } from '../api/notifications';

const OPTIONS = EMAIL_MODES.map((m) => ({ value: m, label: EMAIL_MODE_LABELS[m] }));

/** Which e-mails the person wants, per kind; each change saves at once. In-app notifications always show. */
export function NotificationPreferences() {
  const prefs = usePreferences();
  const update = useUpdatePreferences();
  const toast = useToast();
  const save = (kind: NotificationKind, mode: EmailMode) =>
    update.mutate({ [kind]: mode }, { onSuccess: () => toast.success('E-mail choice saved.') });
  return (
    <section aria-labelledby="email-prefs-heading">
      <h2 id="email-prefs-heading" className="text-lg font-extrabold text-ink">
        E-mails
      </h2>
      <p className="mt-1 text-sm text-ink-muted">
        Everything always shows under the bell. Choose what also reaches your inbox; the digest comes once a
        day, around 7 in the morning your time.
      </p>
      <div className="mt-3 space-y-3" aria-live="polite">
        {update.isError ? <Notice tone="error">Could not save: {update.error.message}</Notice> : null}
      </div>
      {prefs.isPending ? (
        <div className="mt-4">
          <Loading label="Loading…" />
        </div>
      ) : prefs.isError ? (
        <div className="mt-4">
          <Notice tone="error">{prefs.error.message}</Notice>
        </div>
      ) : (
        <div className="mt-4 grid gap-4 sm:grid-cols-2">
          {NOTIFICATION_KINDS.map((kind) => (
            <SelectField
              key={kind}
              label={NOTIFICATION_KIND_LABELS[kind].label}
              hint={NOTIFICATION_KIND_LABELS[kind].hint}
              options={OPTIONS}
              value={prefs.data.preferences[kind]}
              disabled={update.isPending}
              onChange={(e) => save(kind, e.target.value as EmailMode)}
            />
          ))}
        </div>
      )}
    </section>
  );
}
