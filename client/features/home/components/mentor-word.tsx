import { Link } from 'react-router';
import { parameterInfo, isParameterKey } from '@shared/care/parameters';
import type { HomeGoodNews, HomeQuestion } from '@shared/schemas/home-views';
import { Card } from '@client/components/ui/card';
import { relativeTime } from '@client/lib/relative-time';

function GoodNewsItem({ item }: { item: HomeGoodNews }) {
  const what =
    item.kind === 'signed-off'
      ? `${item.by.displayName} signed off ${item.tankName}: it is ready for animals.`
      : `${item.by.displayName} resolved ${isParameterKey(item.parameter) ? `the ${parameterInfo(item.parameter).label} concern` : 'a concern'} on ${item.tankName}.`;
  return (
    <li className="rounded-xl bg-ok-soft px-3 py-2 text-sm text-ok ring-1 ring-ok/30">
      <Link to={`/tanks/${item.tankId}`} className="block">
        <p className="font-bold">
          <span aria-hidden>✓ </span>
          {what}
        </p>
        {item.note ? <p className="mt-0.5 text-ink">“{item.note}”</p> : null}
        <p className="mt-0.5 text-xs text-ink-muted">{relativeTime(item.at)}</p>
      </Link>
    </li>
  );
}

function QuestionItem({ q, onOpen }: { q: HomeQuestion; onOpen: (q: HomeQuestion) => void }) {
  const unread = q.unreadNotificationIds.length > 0;
  return (
    <li>
      <Link
        to={`/questions/${q.id}`}
        onClick={() => onOpen(q)}
        className={`block rounded-xl px-3 py-2 ring-1 hover:bg-tint ${unread ? 'bg-tint ring-focus' : 'bg-surface ring-line'}`}
      >
        <p className="flex flex-wrap items-center gap-2">
          {unread ? (
            <span className="rounded-full bg-accent px-2 py-0.5 text-xs font-extrabold text-on-accent">
              New reply
            </span>
          ) : null}
          <span className="font-bold text-ink">{q.title}</span>
        </p>
        {q.lastReply ? (
          <p className="mt-1 text-sm text-ink-soft">
            <strong>{q.lastReply.author.displayName}:</strong> {q.lastReply.excerpt}
          </p>
        ) : (
          <p className="mt-1 text-sm text-ink-muted">Waiting for an answer.</p>
        )}
        <p className="mt-0.5 text-xs text-ink-muted">
          {q.tankName} · {relativeTime(q.lastActivityAt)}
          {q.status === 'answered' ? ' · marked answered' : ''}
        </p>
      </Link>
    </li>
  );
}

/** Replies and open questions, newest first, and the mentor's good news: what the member should read today. */
export function MentorWord({
  questions,
  goodNews,
  onOpenQuestion,
}: {
  questions: HomeQuestion[];
  goodNews: HomeGoodNews[];
  onOpenQuestion: (q: HomeQuestion) => void;
}) {
  return (
    <Card>
      <h2 className="text-lg font-extrabold text-ink">Questions and news</h2>
      {goodNews.length ? (
        <ul className="mt-3 space-y-2" aria-label="Good news">
          {goodNews.map((g) => (
            <GoodNewsItem key={`${g.kind}-${g.tankId}-${g.at}`} item={g} />
          ))}
        </ul>
      ) : null}
      {questions.length ? (
        <ul className="mt-3 space-y-2" aria-label="Your questions">
          {questions.map((q) => (
            <QuestionItem key={q.id} q={q} onOpen={onOpenQuestion} />
          ))}
        </ul>
      ) : (
        <p className="mt-2 text-sm text-ink-muted">
          No open questions. Unsure about a reading? Open the test on your tank’s page and ask your mentor
          about it.
        </p>
      )}
      <Link
        to="/questions"
        className="mt-3 inline-flex min-h-touch items-center text-sm font-bold text-link underline"
      >
        All questions
      </Link>
    </Card>
  );
}
