import { useMemo, useState } from 'react';
import { FormProvider, useForm, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import { PARAMETER_KEYS, type ParameterKey } from '../../../../../shared/care/parameters';
import type { CareProfile } from '../../../../../shared/care/profiles';
import { normalizeWaterTest, type NormalizeContext } from '../../../../../shared/readings/normalize-water-test';
import type { TankDetailView } from '../../../../../shared/schemas/tank-views';
import { createWaterTestSchema } from '../../../../../shared/schemas/water-test.schema';
import { Button } from '../../../../components/ui/button';
import { Notice } from '../../../../components/ui/card';
import { TextField } from '../../../../components/ui/field';
import type { UnitPrefs } from '../../lib/display-units';
import { firstParameters, type EntryMemory } from '../../lib/entry-memory';
import { PhotoUploadError } from '../../lib/photo-upload-error';
import { placeServerIssues, schemaResolver } from '../../lib/schema-resolver';
import { draftToInput, isFilled, waterTestFieldOf, type WaterTestDraft } from '../../lib/water-test-draft';
import { ConcernPreview } from './concern-preview';
import { previewDraft } from '../../lib/water-test-preview';
import { PhotoPicker } from '../photo-picker';
import { TextAreaField } from '../text-area-field';
import { ParameterField } from './parameter-field';

export type WaterTestOutput = z.output<typeof createWaterTestSchema>;

export interface WaterTestFormProps {
  tank: Pick<TankDetailView, 'id' | 'systemType' | 'careProfileKey' | 'phase' | 'lastKnown' | 'volumeL' | 'hasLivestock'>;
  profile: CareProfile;
  prefs: UnitPrefs;
  initial: WaterTestDraft;
  memory: EntryMemory;
  /** The test being edited, so it never counts as its own last known value. */
  testId?: string;
  submitLabel?: string;
  /** Throws ApiError (placed on the fields) or PhotoUploadError (the readings are saved, the photo can be retried). */
  onSave: (input: WaterTestOutput, photos: File[], draft: WaterTestDraft) => Promise<void>;
  onSkipPhotos?: () => void;
}

/** The water-test form: fast at the tank on a phone, previewing with the shared normalizer what the server will store. */
export function WaterTestForm({ tank, profile, prefs, initial, memory, testId, submitLabel = 'Save test', onSave, onSkipPhotos }: WaterTestFormProps) {
  const ctx = useMemo<Omit<NormalizeContext, 'now'>>(
    () => ({ systemType: tank.systemType, careProfileKey: tank.careProfileKey, profile, lastKnown: tank.lastKnown, ...(testId ? { testId } : {}) }),
    [tank.systemType, tank.careProfileKey, tank.lastKnown, profile, testId],
  );
  const resolver = useMemo(
    () =>
      schemaResolver<WaterTestDraft, typeof createWaterTestSchema>(createWaterTestSchema, (v) => draftToInput(v, prefs), waterTestFieldOf, (parsed) =>
        normalizeWaterTest(parsed, { ...ctx, now: new Date().toISOString() }).errors,
      ),
    [ctx, prefs],
  );
  const form = useForm<WaterTestDraft, unknown, WaterTestOutput>({ defaultValues: initial, resolver });
  const draft = useWatch({ control: form.control }) as WaterTestDraft;
  const preview = previewDraft(draft, prefs, { ...ctx, now: new Date().toISOString() });

  const first = useMemo(() => {
    const filled = PARAMETER_KEYS.filter((k) => isFilled(initial.entries[k]));
    const wanted = firstParameters(memory, profile, tank.phase);
    return PARAMETER_KEYS.filter((k) => filled.includes(k) || wanted.includes(k));
  }, [initial, memory, profile, tank.phase]);
  const [showAll, setShowAll] = useState(false);
  const shown: ParameterKey[] = showAll ? [...PARAMETER_KEYS] : first;
  const hidden = PARAMETER_KEYS.length - first.length;

  const [photos, setPhotos] = useState<File[]>([]);
  const [formError, setFormError] = useState<string>();
  const [photoError, setPhotoError] = useState<string>();
  const filledCount = PARAMETER_KEYS.filter((k) => isFilled(draft.entries?.[k])).length;
  const liveProblems = Object.keys(preview.fieldErrors).length;

  const submit = form.handleSubmit(async (values) => {
    setFormError(undefined);
    setPhotoError(undefined);
    try {
      await onSave(values, photos, form.getValues());
    } catch (error) {
      if (error instanceof PhotoUploadError) setPhotoError(error.message);
      else setFormError(placeServerIssues(error, waterTestFieldOf, (name, e) => form.setError(name as never, e)));
    }
  });

  return (
    <FormProvider {...form}>
      <form noValidate onSubmit={submit} className="space-y-4">
        {formError ? <Notice tone="error">{formError}</Notice> : null}
        {form.formState.errors.root?.message ? <Notice tone="error">{form.formState.errors.root.message}</Notice> : null}
        <fieldset disabled={photoError !== undefined} className="space-y-4">
          <div className="grid gap-3 sm:grid-cols-2">
            <TextField label="When you tested" type="datetime-local" error={form.formState.errors.takenAt?.message ?? preview.fieldErrors.takenAt} {...form.register('takenAt')} />
          </div>
          {shown.map((k) => (
            <ParameterField key={k} parameter={k} prefs={prefs} profile={profile} normalized={preview.normalized} liveErrors={preview.fieldErrors} />
          ))}
          {hidden > 0 ? (
            <Button type="button" variant="secondary" className="w-full" aria-expanded={showAll} onClick={() => setShowAll((s) => !s)}>
              {showAll ? 'Show only my usual readings' : `More readings (${hidden})`}
            </Button>
          ) : null}
          <ConcernPreview tank={tank} profile={profile} normalized={preview.normalized} />
          <TextAreaField label="Anything else about this test? (optional)" rows={2} error={form.formState.errors.note?.message} {...form.register('note')} />
        </fieldset>
        <PhotoPicker label="Photo (optional)" hint="For example the colour card next to the test tube, in daylight." files={photos} onChange={setPhotos} />
        {photoError !== undefined ? (
          <div className="space-y-3">
            <Notice tone="warning">Your readings are saved. The photo did not upload: {photoError}</Notice>
            <div className="flex flex-wrap gap-2">
              <Button type="submit" busy={form.formState.isSubmitting}>Try the photo again</Button>
              <Button type="button" variant="secondary" onClick={onSkipPhotos}>Carry on without it</Button>
            </div>
          </div>
        ) : (
          <div className="sticky bottom-16 z-10 -mx-4 border-t border-tide-100 bg-white/95 px-4 py-3 backdrop-blur sm:bottom-0 sm:mx-0 sm:rounded-card sm:border-0 sm:shadow-card">
            <p className="mb-2 text-sm text-tide-700" aria-live="polite">
              {liveProblems ? `Fix ${liveProblems === 1 ? 'the reading' : `${liveProblems} readings`} marked in red first.` : filledCount ? `${filledCount} ${filledCount === 1 ? 'reading' : 'readings'} ready to save.` : 'Enter at least one reading.'}
            </p>
            <Button type="submit" className="min-h-14 w-full text-lg" busy={form.formState.isSubmitting}>{submitLabel}</Button>
          </div>
        )}
      </form>
    </FormProvider>
  );
}
