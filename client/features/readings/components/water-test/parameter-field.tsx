import { useId } from 'react';
import { useFormContext, useWatch } from 'react-hook-form';
import { parameterInfo, type ParameterKey } from '@shared/care/parameters';
import type { CareProfile } from '@shared/care/profiles';
import { ENTRY_UNIT_LABELS } from '@shared/constants/reading-labels';
import { TEST_METHOD_LABELS } from '@shared/constants/tank-labels';
import { convert } from '@shared/chemistry/units';
import { defaultMethodFor, ENTRY_UNITS, TEST_METHODS } from '@shared/readings/entry-units';
import type { NormalizedWaterTest } from '@shared/readings/normalize-water-test';
import { SG_REFERENCE_TEMPS_C } from '@shared/readings/salinity';
import { Choice } from '@client/components/ui/choice';
import { Select } from '@client/components/ui/select';
import { Input } from '@client/components/ui/field';
import type { UnitPrefs } from '@client/lib/display-units';
import { PARAMETER_HELP } from '../../lib/parameter-help';
import type { WaterTestDraft } from '../../lib/water-test-draft';
import { ReadingPreview } from './reading-preview';

function referenceLabel(c: number): string {
  return `${Number(c.toFixed(1))} °C (${Math.round(convert(c, '°C', '°F'))} °F)`;
}

