import { useAbility } from '@casl/react';
import { useId, useState } from 'react';
import { useNavigate } from 'react-router';
import { asSubject, type AppAbility } from '@shared/abilities';
import { QUESTION_BODY_MAX, QUESTION_TITLE_MAX } from '@shared/schemas/question.schema';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/card';
import { TextAreaField, TextField } from '@client/components/ui/field';
import { ApiError } from '@client/lib/api-client';
import { useAskQuestion } from '../api/questions';
import { useDraft } from '../lib/use-draft';

interface Props {
  clubId: string;
  tankId: string;
  waterTestId?: string;
  eventId?: string;
  /** The tank's keeper: when given, the button only shows for people who may ask about this tank. */
  ownerId?: string;
  label?: string;
}

/** "Ask about this" beside a water test or an observation: a short form that opens the question's thread once sent. */
export function AskAboutReading({
  clubId,
  tankId,
  waterTestId,
  eventId,
  ownerId,
  label = 'Ask about this',
}: Props) {
  const ability = useAbility<AppAbility>();
  const about = waterTestId ?? eventId ?? '';
  const [open, setOpen] = useState(false);
  const [title, setTitle, clearTitle] = useDraft(`ask.${about}.title`);
  const [body, setBody, clearBody] = useDraft(`ask.${about}.body`);
  const ask = useAskQuestion(clubId, tankId);
  const navigate = useNavigate();
  const id = useId();
  if (ownerId && !ability.can('create', asSubject('Question', { clubId, askerId: ownerId }))) return null;

  const error = ask.error instanceof ApiError ? ask.error : undefined;
  const send = async () => {
    try {
      const res = await ask.mutateAsync({
        title,
        body,
        mentionIds: [],
        ...(waterTestId ? { waterTestId } : { eventId }),
      });
      clearTitle();
      clearBody();
      void navigate(`/questions/${res.question.id}`);
    } catch {
      // Shown below; the text stays in the form.
    }
  };

  if (!open) {
    return (
      <Button
        type="button"
        variant="secondary"
        onClick={() => setOpen(true)}
        aria-expanded={false}
        aria-controls={id}
      >
        <span aria-hidden>?</span> {label}
      </Button>
    );
  }
  return (
    <form
      id={id}
      aria-label="Ask your mentor about this reading"
      className="w-full space-y-3 rounded-card bg-tint p-4 ring-1 ring-line"
      onSubmit={(e) => {
        e.preventDefault();
        void send();
      }}
    >
      <TextField
        id={`${id}-title`}
        label="Your question"
        value={title}
        maxLength={QUESTION_TITLE_MAX}
        required
        onChange={(e) => setTitle(e.target.value)}
        placeholder="Is this nitrate OK for my seahorses?"
        error={error?.fieldMessage('title')}
      />
      <TextAreaField
        id={`${id}-body`}
        label="Details"
        value={body}
        rows={4}
        maxLength={QUESTION_BODY_MAX}
        required
        onChange={(e) => setBody(e.target.value)}
        placeholder="What you noticed, what you already tried…"
        hint="Your mentor sees the figures and concerns of this reading as they are now. **bold**, lists with “- ” and links work."
        error={error?.fieldMessage('body')}
      />
      {ask.isError && !error?.fieldMessage('title') && !error?.fieldMessage('body') ? (
        <Notice tone="error">
          {error ? error.message : 'Could not send: check your connection.'} Your text is kept: try again.
        </Notice>
      ) : null}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={ask.isPending}>
          Send question
        </Button>
        <Button type="button" variant="ghost" onClick={() => setOpen(false)}>
          Not now
        </Button>
      </div>
    </form>
  );
}
