import { Link } from 'react-router';
import type { QuestionSummaryView } from '@shared/schemas/question-views';
import { Card, Notice } from '@client/components/ui/card';
import { Loading } from '@client/components/ui/skeleton';
import { RelativeTime } from '@client/components/ui/relative-time';
import { useQuestions, type ListStatus } from '../api/questions';

function StatusMark({ q }: { q: QuestionSummaryView }) {
  if (q.status === 'answered')
    return (
      <span className="rounded-full bg-ok-soft px-2 py-0.5 text-xs font-extrabold text-ok">✓ Answered</span>
    );
  if (q.awaitingAnswer)
    return (
      <span className="rounded-full bg-watch-soft px-2 py-0.5 text-xs font-extrabold text-watch">
        ● Waiting for an answer
      </span>
    );
  return (
    <span className="rounded-full bg-tint px-2 py-0.5 text-xs font-extrabold text-ink-muted">↩ Replied</span>
  );
}

export function QuestionRow({ q, showAsker }: { q: QuestionSummaryView; showAsker: boolean }) {
  return (
    <li>
      <Link
        to={`/questions/${q.id}`}
        className="block min-h-touch rounded-card bg-surface p-4 shadow-card ring-focus hover:ring-2 focus-visible:ring-2"
      >
        <div className="flex flex-wrap items-center gap-2">
          <StatusMark q={q} />
          <span className="text-xs text-ink-muted">
            {q.about.kind === 'water-test' ? 'Water test' : 'Observation'} · {q.tankName}
          </span>
        </div>
        <p className="mt-1 text-lg font-extrabold text-ink">{q.title}</p>
        <p className="text-sm text-ink-muted">
          {showAsker ? `${q.asker.displayName} · ` : ''}
          {q.replyCount === 0
            ? 'no replies yet'
            : `${q.replyCount} ${q.replyCount === 1 ? 'reply' : 'replies'}`}{' '}
          · <RelativeTime at={q.lastActivityAt} />
        </p>
      </Link>
    </li>
  );
}

/** Questions of the club the viewer may read, with loading, empty and error states. */
export function QuestionList({
  clubId,
  status,
  tankId,
  showAsker,
  empty,
}: {
  clubId: string;
  status: ListStatus;
  tankId?: string;
  showAsker: boolean;
  empty: string;
}) {
  const list = useQuestions(clubId, { status, tankId });
  if (list.isPending)
    return (
      <Card>
        <Loading label="Loading questions…" />
      </Card>
    );
  if (list.isError) return <Notice tone="error">Could not load the questions: {list.error.message}</Notice>;
  if (list.data.length === 0)
    return (
      <Card>
        <p className="text-ink-muted">{empty}</p>
      </Card>
    );
  return (
    <ul className="space-y-3">
      {list.data.map((q) => (
        <QuestionRow key={q.id} q={q} showAsker={showAsker} />
      ))}
    </ul>
  );
}
