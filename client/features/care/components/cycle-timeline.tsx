import { useState } from 'react';
import { formatDay } from '@client/lib/date-format';
import type { CareSummary } from '../api/care';

const STEPS = [
  {
    stage: 'not-started',
    label: 'Not started',
    hint: 'No ammonia seen yet: add an ammonia source to start the cycle.',
  },
  { stage: 'ammonia-rising', label: 'Ammonia', hint: 'Bacteria are starting; ammonia is up.' },
  { stage: 'nitrite-rising', label: 'Nitrite up', hint: 'Ammonia is being turned into nitrite.' },
  { stage: 'nitrite-falling', label: 'Nitrite down', hint: 'Nitrite is being turned into nitrate.' },
  { stage: 'cycled', label: 'Cycled', hint: 'Ammonia and nitrite read zero with nitrate present.' },
] as const;

/** Where the tank is in the nitrogen cycle, today's position, and when it is likely done. */
export function CycleTimeline({
  cycle,
  typical,
  phase,
}: {
  cycle: CareSummary['cycle'];
  typical: CareSummary['cycleTypical'];
  phase: 'cycling' | 'established';
}) {
  const [openedAt] = useState(() => Date.now());
  const setback = cycle.stage === 'setback';
  if (phase === 'established' && !setback) {
    return (
      <section aria-labelledby="cycle-heading">
        <h3 id="cycle-heading" className="text-sm font-extrabold uppercase tracking-wide text-ink-muted">
          Nitrogen cycle
        </h3>
        <p className="mt-2 text-sm text-ink-soft">
          Established: the cycle is behind this tank. If ammonia or nitrite come back, it shows here as a
          setback.
        </p>
      </section>
    );
  }
  const index = setback ? -1 : STEPS.findIndex((s) => s.stage === cycle.stage);
  const current = STEPS[index];
  return (
    <section aria-labelledby="cycle-heading">
      <h3 id="cycle-heading" className="text-sm font-extrabold uppercase tracking-wide text-ink-muted">
        Nitrogen cycle
      </h3>
      {setback ? (
        <p className="mt-2 rounded-xl bg-danger-soft px-3 py-2 font-bold text-danger">
          ▲ Setback: ammonia or nitrite is back on a tank that had cycled. Stop adding animals, feed lightly
          and test daily.
        </p>
      ) : (
        <ol className="mt-3 grid grid-cols-5 gap-1" aria-label="Cycle stages">
          {STEPS.map((s, i) => (
            <li key={s.stage} aria-current={i === index ? 'step' : undefined} className="text-center">
              <div
                className={`h-2 rounded-full ${i < index ? 'bg-ok' : i === index ? 'bg-accent' : 'bg-tint-strong'}`}
              />
              <p
                className={`mt-1 text-[11px] leading-tight sm:text-xs ${i === index ? 'font-extrabold text-ink' : 'text-ink-muted'}`}
              >
                {i === index ? '▼ ' : ''}
                {s.label}
              </p>
            </li>
          ))}
        </ol>
      )}
      {current ? <p className="mt-2 text-sm text-ink-soft">{current.hint}</p> : null}
      {cycle.projectedDoneAt ? (
        <p className="mt-1 text-sm text-ink-muted">
          {Date.parse(cycle.projectedDoneAt.likely) <= openedAt ? (
            <>
              Could finish <strong>any day now</strong>, or as late as{' '}
              {formatDay(cycle.projectedDoneAt.latest)}.
            </>
          ) : (
            <>
              Likely done around <strong>{formatDay(cycle.projectedDoneAt.likely)}</strong> (between{' '}
              {formatDay(cycle.projectedDoneAt.earliest)} and {formatDay(cycle.projectedDoneAt.latest)}).
            </>
          )}{' '}
          A cycle usually takes {typical.typicalMin}–{typical.typicalMax} weeks, sometimes {typical.rangeMin}–
          {typical.rangeMax} ({typical.provenance}).
        </p>
      ) : null}
      {cycle.evidence.length ? (
        <details className="mt-1 text-sm text-ink-muted">
          <summary className="cursor-pointer font-bold">Why we think so</summary>
          <ul className="mt-1 list-disc pl-5">
            {cycle.evidence.map((e) => (
              <li key={e}>{e}</li>
            ))}
          </ul>
        </details>
      ) : null}
    </section>
  );
}
