import { useFormContext, useWatch } from 'react-hook-form';
import { ENTRY_UNIT_LABELS } from '@shared/constants/reading-labels';
import {
  DOSE_UNIT_LABELS,
  EQUIPMENT_CHANGE_LABELS,
  SOURCE_WATER_LABELS,
} from '@shared/constants/tank-labels';
import { convert } from '@shared/chemistry/units';
import { NITRATE_ENTRY_UNITS, SALINITY_ENTRY_UNITS } from '@shared/readings/entry-units';
import { SG_REFERENCE_TEMPS_C } from '@shared/readings/salinity';
import { DOSE_UNITS, EQUIPMENT_CHANGES, SOURCE_WATER_TYPES } from '@shared/schemas/tank-event.schema';
import { TextField } from '@client/components/ui/field';
import { SelectField } from '@client/components/ui/select';
import { formatVolume, volumeUnitOf, type UnitPrefs } from '@client/lib/display-units';
import type { EventDraft } from '../../lib/event-draft';
import { parseDecimal } from '@client/lib/form-values';
import { CautionFor } from '@client/components/ui/cautions';
import { Choice } from '@client/components/ui/choice';

const opts = <T extends string>(values: readonly T[], labels: Record<T, string>) =>
  values.map((v) => ({ value: v, label: labels[v] }));

export function WaterChangeFields({ prefs, tankLitres }: { prefs: UnitPrefs; tankLitres: number }) {
  const { register, formState } = useFormContext<EventDraft>();
  const w = useWatch<EventDraft, 'waterChange'>({ name: 'waterChange' });
  const e = formState.errors.waterChange;
  const amount = parseDecimal(w.amount);
  const unit = volumeUnitOf(prefs);
  let preview: string | undefined;
  if (amount !== undefined && !Number.isNaN(amount) && amount > 0) {
    const litres =
      w.by === 'volume'
        ? unit === 'US gal'
          ? convert(amount, 'US gal', 'L')
          : amount
        : (tankLitres * amount) / 100;
    preview =
      w.by === 'volume'
        ? `About ${Math.round((litres / tankLitres) * 100)} % of the tank's ${formatVolume(tankLitres, prefs)}.`
        : `About ${formatVolume(litres, prefs)} of the tank's ${formatVolume(tankLitres, prefs)}.`;
  }
  return (
    <div className="space-y-4">
      <CautionFor kind="waterChange" title="Before the new water goes in" />
      <div role="radiogroup" aria-label="Give the amount as" className="grid grid-cols-2 gap-2">
        {(['percent', 'volume'] as const).map((b) => (
          <Choice key={b} value={b} {...register('waterChange.by')}>
            {b === 'percent' ? 'Percent of the tank' : `Amount (${unit})`}
          </Choice>
        ))}
      </div>
      <TextField
        label={w.by === 'percent' ? 'How much was changed, %' : `How much was changed, ${unit}`}
        inputMode="decimal"
        autoComplete="off"
        hint={preview}
        error={e?.amount?.message}
        {...register('waterChange.amount')}
      />
      <SelectField
        label="New water"
        options={opts(SOURCE_WATER_TYPES, SOURCE_WATER_LABELS)}
        error={e?.sourceWater?.message}
        {...register('waterChange.sourceWater')}
      />
      <details>
        <summary className="flex min-h-touch cursor-pointer items-center text-sm font-bold text-ink-muted">
          Did you test the new water? (optional)
        </summary>
        <div className="grid gap-3 sm:grid-cols-2">
          <div className="grid grid-cols-[1fr_auto] gap-2">
            <TextField
              label="Its nitrate"
              inputMode="decimal"
              autoComplete="off"
              error={e?.nitrate?.message}
              {...register('waterChange.nitrate')}
            />
            <SelectField
              label="Unit"
              options={NITRATE_ENTRY_UNITS.map((u) => ({ value: u, label: ENTRY_UNIT_LABELS[u] }))}
              {...register('waterChange.nitrateUnit')}
            />
          </div>
          <div className="grid grid-cols-[1fr_auto] gap-2">
            <TextField
              label="Its salinity"
              inputMode="decimal"
              autoComplete="off"
              error={e?.salinity?.message}
              {...register('waterChange.salinity')}
            />
            <SelectField
              label="Unit"
              options={SALINITY_ENTRY_UNITS.map((u) => ({ value: u, label: ENTRY_UNIT_LABELS[u] }))}
              {...register('waterChange.salinityUnit')}
            />
          </div>
          {w.salinityUnit === 'SG' ? (
            <SelectField
              label="Refractometer's reference temperature"
              options={SG_REFERENCE_TEMPS_C.map((c) => ({
                value: String(c),
                label: `${Number(c.toFixed(1))} °C`,
              }))}
              {...register('waterChange.salinityRef')}
            />
          ) : null}
        </div>
      </details>
    </div>
  );
}

export function DoseFields() {
  const { register, formState } = useFormContext<EventDraft>();
  const e = formState.errors.dose;
  return (
    <div className="space-y-4">
      <CautionFor kind="dosing" title="Safety" />
      <TextField
        label="Product"
        autoComplete="off"
        error={e?.product?.message}
        {...register('dose.product')}
      />
      <div className="grid grid-cols-[1fr_10rem] gap-3">
        <TextField
          label="Amount"
          inputMode="decimal"
          autoComplete="off"
          error={e?.amount?.message}
          {...register('dose.amount')}
        />
        <SelectField
          label="Unit"
          options={opts(DOSE_UNITS, DOSE_UNIT_LABELS)}
          error={e?.unit?.message}
          {...register('dose.unit')}
        />
      </div>
    </div>
  );
}

export function FeedingFields() {
  const { register, formState } = useFormContext<EventDraft>();
  const e = formState.errors.feeding;
  return (
    <div className="grid gap-3 sm:grid-cols-2">
      <TextField
        label="Food"
        autoComplete="off"
        hint="e.g. frozen mysis, new pellet brand"
        error={e?.food?.message}
        {...register('feeding.food')}
      />
      <TextField
        label="How much (optional)"
        autoComplete="off"
        error={e?.amount?.message}
        {...register('feeding.amount')}
      />
    </div>
  );
}

export function EquipmentFields() {
  const { register, formState } = useFormContext<EventDraft>();
  const e = formState.errors.equipment;
  return (
    <div className="space-y-4">
      <div className="grid gap-3 sm:grid-cols-2">
        <TextField
          label="Which equipment"
          autoComplete="off"
          hint="e.g. heater, return pump, skimmer"
          error={e?.equipment?.message}
          {...register('equipment.equipment')}
        />
        <SelectField
          label="What happened"
          options={opts(EQUIPMENT_CHANGES, EQUIPMENT_CHANGE_LABELS)}
          error={e?.change?.message}
          {...register('equipment.change')}
        />
      </div>
      <CautionFor kind="electricity" title="Safety" />
    </div>
  );
}
