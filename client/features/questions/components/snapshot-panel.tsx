import { useState } from 'react';
import { severityRank } from '@shared/care';
import { parameterInfo, PARAMETER_KEYS } from '@shared/care/parameters';
import type { QuestionSnapshot } from '@shared/schemas/question-views';
import { Card } from '@client/components/ui/card';
import { describeObservation } from '@client/lib/describe-event';
import { formatDayTime } from '@client/lib/date-format';
import { formatDisplay, type ReadingPrefs } from '@client/lib/display-units';
import { SeverityBadge } from '@client/components/ui/severity-badge';

function Figures({ snapshot, prefs }: { snapshot: QuestionSnapshot; prefs: ReadingPrefs }) {
  const s = snapshot.subject;
  if (s.kind === 'observation') {
    return (
      <ul className="space-y-1 text-ink">
        {describeObservation(s.details).map((line) => (
          <li key={line}>{line}</li>
        ))}
        {s.note ? <li className="text-ink-muted">Note: {s.note}</li> : null}
      </ul>
    );
  }
  const keys = PARAMETER_KEYS.filter((k) => s.values[k] !== undefined);
  return (
    <>
      <dl className="grid grid-cols-2 gap-2">
        {keys.map((k) => (
          <div key={k} className="rounded-xl bg-tint px-3 py-2" data-figure={k}>
            <dt className="text-xs font-bold uppercase tracking-wide text-ink-muted">
              {parameterInfo(k).label}
            </dt>
            <dd className="text-lg font-extrabold text-ink">{formatDisplay(k, s.values[k]!, prefs)}</dd>
          </div>
        ))}
        {s.freeAmmonia !== null ? (
          <div className="rounded-xl bg-tint px-3 py-2" data-figure="freeAmmonia">
            <dt className="text-xs font-bold uppercase tracking-wide text-ink-muted">
              {parameterInfo('freeAmmonia').label}
            </dt>
            <dd className="text-lg font-extrabold text-ink">
              {formatDisplay('freeAmmonia', s.freeAmmonia, prefs)}
            </dd>
          </div>
        ) : null}
      </dl>
      {s.note ? <p className="mt-2 text-ink-muted">Note: {s.note}</p> : null}
    </>
  );
}

/** Overdue-test reminders can run long: the worst few show, the rest on request. */
const FIRST_CONCERNS = 3;

/** What the question was asked about, exactly as it stood then. */
export function SnapshotPanel({ snapshot, prefs }: { snapshot: QuestionSnapshot; prefs: ReadingPrefs }) {
  const s = snapshot.subject;
  const at = s.kind === 'water-test' ? s.takenAt : s.occurredAt;
  const [all, setAll] = useState(false);
  // Worst first; a stable sort keeps the newest first within a severity.
  const concerns = [...snapshot.concerns].sort((a, b) => severityRank(b.severity) - severityRank(a.severity));
  const shown = all ? concerns : concerns.slice(0, FIRST_CONCERNS);
  return (
    <Card className="space-y-4">
      <header>
        <h2 className="text-lg font-extrabold text-ink">
          {s.kind === 'water-test' ? 'The water test' : 'The observation'} · {formatDayTime(at)}
        </h2>
        <p className="text-sm text-ink-muted">
          {snapshot.tank.name}
          {snapshot.profile ? (
            <>
              {' '}
              · judged by the <strong>{snapshot.profile.name}</strong> profile (version{' '}
              {snapshot.profile.version})
            </>
          ) : null}{' '}
          · as it stood when asked, {formatDayTime(snapshot.takenAt)}
        </p>
      </header>
      <Figures snapshot={snapshot} prefs={prefs} />
      <section aria-labelledby="snapshot-concerns">
        <h3 id="snapshot-concerns" className="text-sm font-extrabold uppercase tracking-wide text-ink-muted">
          Concerns open then
        </h3>
        {snapshot.concerns.length === 0 ? (
          <p className="mt-1 text-ink-soft">None were open on the tank.</p>
        ) : (
          <>
            <ul className="mt-1 divide-y divide-line">
              {shown.map((c) => (
                <li key={c.id} className="py-2">
                  <div className="flex flex-wrap items-center gap-2">
                    <SeverityBadge severity={c.severity} />
                    {c.status === 'acknowledged' ? (
                      <span className="text-xs font-bold text-ink-muted">seen by a mentor</span>
                    ) : null}
                  </div>
                  <p className="mt-1 font-bold text-ink">{c.reason}</p>
                </li>
              ))}
            </ul>
            {concerns.length > FIRST_CONCERNS ? (
              <button
                type="button"
                className="min-h-touch text-sm font-bold text-link underline"
                aria-expanded={all}
                onClick={() => setAll((v) => !v)}
              >
                {all ? 'Show fewer' : `Show all ${concerns.length} concerns`}
              </button>
            ) : null}
          </>
        )}
      </section>
    </Card>
  );
}
