import { useId, useRef, useState } from 'react';
import { mentionedIn } from '@shared/questions/mentions';
import type { PersonRef } from '@shared/schemas/notification-views';
import { QUESTION_BODY_MAX } from '@shared/schemas/question.schema';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/card';
import { Textarea } from '@client/components/ui/field';
import { ApiError } from '@client/lib/api-client';
import { useReply } from '../api/questions';
import { insertMention, mentionAtCaret } from '../lib/mention-query';
import { useDraft } from '../lib/use-draft';

/** Reply with "@" to name a mentor or admin: a list of who may read the question opens as you type. */
export function ReplyBox({
  clubId,
  questionId,
  mentionable,
}: {
  clubId: string;
  questionId: string;
  mentionable: PersonRef[];
}) {
  const [text, setText, clear] = useDraft(`reply.${questionId}`);
  const [at, setAt] = useState<{ start: number; query: string } | null>(null);
  const [sent, setSent] = useState<PersonRef[] | null>(null);
  const area = useRef<HTMLTextAreaElement>(null);
  const reply = useReply(clubId, questionId);
  const id = useId();
  const matches = at
    ? mentionable.filter((p) => p.displayName.toLowerCase().includes(at.query.toLowerCase())).slice(0, 6)
    : [];

  const track = (value: string, caret: number) => {
    setText(value);
    setAt(mentionAtCaret(value, caret));
  };
  const pick = (p: PersonRef) => {
    if (!at) return;
    const next = insertMention(text, at, p.displayName);
    setText(next.text);
    setAt(null);
    requestAnimationFrame(() => {
      area.current?.focus();
      area.current?.setSelectionRange(next.caret, next.caret);
    });
  };
  const startMention = () => {
    const base = `${text}${text && !/\s$/.test(text) ? ' ' : ''}@`;
    setText(base);
    setAt({ start: base.length - 1, query: '' });
    requestAnimationFrame(() => {
      area.current?.focus();
      area.current?.setSelectionRange(base.length, base.length);
    });
  };
  const send = async () => {
    setSent(null);
    try {
      const res = await reply.mutateAsync({ body: text, mentionIds: mentionedIn(text, mentionable) });
      clear();
      setSent(res.mentioned);
    } catch {
      // Shown below; the draft stays.
    }
  };
  const error = reply.error instanceof ApiError ? reply.error : undefined;

  return (
    <form
      aria-label="Reply"
      className="space-y-2"
      onSubmit={(e) => {
        e.preventDefault();
        void send();
      }}
    >
      <label htmlFor={`${id}-text`} className="block text-sm font-bold text-ink-soft">
        Your reply
      </label>
      <div className="relative">
        <Textarea
          ref={area}
          id={`${id}-text`}
          rows={4}
          value={text}
          maxLength={QUESTION_BODY_MAX}
          required
          aria-invalid={error?.fieldMessage('body') ? true : undefined}
          onChange={(e) => track(e.target.value, e.target.selectionStart)}
          onKeyUp={(e) => setAt(mentionAtCaret(e.currentTarget.value, e.currentTarget.selectionStart))}
          onKeyDown={(e) => {
            if (e.key === 'Escape') setAt(null);
          }}
          placeholder="Type @ to mention a mentor or admin"
          className="w-full"
        />
        {at ? (
          <div
            role="listbox"
            aria-label="Mention someone"
            className="absolute inset-x-0 top-full z-10 mt-1 overflow-hidden rounded-xl bg-surface shadow-card ring-1 ring-line"
          >
            {matches.length === 0 ? (
              <p className="px-4 py-3 text-sm text-ink-muted">
                {mentionable.length
                  ? 'Nobody by that name can see this question.'
                  : 'No mentor or admin to mention here.'}
              </p>
            ) : (
              matches.map((p) => (
                <button
                  key={p.userId}
                  type="button"
                  role="option"
                  aria-selected={false}
                  onClick={() => pick(p)}
                  className="block min-h-touch w-full px-4 text-left font-bold text-ink-soft hover:bg-tint"
                >
                  @{p.displayName}
                </button>
              ))
            )}
          </div>
        ) : null}
      </div>
      <p className="text-sm text-ink-muted">
        **bold**, lists with “- ” or “1. ”, and links work. Only the people listed when you type @ can be
        mentioned.
      </p>
      {error?.fieldMessage('body') ? (
        <p role="alert" className="text-sm font-semibold text-danger">
          {error.fieldMessage('body')}
        </p>
      ) : null}
      {reply.isError && !error?.fieldMessage('body') ? (
        <Notice tone="error">
          {error ? error.message : 'Could not send: check your connection.'} Your reply is kept: try again.
        </Notice>
      ) : null}
      {sent ? (
        <Notice tone="success">
          Sent.{sent.length ? ` ${sent.map((p) => p.displayName).join(', ')} will be told.` : ''}
        </Notice>
      ) : null}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={reply.isPending}>
          Send reply
        </Button>
        {mentionable.length ? (
          <Button type="button" variant="secondary" onClick={startMention}>
            @ Mention
          </Button>
        ) : null}
      </div>
    </form>
  );
}
