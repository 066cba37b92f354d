import { useMemo, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { CLINIC_SLOT_MINUTES, MEETUP_KIND_LABELS, MEETUP_KINDS } from '@shared/constants/meetups';
import {
  createMeetupSchema,
  type CreateMeetupInput,
  type UpdateMeetupInput,
} from '@shared/schemas/meetup.schema';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/card';
import { ConfirmDialog } from '@client/components/ui/confirm-dialog';
import { TextAreaField, TextField } from '@client/components/ui/field';
import { SelectField } from '@client/components/ui/select';
import { fieldsIn, useSaveErrors } from '@client/lib/form-errors';
import { schemaResolver } from '@client/lib/schema-resolver';
import { FORM_FIELDS, patchOf, toInput, type MeetupFormValues } from '../lib/meetup-form-values';

export interface HostOption {
  userId: string;
  displayName: string;
}

const fieldOf = fieldsIn(FORM_FIELDS);

/**
 * Plan or change a meetup. Times are the club's wall-clock times (the field says which zone). Changing a meetup
 * that people are expected at asks first, because each of them is e-mailed what changed.
 */
export function MeetupForm({
  initial,
  timeZone,
  hosts,
  expected = 0,
  submitLabel,
  onCreate,
  onUpdate,
}: {
  initial: MeetupFormValues;
  timeZone: string;
  hosts: HostOption[];
  /** People going or waiting: they are told about an edit. */
  expected?: number;
  submitLabel: string;
  onCreate?: (input: CreateMeetupInput) => Promise<unknown>;
  onUpdate?: (patch: UpdateMeetupInput) => Promise<unknown>;
}) {
  const resolver = useMemo(
    () => schemaResolver<MeetupFormValues, typeof createMeetupSchema>(createMeetupSchema, toInput, fieldOf),
    [],
  );
  const form = useForm<MeetupFormValues, unknown, unknown>({ defaultValues: initial, resolver });
  const kind = useWatch({ control: form.control, name: 'kind' });
  const [notice, setNotice] = useState<string>();
  const [confirming, setConfirming] = useState<UpdateMeetupInput | null>(null);
  const [busy, setBusy] = useState(false);
  const { formError, attempt } = useSaveErrors(fieldOf, form.setError);
  const { errors } = form.formState;

  const send = async (run: () => Promise<unknown>) => {
    setNotice(undefined);
    setBusy(true);
    await attempt(run);
    setBusy(false);
    setConfirming(null);
  };

  const submit = form.handleSubmit(() => {
    const values = form.getValues();
    if (onCreate) return send(() => onCreate(toInput(values)));
    const patch = patchOf(values, initial);
    if (Object.keys(patch).length === 0) return setNotice('Nothing has changed yet.');
    if (expected > 0) return setConfirming(patch);
    return send(() => onUpdate!(patch));
  });

  return (
    <form onSubmit={submit} noValidate aria-label={submitLabel} className="space-y-4">
      {(formError ?? notice) ? <Notice tone="error">{formError ?? notice}</Notice> : null}
      <SelectField
        label="Kind of meetup"
        options={MEETUP_KINDS.map((k) => ({ value: k, label: MEETUP_KIND_LABELS[k] }))}
        error={errors.kind?.message}
        {...form.register('kind')}
      />
      <TextField label="Title" error={errors.title?.message} {...form.register('title')} />
      <TextAreaField
        label="What it is about"
        rows={4}
        error={errors.description?.message}
        {...form.register('description')}
      />
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField
          label="Starts"
          type="datetime-local"
          hint={`Club time (${timeZone})`}
          error={errors.startsAt?.message}
          {...form.register('startsAt')}
        />
        <TextField
          label="Ends"
          type="datetime-local"
          hint={`Club time (${timeZone})`}
          error={errors.endsAt?.message}
          {...form.register('endsAt')}
        />
      </div>
      {kind === 'online' ? (
        <TextField
          label="Link to join"
          type="url"
          inputMode="url"
          placeholder="https://"
          error={errors.onlineUrl?.message}
          {...form.register('onlineUrl')}
        />
      ) : (
        <>
          <TextField
            label="Where"
            hint="The address or room, as members should read it."
            error={errors.placeText?.message}
            {...form.register('placeText')}
          />
          <TextField
            label="Map link (optional)"
            type="url"
            inputMode="url"
            placeholder="https://"
            error={errors.mapUrl?.message}
            {...form.register('mapUrl')}
          />
        </>
      )}
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField
          label="Places"
          type="number"
          inputMode="numeric"
          min={1}
          hint="When they are taken, people join a waitlist."
          error={errors.capacity?.message}
          {...form.register('capacity')}
        />
        <SelectField
          label={kind === 'clinic' ? 'Mentor running the clinic' : 'Run by (optional)'}
          options={[
            { value: '', label: kind === 'clinic' ? 'Choose a mentor' : 'Nobody in particular' },
            ...hosts.map((h) => ({ value: h.userId, label: h.displayName })),
          ]}
          error={errors.hostId?.message}
          {...form.register('hostId')}
        />
      </div>
      {kind === 'clinic' ? (
        <TextField
          label="Minutes per sample"
          type="number"
          inputMode="numeric"
          min={CLINIC_SLOT_MINUTES.min}
          max={CLINIC_SLOT_MINUTES.max}
          hint="Members book a slot of this length and say which tank’s water they bring."
          error={errors.slotMinutes?.message}
          {...form.register('slotMinutes')}
        />
      ) : null}
      <Button type="submit" busy={busy && !confirming}>
        {submitLabel}
      </Button>
      <ConfirmDialog
        open={confirming !== null}
        title="Tell everyone about the change?"
        confirmLabel={`Save and e-mail ${expected} ${expected === 1 ? 'person' : 'people'}`}
        busy={busy}
        onConfirm={() => confirming && void send(() => onUpdate!(confirming))}
        onCancel={() => setConfirming(null)}
      >
        <p>
          {expected === 1
            ? 'One person is going or on the waitlist. They get'
            : `${expected} people are going or on the waitlist. Each of them gets`}{' '}
          an e-mail saying what changed, with the updated calendar entry.
        </p>
      </ConfirmDialog>
    </form>
  );
}
