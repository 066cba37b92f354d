import { Can } from '@casl/react';
import { useState } from 'react';
import { asSubject, type AppAbility } from '@shared/abilities';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/card';
import { ApiError } from '@client/lib/api-client';
import { useSaveChecklist, useSignOff, useWithdrawSignOff, type CareSummary } from '../api/care';
import { CautionFor } from '@client/components/ui/cautions';
import { ConfirmButton } from '@client/components/ui/confirm-dialog';

const CHECKS = [
  { key: 'equipmentRunning', label: 'Heater, pump and lights have run for a while without trouble' },
  { key: 'quarantinePlan', label: 'I have a quarantine plan for the new animals' },
  { key: 'foodReady', label: 'Their food is ready (seahorses need frozen or live food several times a day)' },
] as const;

/** The checklist before animals go in, and the mentor's sign-off. */
export function ReadinessPanel({
  readiness,
  clubId,
  tankId,
  ownerId,
}: {
  readiness: CareSummary['readiness'];
  clubId: string;
  tankId: string;
  ownerId: string;
}) {
  const save = useSaveChecklist(clubId, tankId);
  const signOff = useSignOff(clubId, tankId);
  const withdraw = useWithdrawSignOff(clubId, tankId);
  const [error, setError] = useState<string>();
  const tank = asSubject('Tank', { clubId, ownerId });
  const toggle = async (key: (typeof CHECKS)[number]['key'], value: boolean) => {
    setError(undefined);
    try {
      await save.mutateAsync({ ...readiness.checklist, notes: readiness.notes, [key]: value });
    } catch (e) {
      setError(e instanceof ApiError ? e.message : 'Could not save.');
    }
  };
  return (
    <section aria-labelledby="ready-heading" className="space-y-3">
      <h3 id="ready-heading" className="text-sm font-extrabold uppercase tracking-wide text-ink-muted">
        Ready for animals?
      </h3>
      <p
        className={`rounded-xl px-3 py-2 font-bold ${readiness.ready ? 'bg-ok-soft text-ok' : 'bg-tint text-ink-soft'}`}
      >
        {readiness.ready
          ? '✔ Ready: your mentor has signed this tank off.'
          : 'Not ready yet. Every line below needs a tick first.'}
      </p>
      <ul className="space-y-2">
        {readiness.items.map((item) => (
          <li key={item.key} className="flex gap-2 text-sm">
            <span aria-hidden className={`font-extrabold ${item.met ? 'text-ok' : 'text-ink-muted'}`}>
              {item.met ? '✔' : '○'}
            </span>
            <span>
              <strong className="text-ink">{item.label}</strong>
              <span className="sr-only">{item.met ? ' (done)' : ' (not yet)'}</span>
              <span className="block text-ink-muted">{item.detail}</span>
            </span>
          </li>
        ))}
      </ul>
      <Can<AppAbility> I="update" this={tank}>
        <fieldset className="space-y-2 rounded-xl bg-canvas p-3">
          <legend className="text-sm font-bold text-ink-soft">Your checklist</legend>
          {CHECKS.map((c) => (
            <label key={c.key} className="flex min-h-touch items-center gap-3 text-sm text-ink">
              <input
                type="checkbox"
                className="size-5 accent-accent"
                checked={readiness.checklist[c.key]}
                disabled={save.isPending}
                onChange={(e) => void toggle(c.key, e.target.checked)}
              />
              {c.label}
            </label>
          ))}
        </fieldset>
      </Can>
      <Can<AppAbility> I="signOff" this={tank}>
        {readiness.signOff ? (
          <ConfirmButton
            title="Withdraw your sign-off?"
            question="The member will see the tank as not ready for animals until you sign it off again."
            confirmLabel="Withdraw it"
            busy={withdraw.isPending}
            onConfirm={() => withdraw.mutateAsync()}
          >
            Withdraw my sign-off
          </ConfirmButton>
        ) : (
          <Button
            busy={signOff.isPending}
            onClick={async () => {
              setError(undefined);
              try {
                await signOff.mutateAsync({ note: '' });
              } catch (e) {
                setError(e instanceof ApiError ? e.message : 'Could not sign off.');
              }
            }}
          >
            Sign off as ready for animals
          </Button>
        )}
      </Can>
      {error ? <Notice tone="error">{error}</Notice> : null}
      <CautionFor kind="buyingAnimals" title="Before you buy" />
    </section>
  );
}
