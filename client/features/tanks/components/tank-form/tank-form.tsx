import { useMemo, useState } from 'react';
import { FormProvider, useForm, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import type { TankDetailView } from '@shared/schemas/tank-views';
import { defaultProfileFor } from '@shared/care/profiles';
import { SYSTEM_TYPES, type SystemType } from '@shared/care/system-types';
import { SYSTEM_TYPE_LABELS, TANK_PHASE_LABELS } from '@shared/constants/tank-labels';
import { createTankSchema, TANK_PHASES } from '@shared/schemas/tank.schema';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/card';
import { TextAreaField, TextField } from '@client/components/ui/field';
import { SelectField } from '@client/components/ui/select';
import { CautionFor } from '@client/components/ui/cautions';
import { PhotoPicker } from '@client/components/ui/photo-picker';
import { PhotoRetry } from '@client/components/ui/photo-retry';
import { useProfiles } from '@client/lib/care-profiles';
import type { UnitPrefs } from '@client/lib/display-units';
import { useSaveErrors } from '@client/lib/form-errors';
import { todayIsoDate } from '@client/lib/form-values';
import { schemaResolver } from '@client/lib/schema-resolver';
import { useSaveTank } from '../../api/tanks';
import { tankDraftToInput, tankFieldOf, type TankDraft } from '../../lib/tank-draft';
import { VolumeFields } from './volume-fields';

export type TankOutput = z.output<typeof createTankSchema>;

/**
 * New or edited tank (`tankId` given), checked with the shared tank schema before anything is sent, then saved with
 * its photo; `onSaved` gets the stored tank.
 */
export function TankForm({
  clubId,
  tankId,
  prefs,
  initial,
  submitLabel,
  onSaved,
}: {
  clubId: string;
  tankId?: string;
  prefs: UnitPrefs;
  initial: TankDraft;
  submitLabel: string;
  onSaved: (tank: TankDetailView) => void;
}) {
  const resolver = useMemo(
    () => schemaResolver<TankDraft, typeof createTankSchema>(createTankSchema, tankDraftToInput, tankFieldOf),
    [],
  );
  const form = useForm<TankDraft, unknown, TankOutput>({ defaultValues: initial, resolver });
  const { register, formState, setValue } = form;
  const systemType = useWatch({ control: form.control, name: 'systemType' });
  const profiles = useProfiles(clubId);
  const suitable = (profiles.data?.profiles ?? []).filter((p) => p.systemTypes.includes(systemType));
  const [photos, setPhotos] = useState<File[]>([]);
  const save = useSaveTank(clubId, tankId);
  const { formError, photoError, attempt } = useSaveErrors(tankFieldOf, form.setError);
  const e = formState.errors;

  const systemField = register('systemType', {
    onChange: (ev: { target: { value: SystemType } }) => {
      const chosen = profiles.data?.profiles.find((p) => p.key === form.getValues('careProfileKey'));
      if (!chosen?.systemTypes.includes(ev.target.value))
        setValue('careProfileKey', defaultProfileFor(ev.target.value).key);
    },
  });

  // Without photos once the tank is stored and its photo failed: "carry on without it".
  const submit = (withPhotos: boolean) =>
    form.handleSubmit((values) => attempt(async () => onSaved(await save(values, withPhotos ? photos : []))));

  return (
    <FormProvider {...form}>
      <form noValidate onSubmit={submit(true)} className="space-y-6">
        {formError ? <Notice tone="error">{formError}</Notice> : null}
        {e.root?.message ? <Notice tone="error">{e.root.message}</Notice> : null}
        <fieldset disabled={photoError !== undefined} className="space-y-6">
          <div className="grid gap-4 sm:grid-cols-2">
            <TextField
              label="Name"
              autoComplete="off"
              hint="Whatever you call it, e.g. Living-room reef."
              error={e.name?.message}
              {...register('name')}
            />
            <SelectField
              label="Kind of tank"
              options={SYSTEM_TYPES.map((t) => ({ value: t, label: SYSTEM_TYPE_LABELS[t] }))}
              error={e.systemType?.message}
              {...systemField}
            />
            <SelectField
              label="Care profile"
              hint="The ideal ranges your readings are checked against. Your club may have its own."
              options={(suitable.length
                ? suitable
                : [
                    {
                      key: form.getValues('careProfileKey'),
                      name: profiles.isPending ? 'Loading…' : form.getValues('careProfileKey'),
                    },
                  ]
              ).map((p) => ({
                value: p.key,
                label: p.key === defaultProfileFor(systemType).key ? `${p.name} (usual)` : p.name,
              }))}
              error={e.careProfileKey?.message}
              {...register('careProfileKey')}
            />
          </div>
          <VolumeFields prefs={prefs} />
          <fieldset className="space-y-3">
            <legend className="text-sm font-extrabold uppercase tracking-wide text-ink-muted">
              Where it is at
            </legend>
            <div className="grid gap-4 sm:grid-cols-2">
              <TextField
                label="Set up on (optional)"
                type="date"
                max={todayIsoDate()}
                error={e.setUpOn?.message}
                {...register('setUpOn')}
              />
            </div>
            <div role="radiogroup" aria-label="Cycling or established" className="grid gap-2 sm:grid-cols-2">
              {TANK_PHASES.map((p) => (
                <label
                  key={p}
                  className="flex min-h-touch cursor-pointer gap-3 rounded-xl p-3 ring-1 ring-line-strong has-[:checked]:bg-tint has-[:checked]:ring-2 has-[:checked]:ring-focus"
                >
                  <input
                    type="radio"
                    value={p}
                    className="mt-1 size-5 accent-accent"
                    {...register('phase')}
                  />
                  <span>
                    <span className="block font-bold text-ink">{TANK_PHASE_LABELS[p].label}</span>
                    <span className="block text-sm text-ink-muted">{TANK_PHASE_LABELS[p].hint}</span>
                  </span>
                </label>
              ))}
            </div>
          </fieldset>
          <div className="space-y-2">
            <TextAreaField
              label="Equipment notes (optional)"
              hint="Heater, filter, lights, pumps, skimmer: what runs and when it was last serviced."
              error={e.equipmentNotes?.message}
              {...register('equipmentNotes')}
            />
            <CautionFor kind="electricity" title="Safety" />
          </div>
        </fieldset>
        <PhotoPicker label="Photo of the tank (optional)" files={photos} onChange={setPhotos} />
        {photoError !== undefined ? (
          <PhotoRetry
            saved="The tank is saved."
            error={photoError}
            busy={formState.isSubmitting}
            onSkip={submit(false)}
          />
        ) : (
          <Button type="submit" className="w-full sm:w-auto" busy={formState.isSubmitting}>
            {submitLabel}
          </Button>
        )}
      </form>
    </FormProvider>
  );
}
