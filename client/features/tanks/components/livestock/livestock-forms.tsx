import { useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { createLivestockSchema, updateLivestockSchema } from '../../../../../shared/schemas/tank.schema';
import { Button } from '../../../../components/ui/button';
import { Notice } from '../../../../components/ui/card';
import { TextField } from '../../../../components/ui/field';
import { parseDecimal, todayIsoDate } from '../../lib/form-values';
import { placeServerIssues, schemaResolver } from '../../lib/schema-resolver';
import { TankCaution } from '../safety';
import { TextAreaField } from '../text-area-field';

interface AddDraft {
  speciesCommonName: string;
  count: string;
  addedOn: string;
  source: string;
  quarantineNotes: string;
}
const ADD_FIELDS = ['speciesCommonName', 'count', 'addedOn', 'source', 'quarantineNotes'];
const fieldIn = (fields: readonly string[]) => (path: string) => (fields.includes(path) ? path : null);

/** New animals: name, how many, when, where from, quarantine notes — beside the trade's cautions on buying. */
export function AddLivestockForm({ onSave, onCancel }: { onSave: (input: z.output<typeof createLivestockSchema>) => Promise<void>; onCancel: () => void }) {
  const resolver = useMemo(
    () => schemaResolver<AddDraft, typeof createLivestockSchema>(createLivestockSchema, (d) => ({ ...d, count: parseDecimal(d.count) }), fieldIn(ADD_FIELDS)),
    [],
  );
  const { register, handleSubmit, setError, formState } = useForm<AddDraft, unknown, z.output<typeof createLivestockSchema>>({
    resolver,
    defaultValues: { speciesCommonName: '', count: '1', addedOn: todayIsoDate(), source: '', quarantineNotes: '' },
  });
  const [formError, setFormError] = useState<string>();
  const e = formState.errors;
  return (
    <form
      noValidate
      className="space-y-3 rounded-xl bg-tide-50 p-4"
      onSubmit={handleSubmit(async (v) => {
        setFormError(undefined);
        try {
          await onSave(v);
        } catch (err) {
          setFormError(placeServerIssues(err, fieldIn(ADD_FIELDS), (n, x) => setError(n as keyof AddDraft, x)));
        }
      })}
    >
      {formError ? <Notice tone="error">{formError}</Notice> : null}
      <TankCaution kind="buyingAnimals" title="Before you buy" />
      <div className="grid gap-3 sm:grid-cols-[1fr_7rem_11rem]">
        <TextField label="Animal (common name)" autoComplete="off" error={e.speciesCommonName?.message} {...register('speciesCommonName')} />
        <TextField label="How many" inputMode="numeric" autoComplete="off" error={e.count?.message} {...register('count')} />
        <TextField label="Added on" type="date" max={todayIsoDate()} error={e.addedOn?.message} {...register('addedOn')} />
      </div>
      <TextField label="Where they came from" hint="The shop, breeder or club member, so you can ask them later." autoComplete="off" error={e.source?.message} {...register('source')} />
      <TextAreaField label="Quarantine notes" hint="How long they were kept apart, any treatment a vet advised, how they ate." rows={2} error={e.quarantineNotes?.message} {...register('quarantineNotes')} />
      <TankCaution kind="quarantine" title="Quarantine" />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={formState.isSubmitting}>Add to the tank</Button>
        <Button type="button" variant="ghost" onClick={onCancel}>Cancel</Button>
      </div>
    </form>
  );
}

interface LeaveDraft {
  removedOn: string;
  removalReason: string;
}
const LEAVE_FIELDS = ['removedOn', 'removalReason'];

/** Records animals leaving the tank (rehomed, died…): they stay in the history. */
export function LeaveLivestockForm({ name, onSave, onCancel }: { name: string; onSave: (input: z.output<typeof updateLivestockSchema>) => Promise<void>; onCancel: () => void }) {
  const resolver = useMemo(
    () => schemaResolver<LeaveDraft, typeof updateLivestockSchema>(updateLivestockSchema, (d) => ({ removedOn: d.removedOn, removalReason: d.removalReason.trim() || null }), fieldIn(LEAVE_FIELDS)),
    [],
  );
  const { register, handleSubmit, setError, formState } = useForm<LeaveDraft, unknown, z.output<typeof updateLivestockSchema>>({ resolver, defaultValues: { removedOn: todayIsoDate(), removalReason: '' } });
  const [formError, setFormError] = useState<string>();
  return (
    <form
      noValidate
      className="mt-2 space-y-3 rounded-xl bg-sand-100 p-3"
      onSubmit={handleSubmit(async (v) => {
        setFormError(undefined);
        try {
          await onSave(v);
        } catch (err) {
          setFormError(placeServerIssues(err, fieldIn(LEAVE_FIELDS), (n, x) => setError(n as keyof LeaveDraft, x)));
        }
      })}
    >
      {formError ? <Notice tone="error">{formError}</Notice> : null}
      <div className="grid gap-3 sm:grid-cols-[11rem_1fr]">
        <TextField label={`${name} left on`} type="date" max={todayIsoDate()} error={formState.errors.removedOn?.message} {...register('removedOn')} />
        <TextField label="Why (optional)" hint="Rehomed, died, moved to another tank…" autoComplete="off" error={formState.errors.removalReason?.message} {...register('removalReason')} />
      </div>
      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={formState.isSubmitting}>Record it</Button>
        <Button type="button" variant="ghost" onClick={onCancel}>Cancel</Button>
      </div>
    </form>
  );
}
