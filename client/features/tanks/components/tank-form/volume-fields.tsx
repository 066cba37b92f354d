import { useFormContext, useWatch } from 'react-hook-form';
import { TANK_SHAPES } from '@shared/chemistry/tank-volume';
import { TANK_SHAPE_LABELS } from '@shared/constants/tank-labels';
import { LENGTH_UNITS } from '@shared/schemas/tank.schema';
import { TextField } from '@client/components/ui/field';
import { SelectField } from '@client/components/ui/select';
import { Choice } from '@client/components/ui/choice';
import { formatVolume, type UnitPrefs } from '@client/lib/display-units';
import { previewVolume, SHAPE_SIDES, type TankDraft } from '../../lib/tank-draft';

const SIDE_LABELS = {
  length: 'Length (side to side)',
  width: 'Depth (front to back)',
  height: 'Height',
  diameter: 'Diameter',
  bowDepth: 'Extra depth of the bow at the middle',
  fillHeight: 'Water height (optional)',
} as const;
const VOLUME_UNITS = ['L', 'US gal'] as const;

/** The tank's volume: typed in, or worked out from its inside measurements with a live gross/net preview. */
export function VolumeFields({ prefs }: { prefs: UnitPrefs }) {
  const { register, formState } = useFormContext<TankDraft>();
  const draft = useWatch<TankDraft>() as TankDraft;
  const v = draft.volume;
  const e = formState.errors.volume;
  const preview = previewVolume(draft);
  return (
    <fieldset className="space-y-3">
      <legend className="text-sm font-extrabold uppercase tracking-wide text-ink-muted">Size</legend>
      <div role="radiogroup" aria-label="How to give the size" className="grid grid-cols-2 gap-2">
        {(['entered', 'dimensions'] as const).map((s) => (
          <Choice key={s} value={s} {...register('volume.source')}>
            {s === 'entered' ? 'I know the volume' : 'Work it out from the size'}
          </Choice>
        ))}
      </div>
      {v.source === 'entered' ? (
        <div className="grid grid-cols-[1fr_9rem] gap-3">
          <TextField
            label="Water volume"
            inputMode="decimal"
            autoComplete="off"
            error={e?.value?.message}
            {...register('volume.value')}
          />
          <SelectField
            label="Unit"
            options={VOLUME_UNITS.map((u) => ({ value: u, label: u === 'L' ? 'Litres' : 'US gallons' }))}
            error={e?.unit?.message}
            {...register('volume.unit')}
          />
        </div>
      ) : (
        <>
          <div className="grid grid-cols-2 gap-3">
            <SelectField
              label="Shape"
              options={TANK_SHAPES.map((s) => ({ value: s, label: TANK_SHAPE_LABELS[s] }))}
              error={e?.shape?.message}
              {...register('volume.shape')}
            />
            <SelectField
              label="Measured in"
              options={LENGTH_UNITS.map((u) => ({ value: u, label: u === 'cm' ? 'Centimetres' : 'Inches' }))}
              {...register('volume.lengthUnit')}
            />
          </div>
          <p className="text-sm text-ink-muted">
            Measure inside the glass. Rock, sand and equipment take up room: say roughly how much below.
          </p>
          <div className="grid grid-cols-2 gap-3">
            {SHAPE_SIDES[v.shape].map((side) => (
              <TextField
                key={side}
                label={`${SIDE_LABELS[side]}, ${v.lengthUnit}`}
                inputMode="decimal"
                autoComplete="off"
                error={e?.[side]?.message}
                {...register(`volume.${side}`)}
              />
            ))}
            <TextField
              label="Taken up by rock and sand, %"
              inputMode="decimal"
              autoComplete="off"
              hint="Often 10–20 %."
              error={e?.displacementPercent?.message}
              {...register('volume.displacementPercent')}
            />
          </div>
          <div aria-live="polite" className="rounded-xl bg-tint px-4 py-3 text-ink-soft">
            {preview ? (
              <p>
                Full to the brim: <strong>{formatVolume(preview.grossL, prefs)}</strong>
                {prefs.volumeUnit !== 'L' ? ` (${formatVolume(preview.grossL, { volumeUnit: 'L' })})` : ''}.
                Water it holds: <strong>about {formatVolume(preview.netL, prefs)}</strong>
                {prefs.volumeUnit !== 'L' ? ` (${formatVolume(preview.netL, { volumeUnit: 'L' })})` : ''}.
              </p>
            ) : (
              <p className="text-sm">Fill in the measurements to see the volume.</p>
            )}
          </div>
        </>
      )}
    </fieldset>
  );
}
