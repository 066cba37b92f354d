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
import type { UnitPrefs } from '@client/lib/display-units';
import type { WaterTestDraft } from '../../lib/water-test-draft';
import { ReadingPreview } from './reading-preview';

const select = 'min-h-touch rounded-xl border border-tide-200 bg-white px-2 text-base text-tide-950';

function referenceLabel(c: number): string {
  return `${Number(c.toFixed(1))} °C (${Math.round(convert(c, '°C', '°F'))} °F)`;
}

/** One parameter of a water test: a big number field, its unit (the kit's basis), how it was measured, a note. */
export function ParameterField({ parameter, prefs, profile, normalized, liveErrors }: { parameter: ParameterKey; prefs: UnitPrefs; profile: CareProfile | undefined; normalized: NormalizedWaterTest; liveErrors: Record<string, string> }) {
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
  const sampleTemp = (parameter === 'salinity' && ((isSg && entry.method === 'hydrometer') || entry.unit === 'mS/cm')) || undefined;

  return (
    <fieldset className="rounded-card bg-white p-4 shadow-card" data-parameter={parameter}>
      <legend className="sr-only">{info.label}</legend>
      <label htmlFor={`${id}-value`} className="block text-base font-extrabold text-tide-900">{info.label}</label>
      <div className="mt-1 flex items-stretch gap-2">
        <input
          id={`${id}-value`}
          inputMode="decimal"
          autoComplete="off"
          enterKeyHint="next"
          placeholder="–"
          aria-invalid={valueError ? true : undefined}
          aria-describedby={valueError ? `${id}-error` : undefined}
          className={`min-h-14 w-full min-w-0 flex-1 rounded-xl border bg-white px-3 text-2xl font-bold text-tide-950 shadow-sm focus:border-tide-500 focus:outline-none focus:ring-2 focus:ring-tide-200 ${valueError ? 'border-ember-500' : 'border-tide-200'}`}
          {...register(`${name}.value`)}
        />
        {units.length > 1 ? (
          <>
            <label htmlFor={`${id}-unit`} className="sr-only">Unit for {info.label}</label>
            <select id={`${id}-unit`} className={`${select} max-w-[45%] font-bold`} {...register(`${name}.unit`)}>
              {units.map((u) => (
                <option key={u} value={u}>{ENTRY_UNIT_LABELS[u as keyof typeof ENTRY_UNIT_LABELS]}</option>
              ))}
            </select>
          </>
        ) : (
          <span className="flex items-center px-1 text-sm font-bold text-tide-700">{units[0] === 'pH' ? '' : units[0]}</span>
        )}
      </div>
      {valueError ? <p id={`${id}-error`} role="alert" className="mt-1 text-sm font-semibold text-ember-700">{valueError}</p> : null}

      {isSg ? (
        <div className="mt-3 grid gap-3 sm:grid-cols-2">
          <div role="radiogroup" aria-label="Read with">
            <p className="text-sm font-bold text-tide-800">Read with</p>
            <div className="mt-1 grid grid-cols-2 gap-2">
              {(['refractometer', 'hydrometer'] as const).map((m) => (
                <label key={m} className="flex min-h-touch cursor-pointer items-center justify-center rounded-xl px-2 text-sm font-bold ring-1 ring-tide-200 has-[:checked]:bg-tide-700 has-[:checked]:text-white">
                  <input type="radio" value={m} className="sr-only" {...register(`${name}.method`)} checked={entry.method === m || (m === 'refractometer' && entry.method === '')} />
                  {TEST_METHOD_LABELS[m]}
                </label>
              ))}
            </div>
          </div>
          <div>
            <label htmlFor={`${id}-ref`} className="text-sm font-bold text-tide-800">Instrument's reference temperature</label>
            <select id={`${id}-ref`} className={`${select} mt-1 w-full`} {...register(`${name}.referenceTempC`)}>
              {SG_REFERENCE_TEMPS_C.map((c) => (
                <option key={c} value={String(c)}>{referenceLabel(c)}</option>
              ))}
            </select>
            {errorOf('referenceTempC') ? <p role="alert" className="mt-1 text-sm font-semibold text-ember-700">{errorOf('referenceTempC')}</p> : null}
          </div>
        </div>
      ) : null}
      {sampleTemp ? (
        <div className="mt-3">
          <label htmlFor={`${id}-sample`} className="text-sm font-bold text-tide-800">Water temperature at the reading ({tempUnit}, optional)</label>
          <input id={`${id}-sample`} inputMode="decimal" autoComplete="off" className={`${select} mt-1 w-full`} {...register(`${name}.sampleTemp`)} />
          <p className="mt-1 text-sm text-tide-600">
            {entry.unit === 'mS/cm' ? 'Leave empty if your meter shows values corrected to 25 °C.' : "Leave empty to use this test's temperature."}
          </p>
          {errorOf('sampleTemp') ? <p role="alert" className="mt-1 text-sm font-semibold text-ember-700">{errorOf('sampleTemp')}</p> : null}
        </div>
      ) : null}

      {entry.value.trim() !== '' && !valueError ? <ReadingPreview parameter={parameter} normalized={normalized} profile={profile} prefs={prefs} enteredUnit={entry.unit} /> : null}

      <details className="mt-2">
        <summary className="flex min-h-touch cursor-pointer items-center text-sm font-bold text-tide-700">How you measured · note</summary>
        <div className="grid gap-3 pb-1 sm:grid-cols-2">
          {!isSg ? (
            <div>
              <label htmlFor={`${id}-method`} className="text-sm font-bold text-tide-800">Method</label>
              <select id={`${id}-method`} className={`${select} mt-1 w-full`} {...register(`${name}.method`)}>
                <option value="">Usual: {TEST_METHOD_LABELS[defaultMethodFor(parameter, entry.unit)]}</option>
                {TEST_METHODS.map((m) => (
                  <option key={m} value={m}>{TEST_METHOD_LABELS[m]}</option>
                ))}
              </select>
            </div>
          ) : null}
          <div>
            <label htmlFor={`${id}-note`} className="text-sm font-bold text-tide-800">Note on this reading</label>
            <input id={`${id}-note`} autoComplete="off" className={`${select} mt-1 w-full`} {...register(`${name}.note`)} />
            {errorOf('note') ? <p role="alert" className="mt-1 text-sm font-semibold text-ember-700">{errorOf('note')}</p> : null}
          </div>
        </div>
      </details>
    </fieldset>
  );
}
