import { useMemo } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { createLivestockSchema, updateLivestockSchema } from '@shared/schemas/tank.schema';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/card';
import { CautionFor } from '@client/components/ui/cautions';
import { TextAreaField, TextField } from '@client/components/ui/field';
import { fieldsIn, useSaveErrors } from '@client/lib/form-errors';
import { parseDecimal, todayIsoDate } from '@client/lib/form-values';
import { schemaResolver } from '@client/lib/schema-resolver';

interface AddDraft {
  speciesCommonName: string;
  count: string;
  addedOn: string;
  source: string;
  quarantineNotes: string;
}
const ADD_FIELDS = fieldsIn(['speciesCommonName', 'count', 'addedOn', 'source', 'quarantineNotes']);

/** New animals: name, how many, when, where from, quarantine notes — beside the trade's cautions on buying. */
export function AddLivestockForm({
  onSave,
  onCancel,
}: {
  onSave: (input: z.output<typeof createLivestockSchema>) => Promise<void>;
  onCancel: () => void;
}) {
  const resolver = useMemo(
    () =>
      schemaResolver<AddDraft, typeof createLivestockSchema>(
        createLivestockSchema,
        (d) => ({ ...d, count: parseDecimal(d.count) }),
        ADD_FIELDS,
      ),
    [],
  );
  const { register, handleSubmit, setError, formState } = useForm<
    AddDraft,
    unknown,
    z.output<typeof createLivestockSchema>
  >({
    resolver,
    defaultValues: {
      speciesCommonName: '',
      count: '1',
      addedOn: todayIsoDate(),
      source: '',
      quarantineNotes: '',
    },
  });
  const { formError, attempt } = useSaveErrors(ADD_FIELDS, setError);
  const e = formState.errors;
  return (
    <form
      noValidate
      className="space-y-3 rounded-xl bg-tint p-4"
      onSubmit={handleSubmit((v) => attempt(() => onSave(v)))}
    >
      {formError ? <Notice tone="error">{formError}</Notice> : null}
      <CautionFor kind="buyingAnimals" title="Before you buy" />
      <div className="grid gap-3 sm:grid-cols-[1fr_7rem_11rem]">
        <TextField
          label="Animal (common name)"
          autoComplete="off"
          error={e.speciesCommonName?.message}
          {...register('speciesCommonName')}
        />
        <TextField
          label="How many"
          inputMode="numeric"
          autoComplete="off"
          error={e.count?.message}
          {...register('count')}
        />
        <TextField
          label="Added on"
          type="date"
          max={todayIsoDate()}
          error={e.addedOn?.message}
          {...register('addedOn')}
        />
      </div>
      <TextField
        label="Where they came from"
        hint="The shop, breeder or club member, so you can ask them later."
        autoComplete="off"
        error={e.source?.message}
        {...register('source')}
      />
      <TextAreaField
        label="Quarantine notes"
        hint="How long they were kept apart, any treatment a vet advised, how they ate."
        rows={2}
        error={e.quarantineNotes?.message}
        {...register('quarantineNotes')}
      />
      <CautionFor kind="quarantine" title="Quarantine" />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={formState.isSubmitting}>
          Add to the tank
        </Button>
        <Button type="button" variant="ghost" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

interface LeaveDraft {
  removedOn: string;
  removalReason: string;
}
const LEAVE_FIELDS = fieldsIn(['removedOn', 'removalReason']);

/** Records animals leaving the tank (rehomed, died…): they stay in the history. */
export function LeaveLivestockForm({
  name,
  onSave,
  onCancel,
}: {
  name: string;
  onSave: (input: z.output<typeof updateLivestockSchema>) => Promise<void>;
  onCancel: () => void;
}) {
  const resolver = useMemo(
    () =>
      schemaResolver<LeaveDraft, typeof updateLivestockSchema>(
        updateLivestockSchema,
        (d) => ({ removedOn: d.removedOn, removalReason: d.removalReason.trim() || null }),
        LEAVE_FIELDS,
      ),
    [],
  );
  const { register, handleSubmit, setError, formState } = useForm<
    LeaveDraft,
    unknown,
    z.output<typeof updateLivestockSchema>
  >({ resolver, defaultValues: { removedOn: todayIsoDate(), removalReason: '' } });
  const { formError, attempt } = useSaveErrors(LEAVE_FIELDS, setError);
  return (
    <form
      noValidate
      className="mt-2 space-y-3 rounded-xl bg-tint p-3"
      onSubmit={handleSubmit((v) => attempt(() => onSave(v)))}
    >
      {formError ? <Notice tone="error">{formError}</Notice> : null}
      <div className="grid gap-3 sm:grid-cols-[11rem_1fr]">
        <TextField
          label={`${name} left on`}
          type="date"
          max={todayIsoDate()}
          error={formState.errors.removedOn?.message}
          {...register('removedOn')}
        />
        <TextField
          label="Why (optional)"
          hint="Rehomed, died, moved to another tank…"
          autoComplete="off"
          error={formState.errors.removalReason?.message}
          {...register('removalReason')}
        />
      </div>
      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={formState.isSubmitting}>
          Record it
        </Button>
        <Button type="button" variant="ghost" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
