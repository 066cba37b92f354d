import { useMemo, useState } from 'react';
import { FormProvider, useForm, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import { defaultProfileFor } from '../../../../../shared/care/profiles';
import { SYSTEM_TYPES, type SystemType } from '../../../../../shared/care/system-types';
import { SYSTEM_TYPE_LABELS, TANK_PHASE_LABELS } from '../../../../../shared/constants/tank-labels';
import { createTankSchema, TANK_PHASES } from '../../../../../shared/schemas/tank.schema';
import { Button } from '../../../../components/ui/button';
import { Notice } from '../../../../components/ui/card';
import { SelectField, TextField } from '../../../../components/ui/field';
import { useCareProfiles } from '../../api/care-profiles';
import type { UnitPrefs } from '../../lib/display-units';
import { todayIsoDate } from '../../lib/form-values';
import { PhotoUploadError } from '../../lib/photo-upload-error';
import { placeServerIssues, schemaResolver } from '../../lib/schema-resolver';
import { tankDraftToInput, tankFieldOf, type TankDraft } from '../../lib/tank-draft';
import { PhotoPicker } from '../photo-picker';
import { TankCaution } from '../safety';
import { TextAreaField } from '../text-area-field';
import { VolumeFields } from './volume-fields';

export type TankOutput = z.output<typeof createTankSchema>;

/** New or edited tank, checked with the shared tank schema before anything is sent. */
export function TankForm({ clubId, prefs, initial, submitLabel, onSave, onSkipPhotos }: { clubId: string; prefs: UnitPrefs; initial: TankDraft; submitLabel: string; onSave: (input: TankOutput, photos: File[]) => Promise<void>; onSkipPhotos?: () => void }) {
  const resolver = useMemo(() => schemaResolver<TankDraft, typeof createTankSchema>(createTankSchema, tankDraftToInput, tankFieldOf), []);
  const form = useForm<TankDraft, unknown, TankOutput>({ defaultValues: initial, resolver });
  const { register, formState, setValue } = form;
  const systemType = useWatch({ control: form.control, name: 'systemType' });
  const profiles = useCareProfiles(clubId);
  const suitable = (profiles.data ?? []).filter((p) => p.systemTypes.includes(systemType));
  const [photos, setPhotos] = useState<File[]>([]);
  const [formError, setFormError] = useState<string>();
  const [photoError, setPhotoError] = useState<string>();
  const e = formState.errors;

  const systemField = register('systemType', {
    onChange: (ev: { target: { value: SystemType } }) => {
      const chosen = profiles.data?.find((p) => p.key === form.getValues('careProfileKey'));
      if (!chosen?.systemTypes.includes(ev.target.value)) setValue('careProfileKey', defaultProfileFor(ev.target.value).key);
    },
  });

  const submit = form.handleSubmit(async (values) => {
    setFormError(undefined);
    setPhotoError(undefined);
    try {
      await onSave(values, photos);
    } catch (error) {
      if (error instanceof PhotoUploadError) setPhotoError(error.message);
      else setFormError(placeServerIssues(error, tankFieldOf, (name, err) => form.setError(name as never, err)));
    }
  });

  return (
    <FormProvider {...form}>
      <form noValidate onSubmit={submit} className="space-y-6">
        {formError ? <Notice tone="error">{formError}</Notice> : null}
        {e.root?.message ? <Notice tone="error">{e.root.message}</Notice> : null}
        <fieldset disabled={photoError !== undefined} className="space-y-6">
          <div className="grid gap-4 sm:grid-cols-2">
            <TextField label="Name" autoComplete="off" hint="Whatever you call it, e.g. Living-room reef." error={e.name?.message} {...register('name')} />
            <SelectField label="Kind of tank" options={SYSTEM_TYPES.map((t) => ({ value: t, label: SYSTEM_TYPE_LABELS[t] }))} error={e.systemType?.message} {...systemField} />
            <SelectField
              label="Care profile"
              hint="The ideal ranges your readings are checked against. Your club may have its own."
              options={(suitable.length ? suitable : [{ key: form.getValues('careProfileKey'), name: profiles.isPending ? 'Loading…' : form.getValues('careProfileKey') }]).map((p) => ({
                value: p.key,
                label: p.key === defaultProfileFor(systemType).key ? `${p.name} (usual)` : p.name,
              }))}
              error={e.careProfileKey?.message}
              {...register('careProfileKey')}
            />
          </div>
          <VolumeFields prefs={prefs} />
          <fieldset className="space-y-3">
            <legend className="text-sm font-extrabold uppercase tracking-wide text-tide-600">Where it is at</legend>
            <div className="grid gap-4 sm:grid-cols-2">
              <TextField label="Set up on (optional)" type="date" max={todayIsoDate()} error={e.setUpOn?.message} {...register('setUpOn')} />
            </div>
            <div role="radiogroup" aria-label="Cycling or established" className="grid gap-2 sm:grid-cols-2">
              {TANK_PHASES.map((p) => (
                <label key={p} className="flex min-h-touch cursor-pointer gap-3 rounded-xl p-3 ring-1 ring-tide-200 has-[:checked]:bg-tide-50 has-[:checked]:ring-2 has-[:checked]:ring-tide-600">
                  <input type="radio" value={p} className="mt-1 size-5 accent-tide-700" {...register('phase')} />
                  <span>
                    <span className="block font-bold text-tide-900">{TANK_PHASE_LABELS[p].label}</span>
                    <span className="block text-sm text-tide-700">{TANK_PHASE_LABELS[p].hint}</span>
                  </span>
                </label>
              ))}
            </div>
          </fieldset>
          <div className="space-y-2">
            <TextAreaField label="Equipment notes (optional)" hint="Heater, filter, lights, pumps, skimmer: what runs and when it was last serviced." error={e.equipmentNotes?.message} {...register('equipmentNotes')} />
            <TankCaution kind="electricity" title="Safety" />
          </div>
        </fieldset>
        <PhotoPicker label="Photo of the tank (optional)" files={photos} onChange={setPhotos} />
        {photoError !== undefined ? (
          <div className="space-y-3">
            <Notice tone="warning">The tank is saved. The photo did not upload: {photoError}</Notice>
            <div className="flex flex-wrap gap-2">
              <Button type="submit" busy={formState.isSubmitting}>Try the photo again</Button>
              <Button type="button" variant="secondary" onClick={onSkipPhotos}>Carry on without it</Button>
            </div>
          </div>
        ) : (
          <Button type="submit" className="w-full sm:w-auto" busy={formState.isSubmitting}>{submitLabel}</Button>
        )}
      </form>
    </FormProvider>
  );
}
