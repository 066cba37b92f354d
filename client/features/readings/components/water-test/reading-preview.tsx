import { formatNumber, formatReading, parameterInfo, type ParameterKey } from '@shared/care/parameters';
import type { CareProfile } from '@shared/care/profiles';
import type { DerivedInput, FreeAmmoniaInput } from '@shared/readings/free-ammonia';
import type { NormalizedWaterTest } from '@shared/readings/normalize-water-test';
import type { SalinityDerivation } from '@shared/readings/salinity';
import { formatDisplay, type UnitPrefs } from '@client/lib/display-units';
import { verdictFor } from '@client/lib/bands';
import { relativeTime } from '@client/lib/relative-time';
import { issuesFor } from '../../lib/water-test-preview';
import { VerdictIcon, VerdictLine } from '@client/components/ui/verdict-mark';

const SOURCE_WORDS: Record<DerivedInput['source'], string> = {
  'this-test': 'this test',
  'last-known': 'last known',
  assumed: 'assumed',
};
const INPUT_NAMES: Record<FreeAmmoniaInput, string> = {
  temperature: 'temperature',
  pH: 'pH',
  salinity: 'salinity',
};

function describeInput(key: FreeAmmoniaInput, input: DerivedInput, prefs: UnitPrefs): string {
  const when = input.source === 'last-known' && input.takenAt ? `, ${relativeTime(input.takenAt)}` : '';
  const detail = input.source === 'assumed' && input.detail ? `: ${input.detail}` : '';
  const value =
    key === 'salinity' ? `${formatNumber('salinity', input.value)}` : formatDisplay(key, input.value, prefs);
  // formatDisplay already says "pH 8.1"; the others need their name.
  return `${key === 'pH' ? '' : `${INPUT_NAMES[key]} `}${value} (${SOURCE_WORDS[input.source]}${when}${detail})`;
}

function salinityWords(d: SalinityDerivation): string {
  if (d.from === 'mS/cm')
    return `from ${d.reading} mS/cm at ${formatNumber('temperature', d.sampleTempC)} °C`;
  const reference = `${formatNumber('temperature', d.referenceTempC ?? 25)} °C`;
  if (d.sampleTempSource === 'reference')
    return `from SG ${d.reading}, instrument referenced to ${reference}`;
  return `from SG ${d.reading} with the water at ${formatNumber('temperature', d.sampleTempC)} °C, referenced to ${reference}`;
}

function Warning({ text }: { text: string }) {
  return (
    <p className="flex items-start gap-1.5 text-sm font-semibold text-watch">
      <VerdictIcon level="caution" /> <span>{text}</span>
    </p>
  );
}

/** What the form will save for one parameter: converted and derived values, and how they sit against the profile. */
export function ReadingPreview({
  parameter,
  normalized,
  profile,
  prefs,
  enteredUnit,
}: {
  parameter: ParameterKey;
  normalized: NormalizedWaterTest;
  profile: CareProfile | undefined;
  prefs: UnitPrefs;
  enteredUnit: string;
}) {
  const value = normalized.values[parameter];
  const warnings = issuesFor(normalized.warnings, parameter);
  if (value === undefined)
    return warnings.length ? (
      <div className="mt-2 space-y-1">
        {warnings.map((w) => (
          <Warning key={w} text={w} />
        ))}
      </div>
    ) : null;
  const verdict = verdictFor(parameter, value, profile, prefs);
  const salinity = parameter === 'salinity' ? normalized.derived.salinity : undefined;
  const free = parameter === 'ammonia' ? normalized.derived.freeAmmonia : undefined;
  const converted = !salinity && enteredUnit !== parameterInfo(parameter).unit && parameter !== 'salinity';
  return (
    <div className="mt-2 space-y-1" aria-live="polite" data-testid={`preview-${parameter}`}>
      {salinity ? (
        <p className="text-sm text-ink-soft">
          <strong>Practical salinity {formatNumber('salinity', value)}</strong>{' '}
          <span className="text-ink-muted">({salinityWords(salinity)})</span>
        </p>
      ) : null}
      {converted ? (
        <p className="text-sm text-ink-muted">Saved as {formatReading(parameter, value)}.</p>
      ) : null}
      {verdict ? <VerdictLine verdict={verdict} /> : null}
      {free ? (
        free.value === null ? (
          <p className="text-sm text-ink-muted">Free ammonia could not be worked out: {free.reason}</p>
        ) : (
          <div className="rounded-lg bg-tint px-3 py-2">
            <p className="text-sm text-ink-soft">
              <strong>
                Free ammonia (the toxic part): {formatNumber('freeAmmonia', free.value)} mg/L NH3
              </strong>
            </p>
            <p className="text-xs text-ink-muted">
              From{' '}
              {(['pH', 'temperature', 'salinity'] as const)
                .map((k) => describeInput(k, free.inputs[k], prefs))
                .join('; ')}
              .
            </p>
            {(() => {
              const v = verdictFor('freeAmmonia', free.value, profile, prefs);
              return v ? <VerdictLine verdict={v} /> : null;
            })()}
          </div>
        )
      ) : null}
      {warnings.map((w) => (
        <Warning key={w} text={w} />
      ))}
    </div>
  );
}