/** One parameter of a water test: a big number field, its unit (the kit's basis), how it was measured, a note. */
export function ParameterField({
  parameter,
  prefs,
  profile,
  normalized,
  liveErrors,
}: {
  parameter: ParameterKey;
  prefs: UnitPrefs;
  profile: CareProfile | undefined;
  normalized: NormalizedWaterTest;
  liveErrors: Record<string, string>;
}) {
  const id = useId();
  const { register, formState } = useFormContext<WaterTestDraft>();
  const entry = useWatch<WaterTestDraft, `entries.${ParameterKey}`>({ name: `entries.${parameter}` });
  const info = parameterInfo(parameter);
  const units = ENTRY_UNITS[parameter] as readonly string[];
  const name = `entries.${parameter}` as const;
  const submitted = formState.errors.entries?.[parameter];
  const errorOf = (field: 'value' | 'unit' | 'method' | 'referenceTempC' | 'sampleTemp' | 'note') =>
    liveErrors[`${name}.${field}`] ?? submitted?.[field]?.message;
  const valueError = entry.value.trim() === '' ? submitted?.value?.message : errorOf('value');
  const isSg = parameter === 'salinity' && entry.unit === 'SG';
  const tempUnit = prefs.temperatureUnit === 'F' ? '°F' : '°C';
  const sampleTemp =
    (parameter === 'salinity' && ((isSg && entry.method === 'hydrometer') || entry.unit === 'mS/cm')) ||
    undefined;

  return (
    <fieldset className="rounded-card bg-surface p-4 shadow-card" data-parameter={parameter}>
      <legend className="sr-only">{info.label}</legend>
      <label htmlFor={`${id}-value`} className="block text-base font-extrabold text-ink">
        {info.label}
      </label>
      <p id={`${id}-help`} className="text-sm text-ink-muted">
        {PARAMETER_HELP[parameter]}
      </p>
      <div className="mt-1 flex items-stretch gap-2">
        <input
          id={`${id}-value`}
          inputMode="decimal"
          autoComplete="off"
          enterKeyHint="next"
          placeholder="–"
          aria-invalid={valueError ? true : undefined}
          aria-describedby={valueError ? `${id}-help ${id}-error` : `${id}-help`}
          className={`min-h-14 w-full min-w-0 flex-1 rounded-xl border bg-surface px-3 text-2xl font-bold text-ink shadow-sm focus:border-focus focus:outline-none focus:ring-2 focus:ring-line ${valueError ? 'border-danger' : 'border-line-strong'}`}
          {...register(`${name}.value`)}
        />
        {units.length > 1 ? (
          <>
            <label htmlFor={`${id}-unit`} className="sr-only">
              Unit for {info.label}
            </label>
            <Select id={`${id}-unit`} className="max-w-[45%] px-2 font-bold" {...register(`${name}.unit`)}>
              {units.map((u) => (
                <option key={u} value={u}>
                  {ENTRY_UNIT_LABELS[u as keyof typeof ENTRY_UNIT_LABELS]}
                </option>
              ))}
            </Select>
          </>
        ) : (
          <span className="flex items-center px-1 text-sm font-bold text-ink-muted">
            {units[0] === 'pH' ? '' : units[0]}
          </span>
        )}
      </div>
      {valueError ? (
        <p id={`${id}-error`} role="alert" className="mt-1 text-sm font-semibold text-danger">
          {valueError}
        </p>
      ) : null}

      {isSg ? (
        <div className="mt-3 grid gap-3 sm:grid-cols-2">
          <div role="radiogroup" aria-label="Read with">
            <p className="text-sm font-bold text-ink-soft">Read with</p>
            <div className="mt-1 grid grid-cols-2 gap-2">
              {(['refractometer', 'hydrometer'] as const).map((m) => (
                <Choice
                  key={m}
                  value={m}
                  {...register(`${name}.method`)}
                  checked={entry.method === m || (m === 'refractometer' && entry.method === '')}
                >
                  {TEST_METHOD_LABELS[m]}
                </Choice>
              ))}
            </div>
          </div>
          <div>
            <label htmlFor={`${id}-ref`} className="text-sm font-bold text-ink-soft">
              Instrument's reference temperature
            </label>
            <Select id={`${id}-ref`} className="mt-1 w-full" {...register(`${name}.referenceTempC`)}>
              {SG_REFERENCE_TEMPS_C.map((c) => (
                <option key={c} value={String(c)}>
                  {referenceLabel(c)}
                </option>
              ))}
            </Select>
            {errorOf('referenceTempC') ? (
              <p role="alert" className="mt-1 text-sm font-semibold text-danger">
                {errorOf('referenceTempC')}
              </p>
            ) : null}
          </div>
        </div>
      ) : null}
      {sampleTemp ? (
        <div className="mt-3">
          <label htmlFor={`${id}-sample`} className="text-sm font-bold text-ink-soft">
            Water temperature at the reading ({tempUnit}, optional)
          </label>
          <Input
            id={`${id}-sample`}
            inputMode="decimal"
            autoComplete="off"
            className="mt-1 w-full"
            {...register(`${name}.sampleTemp`)}
          />
          <p className="mt-1 text-sm text-ink-muted">
            {entry.unit === 'mS/cm'
              ? 'Leave empty if your meter shows values corrected to 25 °C.'
              : "Leave empty to use this test's temperature."}
          </p>
          {errorOf('sampleTemp') ? (
            <p role="alert" className="mt-1 text-sm font-semibold text-danger">
              {errorOf('sampleTemp')}
            </p>
          ) : null}
        </div>
      ) : null}

      {entry.value.trim() !== '' && !valueError ? (
        <ReadingPreview
          parameter={parameter}
          normalized={normalized}
          profile={profile}
          prefs={prefs}
          enteredUnit={entry.unit}
        />
      ) : null}

      <details className="mt-2">
        <summary className="flex min-h-touch cursor-pointer items-center text-sm font-bold text-ink-muted">
          How you measured · note
        </summary>
        <div className="grid gap-3 pb-1 sm:grid-cols-2">
          {!isSg ? (
            <div>
              <label htmlFor={`${id}-method`} className="text-sm font-bold text-ink-soft">
                Method
              </label>
              <Select id={`${id}-method`} className="mt-1 w-full" {...register(`${name}.method`)}>
                <option value="">Usual: {TEST_METHOD_LABELS[defaultMethodFor(parameter, entry.unit)]}</option>
                {TEST_METHODS.map((m) => (
                  <option key={m} value={m}>
                    {TEST_METHOD_LABELS[m]}
                  </option>
                ))}
              </Select>
            </div>
          ) : null}
          <div>
            <label htmlFor={`${id}-note`} className="text-sm font-bold text-ink-soft">
              Note on this reading
            </label>
            <Input
              id={`${id}-note`}
              autoComplete="off"
              className="mt-1 w-full"
              {...register(`${name}.note`)}
            />
            {errorOf('note') ? (
              <p role="alert" className="mt-1 text-sm font-semibold text-danger">
                {errorOf('note')}
              </p>
            ) : null}
          </div>
        </div>
      </details>
    </fieldset>
  );
}
