import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { EXPERIENCE_LEVELS } from '@shared/constants/roles';
import { SALINITY_DISPLAYS, TEMPERATURE_UNITS, VOLUME_UNITS } from '@shared/constants/units';
import { updateProfileSchema } from '@shared/schemas/auth.schema';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/card';
import { TextField } from '@client/components/ui/field';
import { SelectField } from '@client/components/ui/select';
import { useToast } from '@client/components/ui/toast';
import { fieldsIn, useSaveErrors } from '@client/lib/form-errors';
import type { MeUser } from '../api/me';
import { useUpdateProfile } from '../api/mutations';

const schema = updateProfileSchema.required();
type Input = z.input<typeof schema>;

const LABELS = {
  experienceLevel: {
    beginner: 'New to the hobby',
    'some-experience': 'Kept a tank or two',
    experienced: 'Experienced keeper',
  },
  temperatureUnit: { C: '°C', F: '°F' },
  volumeUnit: { L: 'Litres', USgal: 'US gallons' },
  salinityDisplay: { sg: 'Specific gravity (e.g. 1.025)', ppt: 'Parts per thousand (e.g. 35 ppt)' },
} as const;
const options = <K extends keyof typeof LABELS>(key: K, values: readonly (keyof (typeof LABELS)[K])[]) =>
  values.map((v) => ({ value: String(v), label: String(LABELS[key][v]) }));

export function ProfileForm({ user }: { user: MeUser }) {
  const update = useUpdateProfile();
  const toast = useToast();
  const { register, handleSubmit, setError, formState } = useForm<Input>({
    resolver: zodResolver(schema),
    defaultValues: {
      displayName: user.displayName,
      experienceLevel: user.experienceLevel,
      timeZone: user.timeZone,
      temperatureUnit: user.temperatureUnit,
      volumeUnit: user.volumeUnit,
      salinityDisplay: user.salinityDisplay,
    },
  });
  const { formError, attempt } = useSaveErrors(fieldsIn(Object.keys(schema.shape)), setError);
  const e = formState.errors;
  return (
    <form
      noValidate
      className="space-y-4"
      onSubmit={handleSubmit((v) =>
        attempt(async () => {
          await update.mutateAsync(v);
          toast.success('Profile and units saved.');
        }),
      )}
    >
      {formError ? <Notice tone="error">{formError}</Notice> : null}
      <TextField label="Your name" error={e.displayName?.message} {...register('displayName')} />
      <SelectField
        label="Experience"
        options={options('experienceLevel', EXPERIENCE_LEVELS)}
        error={e.experienceLevel?.message}
        {...register('experienceLevel')}
      />
      <TextField
        label="Time zone"
        hint="Used for reminders and the dates on your tests, e.g. Europe/London."
        error={e.timeZone?.message}
        {...register('timeZone')}
      />
      <fieldset className="grid gap-4 sm:grid-cols-3">
        <legend className="mb-2 text-sm font-extrabold uppercase tracking-wide text-ink-muted">
          Units I read
        </legend>
        <SelectField
          label="Temperature"
          options={options('temperatureUnit', TEMPERATURE_UNITS)}
          {...register('temperatureUnit')}
        />
        <SelectField
          label="Tank volume"
          options={options('volumeUnit', VOLUME_UNITS)}
          {...register('volumeUnit')}
        />
        <SelectField
          label="Salinity"
          options={options('salinityDisplay', SALINITY_DISPLAYS)}
          {...register('salinityDisplay')}
        />
      </fieldset>
      <Button type="submit" busy={formState.isSubmitting}>
        Save
      </Button>
    </form>
  );
}
