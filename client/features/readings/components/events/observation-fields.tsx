import { useFormContext } from 'react-hook-form';
import {
  OBSERVATION_CHECK_LABELS,
  OBSERVATION_SCALE_LABELS,
  OBSERVATION_VALUE_LABELS,
} from '@shared/constants/tank-labels';
import { OBSERVATION_CHECKS, OBSERVATION_SCALES } from '@shared/schemas/tank-event.schema';
import type { LivestockView } from '@shared/schemas/tank-views';
import { TextField } from '@client/components/ui/field';
import { SCALES, type EventDraft } from '../../lib/event-draft';
import { CautionFor } from '@client/components/ui/cautions';
import { TextAreaField } from '@client/components/ui/field';
import { Choice } from '@client/components/ui/choice';

/** The signs a keeper watches even when every figure looks right: one tap per sign, "as usual" first. */
export function ObservationFields({ livestock }: { livestock: LivestockView[] }) {
  const { register, formState } = useFormContext<EventDraft>();
  const e = formState.errors.observation;
  const names = livestock.filter((l) => !l.removedOn).map((l) => l.speciesCommonName);
  return (
    <div className="space-y-4">
      <TextField
        label="Which animals (optional)"
        autoComplete="off"
        list="observation-animals"
        hint={names.length ? 'Pick from your tank or type.' : undefined}
        error={e?.animal?.message}
        {...register('observation.animal')}
      />
      <datalist id="observation-animals">
        {names.map((n) => (
          <option key={n} value={n} />
        ))}
      </datalist>
      {SCALES.map((s) => (
        <fieldset key={s}>
          <legend className="text-sm font-bold text-ink-soft">{OBSERVATION_SCALE_LABELS[s]}</legend>
          <div className="mt-1 flex flex-wrap gap-2">
            {(OBSERVATION_SCALES[s] as readonly (keyof typeof OBSERVATION_VALUE_LABELS)[]).map((v) => (
              <Choice key={v} shape="pill" value={v} {...register(`observation.${s}`)}>
                {OBSERVATION_VALUE_LABELS[v]}
              </Choice>
            ))}
          </div>
        </fieldset>
      ))}
      <TextField
        label="Breaths (gill beats) a minute (optional)"
        inputMode="numeric"
        autoComplete="off"
        hint="Count for 15 seconds and multiply by 4."
        error={e?.breathsPerMinute?.message}
        {...register('observation.breathsPerMinute')}
      />
      <fieldset>
        <legend className="text-sm font-bold text-ink-soft">Also seen</legend>
        <div className="mt-1 grid gap-1 sm:grid-cols-2">
          {OBSERVATION_CHECKS.map((c) => (
            <label
              key={c}
              className="flex min-h-touch cursor-pointer items-center gap-3 rounded-xl px-2 hover:bg-tint"
            >
              <input
                type="checkbox"
                className="size-5 accent-accent"
                {...register(`observation.checks.${c}`)}
              />
              <span className="text-ink">{OBSERVATION_CHECK_LABELS[c]}</span>
            </label>
          ))}
        </div>
      </fieldset>
      <TextAreaField label="In your own words" error={e?.text?.message} {...register('observation.text')} />
      <CautionFor kind="medication" title="If they look unwell" />
    </div>
  );
}
