import { useState } from 'react';
import { CartesianGrid, ComposedChart, Line, ReferenceArea, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { parameterInfo, PARAMETER_KEYS, type ParameterKey } from '../../../../shared/care/parameters';
import { severityRank } from '../../../../shared/care';
import type { ChartReading, QuestionSnapshot } from '../../../../shared/schemas/question-views';
import { Card } from '../../../components/ui/card';
import { figureUnit, formatDateTime, formatDay, formatFigure, toFigure, type FigurePrefs } from '../lib/figures';

const DAY_MS = 86_400_000;
const WINDOW_DAYS = 14;
const COLOURS = { line: '#18576b', grid: '#d4eef3', ideal: '#2f8f4e', marker: '#9c2a1b', axis: '#1a6c84' } as const;

/** The parameter to open on: the one the worst concern was about, else the first one the test measured. */
function firstParameter(snapshot: QuestionSnapshot, available: ParameterKey[]): ParameterKey | undefined {
  const worst = [...snapshot.concerns].sort((a, b) => severityRank(b.severity) - severityRank(a.severity)).map((c) => (c.parameter === 'freeAmmonia' ? 'ammonia' : c.parameter));
  const measured = snapshot.subject.kind === 'water-test' ? Object.keys(snapshot.subject.values) : [];
  return [...worst, ...measured].find((k): k is ParameterKey => available.includes(k as ParameterKey)) ?? available[0];
}

function TooltipBody({ active, payload, unit }: { active?: boolean; payload?: readonly { value?: unknown; payload?: { t: number } }[]; unit: string }) {
  const p = payload?.[0];
  if (!active || !p?.payload || typeof p.value !== 'number') return null;
  return (
    <div className="rounded-lg bg-white px-3 py-2 text-sm shadow-card ring-1 ring-tide-100">
      <p className="font-bold text-tide-900">{formatDateTime(p.payload.t)}</p>
      <p className="font-semibold text-tide-800">{p.value}{unit ? ` ${unit}` : ''}</p>
    </div>
  );
}

/** The tank's readings two weeks either side of the question's date, one parameter at a time, the date marked. */
export function ReadingsChart({ readings, snapshot, prefs }: { readings: ChartReading[]; snapshot: QuestionSnapshot; prefs: FigurePrefs }) {
  const available = PARAMETER_KEYS.filter((k) => readings.some((r) => r.values[k] !== undefined));
  const [chosen, setChosen] = useState<ParameterKey | undefined>(() => firstParameter(snapshot, available));
  const at = Date.parse(snapshot.subject.kind === 'water-test' ? snapshot.subject.takenAt : snapshot.subject.occurredAt);
  const key = chosen && available.includes(chosen) ? chosen : available[0];
  if (!key) return <Card><p className="text-tide-700">No water tests in the two weeks either side of this date.</p></Card>;

  const unit = figureUnit(key, prefs);
  const decimals = key === 'salinity' && prefs.salinityDisplay === 'sg' ? 4 : parameterInfo(key).decimals;
  const points = readings.flatMap((r) => (r.values[key] === undefined ? [] : [{ t: Date.parse(r.takenAt), v: Number(toFigure(key, r.values[key]!, prefs).toFixed(decimals)) }]));
  const band = snapshot.profile?.ranges[key]?.ideal;
  const ideal = band ? ([toFigure(key, band[0], prefs), toFigure(key, band[1], prefs)] as const) : undefined;
  const latest = readings.filter((r) => r.values[key] !== undefined).at(-1);
  const summary = `${parameterInfo(key).label}: ${points.length} readings between ${formatDay(at - WINDOW_DAYS * DAY_MS)} and ${formatDay(at + WINDOW_DAYS * DAY_MS)}${latest ? `, the last ${formatFigure(key, latest.values[key]!, prefs)}` : ''}.`;

  return (
    <Card>
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 className="text-lg font-extrabold text-tide-900">Readings around that date</h2>
        <div role="group" aria-label="Parameter shown" className="flex flex-wrap gap-1">
          {available.map((k) => (
            <button key={k} type="button" aria-pressed={k === key} onClick={() => setChosen(k)} className={`min-h-touch rounded-full px-3 text-sm font-bold ${k === key ? 'bg-tide-700 text-white' : 'bg-tide-50 text-tide-700 hover:bg-tide-100'}`}>
              {parameterInfo(k).label}
            </button>
          ))}
        </div>
      </div>
      <div role="img" aria-label={summary} className="mt-3 h-56" data-chart={key}>
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart data={points} margin={{ top: 16, right: 8, bottom: 0, left: 0 }}>
            <CartesianGrid stroke={COLOURS.grid} vertical={false} />
            <XAxis dataKey="t" type="number" scale="time" domain={[at - WINDOW_DAYS * DAY_MS, at + WINDOW_DAYS * DAY_MS]} tickFormatter={formatDay} stroke={COLOURS.axis} fontSize={12} minTickGap={28} />
            <YAxis width={52} stroke={COLOURS.axis} fontSize={12} domain={['auto', 'auto']} allowDecimals />
            {ideal ? <ReferenceArea y1={ideal[0]} y2={ideal[1]} fill={COLOURS.ideal} fillOpacity={0.15} ifOverflow="extendDomain" /> : null}
            <ReferenceLine x={at} stroke={COLOURS.marker} strokeDasharray="4 3" label={{ value: 'Asked about', position: 'insideTopLeft', fontSize: 11, fill: COLOURS.marker }} />
            <Tooltip content={<TooltipBody unit={unit} />} />
            <Line type="monotone" dataKey="v" name={parameterInfo(key).label} stroke={COLOURS.line} strokeWidth={2} dot={{ r: 3.5, fill: COLOURS.line }} isAnimationActive={false} />
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <p className="mt-2 text-sm text-tide-700">
        Dashed line: the reading asked about.{ideal ? ' Green band: the profile’s ideal range when asked.' : ''} The line shows the tank’s tests as they are today.
      </p>
    </Card>
  );
}
