import { useMemo, useState } from 'react';
import { FormProvider, useForm, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import { PARAMETER_KEYS, type ParameterKey } from '@shared/care/parameters';
import type { LastKnown } from '@shared/care';
import type { CareProfile } from '@shared/care/profiles';
import { normalizeWaterTest, type NormalizeContext } from '@shared/readings/normalize-water-test';
import type { TankDetailView, WaterTestView } from '@shared/schemas/tank-views';
import { createWaterTestSchema } from '@shared/schemas/water-test.schema';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/card';
import { TextAreaField, TextField } from '@client/components/ui/field';
import { PhotoPicker } from '@client/components/ui/photo-picker';
import { PhotoRetry } from '@client/components/ui/photo-retry';
import type { UnitPrefs } from '@client/lib/display-units';
import { useSaveErrors } from '@client/lib/form-errors';
import type { SavedNotice } from '@client/lib/saved-notice';
import { schemaResolver } from '@client/lib/schema-resolver';
import { useSaveWaterTest } from '../../api/water-tests';
import { firstParameters, type EntryMemory } from '../../lib/entry-memory';
import { draftToInput, isFilled, waterTestFieldOf, type WaterTestDraft } from '../../lib/water-test-draft';
import { previewDraft } from '../../lib/water-test-preview';
import { ConcernPreview } from './concern-preview';
import { ParameterField } from './parameter-field';

const NONE: readonly ParameterKey[] = [];

export type WaterTestOutput = z.output<typeof createWaterTestSchema>;

export interface WaterTestFormProps {
  clubId: string;
  tank: Pick<TankDetailView, 'id' | 'systemType' | 'careProfileKey' | 'phase' | 'volumeL' | 'hasLivestock'>;
  /**
   * What a temperature, pH or salinity the test lacks falls back on, as the server works it out: the tank's
   * `lastKnown` for a new test, the test's own `lastKnown` (the values before it) for an edit.
   */
  lastKnown: LastKnown;
  profile: CareProfile;
  prefs: UnitPrefs;
  initial: WaterTestDraft;
  memory: EntryMemory;
  /** The test being changed (absent for a new one); it never counts as its own last known value. */
  editing?: WaterTestView;
  submitLabel?: string;
  /** Readings to put at the top, in this order, before the member's usual ones (the tests due, from a link). */
  firstReadings?: readonly ParameterKey[];
  /** After the test and its photos are stored, with what the tank page should say. */
  onSaved: (notice: SavedNotice) => void;
}

/**
 * The water-test form: fast at the tank on a phone, previewing with the shared normalizer what the server will
 * store, and saving through `useSaveWaterTest` (the server's field errors land on the fields; a failed photo can be
 * sent again on its own).
 */
export function WaterTestForm({
  clubId,
  tank,
  lastKnown,
  profile,
  prefs,
  initial,
  memory,
  editing,
  submitLabel = 'Save test',
  firstReadings = NONE,
  onSaved,
}: WaterTestFormProps) {
  const testId = editing?.id;
  const ctx = useMemo<Omit<NormalizeContext, 'now'>>(
    () => ({
      systemType: tank.systemType,
      careProfileKey: tank.careProfileKey,
      profile,
      lastKnown,
      ...(testId ? { testId } : {}),
    }),
    [tank.systemType, tank.careProfileKey, lastKnown, profile, testId],
  );
  const resolver = useMemo(
    () =>
      schemaResolver<WaterTestDraft, typeof createWaterTestSchema>(
        createWaterTestSchema,
        (v) => draftToInput(v, prefs),
        waterTestFieldOf,
        (parsed) => normalizeWaterTest(parsed, { ...ctx, now: new Date().toISOString() }).errors,
      ),
    [ctx, prefs],
  );
  const form = useForm<WaterTestDraft, unknown, WaterTestOutput>({ defaultValues: initial, resolver });
  const draft = useWatch({ control: form.control }) as WaterTestDraft;
  const preview = previewDraft(draft, prefs, { ...ctx, now: new Date().toISOString() });

  const first = useMemo(() => {
    const filled = PARAMETER_KEYS.filter((k) => isFilled(initial.entries[k]));
    const wanted = firstParameters(memory, profile, tank.phase);
    const usual = PARAMETER_KEYS.filter((k) => filled.includes(k) || wanted.includes(k));
    return [...firstReadings, ...usual.filter((k) => !firstReadings.includes(k))];
  }, [initial, memory, profile, tank.phase, firstReadings]);
  const [showAll, setShowAll] = useState(false);
  const shown: ParameterKey[] = showAll
    ? [...first, ...PARAMETER_KEYS.filter((k) => !first.includes(k))]
    : first;
  const hidden = PARAMETER_KEYS.length - first.length;

  const [photos, setPhotos] = useState<File[]>([]);
  const save = useSaveWaterTest({ clubId, tankId: tank.id, editing });
  const { formError, photoError, attempt } = useSaveErrors(waterTestFieldOf, form.setError);
  const filledCount = PARAMETER_KEYS.filter((k) => isFilled(draft.entries?.[k])).length;
  const liveProblems = Object.keys(preview.fieldErrors).length;

  // Without photos once the readings are stored and their photo failed: "carry on without it".
  const submit = (withPhotos: boolean) =>
    form.handleSubmit((values) =>
      attempt(async () => onSaved(await save(values, withPhotos ? photos : [], form.getValues()))),
    );

  return (
    <FormProvider {...form}>
      <form noValidate onSubmit={submit(true)} className="space-y-4">
        {formError ? <Notice tone="error">{formError}</Notice> : null}
        {form.formState.errors.root?.message ? (
          <Notice tone="error">{form.formState.errors.root.message}</Notice>
        ) : null}
        <fieldset disabled={photoError !== undefined} className="space-y-4">
          <div className="grid gap-3 sm:grid-cols-2">
            <TextField
              label="When you tested"
              type="datetime-local"
              error={form.formState.errors.takenAt?.message ?? preview.fieldErrors.takenAt}
              {...form.register('takenAt')}
            />
          </div>
          {shown.map((k) => (
            <ParameterField
              key={k}
              parameter={k}
              prefs={prefs}
              profile={profile}
              normalized={preview.normalized}
              liveErrors={preview.fieldErrors}
            />
          ))}
          {hidden > 0 ? (
            <Button
              type="button"
              variant="secondary"
              className="w-full"
              aria-expanded={showAll}
              onClick={() => setShowAll((s) => !s)}
            >
              {showAll ? 'Show only my usual readings' : `More readings (${hidden})`}
            </Button>
          ) : null}
          <ConcernPreview
            tank={tank}
            profile={profile}
            normalized={preview.normalized}
            lastKnown={lastKnown}
          />
          <TextAreaField
            label="Anything else about this test? (optional)"
            rows={2}
            error={form.formState.errors.note?.message}
            {...form.register('note')}
          />
        </fieldset>
        <PhotoPicker
          label="Photo (optional)"
          hint="For example the colour card next to the test tube, in daylight."
          files={photos}
          onChange={setPhotos}
        />
        {photoError !== undefined ? (
          <PhotoRetry
            saved="Your readings are saved."
            error={photoError}
            busy={form.formState.isSubmitting}
            onSkip={submit(false)}
          />
        ) : (
          <div className="sticky bottom-16 z-10 -mx-4 border-t border-line bg-surface/95 px-4 py-3 backdrop-blur sm:bottom-0 sm:mx-0 sm:rounded-card sm:border-0 sm:shadow-card">
            <p className="mb-2 text-sm text-ink-muted" aria-live="polite">
              {liveProblems
                ? `Fix ${liveProblems === 1 ? 'the reading' : `${liveProblems} readings`} marked in red first.`
                : filledCount
                  ? `${filledCount} ${filledCount === 1 ? 'reading' : 'readings'} ready to save.`
                  : 'Enter at least one reading.'}
            </p>
            <Button type="submit" className="min-h-14 w-full text-lg" busy={form.formState.isSubmitting}>
              {submitLabel}
            </Button>
          </div>
        )}
      </form>
    </FormProvider>
  );
}
