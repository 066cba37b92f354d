import { useQueryClient } from '@tanstack/react-query';
import { PARAMETER_KEYS } from '@shared/care/parameters';
import { Notice } from '@client/components/ui/card';
import { Loading } from '@client/components/ui/skeleton';
import { useSocketEvent } from '@client/lib/socket';
import { questionKeys } from '../api/questions';
import { recentReadingsQuery, useRecentReadings } from '../api/recent-readings';
import { describeObservation } from '@client/lib/describe-event';
import { formatDayTime } from '@client/lib/date-format';
import { formatLabelled, type ReadingPrefs } from '@client/lib/display-units';
import { AskAboutReading } from './ask-about-reading';
import { QuestionList } from './question-list';

function Row({ when, summary, children }: { when: string; summary: string; children: React.ReactNode }) {
  return (
    <li className="flex flex-wrap items-center justify-between gap-2 py-3">
      <div className="min-w-0">
        <p className="font-bold text-ink">{formatDayTime(when)}</p>
        <p className="text-sm text-ink-muted">{summary}</p>
      </div>
      {children}
    </li>
  );
}

/**
 * On the tank page: the latest tests and observations, each with "Ask about this", and the questions already asked
 * about the tank.
 */
export function AskAboutRecent({
  clubId,
  tankId,
  ownerId,
  prefs,
  canAsk,
}: {
  clubId: string;
  tankId: string;
  ownerId: string;
  prefs: ReadingPrefs;
  canAsk: boolean;
}) {
  const recent = useRecentReadings(clubId, tankId);
  const qc = useQueryClient();
  // A new test, a reply or a changed status on this tank: the lists here follow without a reload.
  useSocketEvent('tankChanged', (p) => {
    if (p.tankId !== tankId) return;
    void qc.invalidateQueries({ queryKey: recentReadingsQuery(clubId, tankId).queryKey });
    void qc.invalidateQueries({ queryKey: questionKeys.lists(clubId) });
  });
  return (
    <div className="space-y-4">
      {canAsk ? (
        recent.isPending ? (
          <Loading label="Loading recent readings…" />
        ) : recent.isError ? (
          <Notice tone="error">Could not load recent readings: {recent.error.message}</Notice>
        ) : recent.data.tests.length + recent.data.observations.length === 0 ? (
          <p className="text-ink-muted">
            Log a water test or an observation first, then ask your mentor about it here.
          </p>
        ) : (
          <ul className="divide-y divide-line" aria-label="Recent readings to ask about">
            {recent.data.tests.map((t) => (
              <Row
                key={t.id}
                when={t.takenAt}
                summary={PARAMETER_KEYS.filter((k) => t.values[k] !== undefined)
                  .map((k) => formatLabelled(k, t.values[k]!, prefs))
                  .join(' · ')}
              >
                <AskAboutReading clubId={clubId} tankId={tankId} waterTestId={t.id} ownerId={ownerId} />
              </Row>
            ))}
            {recent.data.observations.map((e) => (
              <Row
                key={e.id}
                when={e.occurredAt}
                summary={`Observation: ${describeObservation(e.details).join(' · ')}`}
              >
                <AskAboutReading clubId={clubId} tankId={tankId} eventId={e.id} ownerId={ownerId} />
              </Row>
            ))}
          </ul>
        )
      ) : null}
      <div>
        <h3 className="mb-2 text-sm font-extrabold uppercase tracking-wide text-ink-muted">
          Questions about this tank
        </h3>
        <QuestionList
          clubId={clubId}
          status="all"
          tankId={tankId}
          showAsker={!canAsk}
          empty="No questions about this tank yet."
        />
      </div>
    </div>
  );
}
