import { useMemo, useState } from 'react';
import { FormProvider, useForm, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import { TANK_EVENT_KIND_LABELS } from '@shared/constants/tank-labels';
import { createTankEventSchema } from '@shared/schemas/tank-event.schema';
import type { LivestockView } from '@shared/schemas/tank-views';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/card';
import { TextAreaField, TextField } from '@client/components/ui/field';
import { PhotoPicker } from '@client/components/ui/photo-picker';
import { PhotoRetry } from '@client/components/ui/photo-retry';
import { Choice } from '@client/components/ui/choice';
import type { UnitPrefs } from '@client/lib/display-units';
import { useSaveErrors } from '@client/lib/form-errors';
import type { SavedNotice } from '@client/lib/saved-notice';
import { schemaResolver } from '@client/lib/schema-resolver';
import { useSaveTankEvent } from '../../api/events';
import {
  eventDraftToInput,
  eventFieldOf,
  POSTED_KINDS,
  type EventDraft,
  type PostedKind,
} from '../../lib/event-draft';
import { KindIcon } from '../kind-icon';
import { DoseFields, EquipmentFields, FeedingFields, WaterChangeFields } from './event-kind-fields';
import { ObservationFields } from './observation-fields';

export type EventOutput = z.output<typeof createTankEventSchema>;

/** A timeline entry other than a test, checked with the shared event schema for its kind, then saved with its photo. */
export function EventForm({
  clubId,
  tankId,
  prefs,
  tankLitres,
  livestock,
  initial,
  onKindChange,
  onSaved,
}: {
  clubId: string;
  tankId: string;
  prefs: UnitPrefs;
  tankLitres: number;
  livestock: LivestockView[];
  initial: EventDraft;
  onKindChange: (kind: PostedKind) => void;
  onSaved: (notice: SavedNotice) => void;
}) {
  const resolver = useMemo(
    () =>
      schemaResolver<EventDraft, typeof createTankEventSchema>(
        createTankEventSchema,
        (v) => eventDraftToInput(v, prefs),
        (path, v) => eventFieldOf(v.kind)(path),
      ),
    [prefs],
  );
  const form = useForm<EventDraft, unknown, EventOutput>({ defaultValues: initial, resolver });
  const kind = useWatch({ control: form.control, name: 'kind' });
  const [photos, setPhotos] = useState<File[]>([]);
  const save = useSaveTankEvent(clubId, tankId);
  const { formError, photoError, attempt } = useSaveErrors(eventFieldOf(kind), form.setError);
  const e = form.formState.errors;

  // Without photos once the entry is stored and its photo failed: "carry on without it".
  const submit = (withPhotos: boolean) =>
    form.handleSubmit((values) => attempt(async () => onSaved(await save(values, withPhotos ? photos : []))));

  return (
    <FormProvider {...form}>
      <form noValidate onSubmit={submit(true)} className="space-y-5">
        {formError ? <Notice tone="error">{formError}</Notice> : null}
        {e.root?.message ? <Notice tone="error">{e.root.message}</Notice> : null}
        <fieldset disabled={photoError !== undefined} className="space-y-5">
          <div role="radiogroup" aria-label="What to log" className="grid grid-cols-2 gap-2 sm:grid-cols-5">
            {POSTED_KINDS.map((k) => (
              <Choice
                key={k}
                shape="big-tile"
                value={k}
                {...form.register('kind', {
                  onChange: (ev: { target: { value: PostedKind } }) => onKindChange(ev.target.value),
                })}
              >
                <KindIcon kind={k} /> {TANK_EVENT_KIND_LABELS[k]}
              </Choice>
            ))}
          </div>
          <div className="grid gap-3 sm:grid-cols-2">
            <TextField
              label="When"
              type="datetime-local"
              error={e.occurredAt?.message}
              {...form.register('occurredAt')}
            />
          </div>
          {kind === 'water-change' ? <WaterChangeFields prefs={prefs} tankLitres={tankLitres} /> : null}
          {kind === 'supplement-dose' ? <DoseFields /> : null}
          {kind === 'feeding-note' ? <FeedingFields /> : null}
          {kind === 'equipment-change' ? <EquipmentFields /> : null}
          {kind === 'observation' ? <ObservationFields livestock={livestock} /> : null}
          <TextAreaField
            label="Note (optional)"
            rows={2}
            error={e.note?.message}
            {...form.register('note')}
          />
        </fieldset>
        <PhotoPicker
          label="Photo (optional)"
          hint={kind === 'observation' ? 'A clear picture helps your mentor see what you see.' : undefined}
          files={photos}
          onChange={setPhotos}
        />
        {photoError !== undefined ? (
          <PhotoRetry
            saved="The entry is saved."
            error={photoError}
            busy={form.formState.isSubmitting}
            onSkip={submit(false)}
          />
        ) : (
          <Button
            type="submit"
            className="min-h-14 w-full text-lg sm:w-auto"
            busy={form.formState.isSubmitting}
          >
            Save {TANK_EVENT_KIND_LABELS[kind].toLowerCase()}
          </Button>
        )}
      </form>
    </FormProvider>
  );
}
