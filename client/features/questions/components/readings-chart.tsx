import { useState } from 'react';
import { parameterInfo, PARAMETER_KEYS, type ParameterKey } from '@shared/care/parameters';
import { severityRank } from '@shared/care';
import { DAY_MS } from '@shared/care/time';
import type { ChartReading, QuestionSnapshot } from '@shared/schemas/question-views';
import { ParameterLineChart } from '@client/components/charts/parameter-line-chart';
import { Card } from '@client/components/ui/card';
import { CHART_COLOURS, seriesOf } from '@client/lib/chart-data';
import { formatDay } from '@client/lib/date-format';
import { formatDisplay, type UnitPrefs } from '@client/lib/display-units';

const WINDOW_DAYS = 14;

/** The parameter to open on: the one the worst concern was about, else the first one the test measured. */
function firstParameter(snapshot: QuestionSnapshot, available: ParameterKey[]): ParameterKey | undefined {
  const worst = [...snapshot.concerns]
    .sort((a, b) => severityRank(b.severity) - severityRank(a.severity))
    .map((c) => (c.parameter === 'freeAmmonia' ? 'ammonia' : c.parameter));
  const measured = snapshot.subject.kind === 'water-test' ? Object.keys(snapshot.subject.values) : [];
  return (
    [...worst, ...measured].find((k): k is ParameterKey => available.includes(k as ParameterKey)) ??
    available[0]
  );
}

/** The tank's readings two weeks either side of the question's date, one parameter at a time, the date marked. */
export function ReadingsChart({
  readings,
  snapshot,
  prefs,
}: {
  readings: ChartReading[];
  snapshot: QuestionSnapshot;
  prefs: UnitPrefs;
}) {
  const available = PARAMETER_KEYS.filter((k) => readings.some((r) => r.values[k] !== undefined));
  const [chosen, setChosen] = useState<ParameterKey | undefined>(() => firstParameter(snapshot, available));
  const at = Date.parse(
    snapshot.subject.kind === 'water-test' ? snapshot.subject.takenAt : snapshot.subject.occurredAt,
  );
  const key = chosen && available.includes(chosen) ? chosen : available[0];
  if (!key)
    return (
      <Card>
        <p className="text-ink-muted">No water tests in the two weeks either side of this date.</p>
      </Card>
    );

  const span = [at - WINDOW_DAYS * DAY_MS, at + WINDOW_DAYS * DAY_MS] as const;
  const points = seriesOf(readings, key, prefs);
  const range = snapshot.profile?.ranges[key];
  const latest = readings.filter((r) => r.values[key] !== undefined).at(-1);
  const summary = `${parameterInfo(key).label}: ${points.length} readings between ${formatDay(span[0])} and ${formatDay(span[1])}${latest ? `, the last ${formatDisplay(key, latest.values[key]!, prefs)}` : ''}.`;

  return (
    <Card>
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 className="text-lg font-extrabold text-ink">Readings around that date</h2>
        <div role="group" aria-label="Parameter shown" className="flex flex-wrap gap-1">
          {available.map((k) => (
            <button
              key={k}
              type="button"
              aria-pressed={k === key}
              onClick={() => setChosen(k)}
              className={`min-h-touch rounded-full px-3 text-sm font-bold ${k === key ? 'bg-accent text-on-accent' : 'bg-tint text-link hover:bg-tint-strong'}`}
            >
              {parameterInfo(k).label}
            </button>
          ))}
        </div>
      </div>
      <div data-chart={key}>
        <ParameterLineChart
          parameter={key}
          points={points}
          prefs={prefs}
          range={range}
          span={span}
          markers={[{ at, label: 'Asked about', colour: CHART_COLOURS.marker, position: 'insideTopLeft' }]}
          summary={summary}
          className="mt-3 h-56"
        />
      </div>
      <p className="mt-2 text-sm text-ink-muted">
        Dashed line: the reading asked about.
        {range
          ? ` Green ${range.ideal[0] === range.ideal[1] ? 'line' : 'band'}: the profile’s ideal range when asked.`
          : ''}{' '}
        The line shows the tank’s tests as they are today.
      </p>
    </Card>
  );
}
