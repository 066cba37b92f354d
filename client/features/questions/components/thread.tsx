import type { PersonRef } from '@shared/schemas/notification-views';
import type { QuestionDetailView } from '@shared/schemas/question-views';
import { MarkdownLite } from './markdown-lite';
import { RelativeTime } from '@client/components/ui/relative-time';

function Message({
  author,
  at,
  body,
  names,
  isAsker,
}: {
  author: PersonRef;
  at: string;
  body: string;
  names: string[];
  isAsker: boolean;
}) {
  return (
    <li
      className={`rounded-card p-4 shadow-card ${isAsker ? 'bg-surface' : 'bg-ok-soft/40 ring-1 ring-ok/20'}`}
    >
      <p className="mb-2 flex flex-wrap items-baseline gap-x-2 text-sm">
        <span className="font-extrabold text-ink">{author.displayName}</span>
        {isAsker ? <span className="text-xs font-bold text-ink-muted">asked</span> : null}
        <RelativeTime at={at} className="text-ink-muted" />
      </p>
      <MarkdownLite text={body} mentionNames={names} />
    </li>
  );
}

/** The question and every reply, oldest first; the asker's messages and the answers look different. */
export function Thread({ detail }: { detail: QuestionDetailView }) {
  const { question, replies } = detail;
  const names = [
    ...new Set(
      [...detail.mentionable, question.asker, ...replies.map((r) => r.author)].map((p) => p.displayName),
    ),
  ];
  return (
    <ol aria-label="Thread" className="space-y-3">
      <Message author={question.asker} at={question.createdAt} body={question.body} names={names} isAsker />
      {replies.map((r) => (
        <Message
          key={r.id}
          author={r.author}
          at={r.createdAt}
          body={r.body}
          names={names}
          isAsker={r.author.userId === question.asker.userId}
        />
      ))}
    </ol>
  );
}
