import { useQueryClient } from '@tanstack/react-query';
import { useId, useState } from 'react';
import { MENTOR_REQUEST_NOTE_MAX } from '@shared/constants/mentorship';
import { Button } from '@client/components/ui/button';
import { Card, Notice } from '@client/components/ui/card';
import { Loading } from '@client/components/ui/skeleton';
import { TextAreaField } from '@client/components/ui/field';
import { RelativeTime } from '@client/components/ui/relative-time';
import { ApiError } from '@client/lib/api-client';
import { useSocketEvent } from '@client/lib/socket';
import { useMembers } from '../api/club';
import { mentorRequestKeys, useAskForMentor, useMyRequest } from '../api/mentor-requests';
import { mentorOptions, MentorSelect } from './mentor-choice';

function AskForm({ clubId, userId }: { clubId: string; userId: string }) {
  const members = useMembers(clubId);
  const ask = useAskForMentor(clubId);
  const [note, setNote] = useState('');
  const [preferred, setPreferred] = useState('');
  const noteId = useId();
  const options = mentorOptions(members.data?.members ?? [], userId);
  const error = ask.error instanceof ApiError ? ask.error : undefined;
  return (
    <form
      className="mt-3 space-y-3"
      onSubmit={(e) => {
        e.preventDefault();
        ask.mutate({ note: note.trim() || undefined, preferredMentorId: preferred || undefined });
      }}
    >
      {ask.isError ? (
        <Notice tone="error">
          {error?.message ?? 'Could not send your request. Check your connection and try again.'}
        </Notice>
      ) : null}
      <TextAreaField
        id={noteId}
        label="What would you like help with? (optional)"
        value={note}
        maxLength={MENTOR_REQUEST_NOTE_MAX}
        onChange={(e) => setNote(e.target.value)}
        placeholder="e.g. My first tropical tank, 60 litres, cycling since last week."
        error={error?.fieldMessage('note')}
      />
      {options.length ? (
        <MentorSelect
          id={`${noteId}-mentor`}
          label="Someone in mind? (optional)"
          placeholder="Let the admins choose"
          value={preferred}
          onChange={setPreferred}
          options={options}
        />
      ) : null}
      <Button type="submit" busy={ask.isPending}>
        Ask for a mentor
      </Button>
    </form>
  );
}

/** On a member's home: ask for a mentor, see the request waiting or answered, or who their mentor is. */
export function AskForMentorCard({ clubId, userId }: { clubId: string; userId: string }) {
  const qc = useQueryClient();
  const mine = useMyRequest(clubId);
  useSocketEvent('notification', ({ notification }) => {
    if (
      notification.clubId === clubId &&
      (notification.kind === 'assignment' || notification.kind === 'mentor-request')
    ) {
      void qc.invalidateQueries({ queryKey: mentorRequestKeys.mine(clubId) });
    }
  });
  if (mine.isPending)
    return (
      <Card>
        <Loading label="Checking your mentoring…" />
      </Card>
    );
  if (mine.isError) return <Notice tone="error">{mine.error.message}</Notice>;
  const { request, mentor } = mine.data;
  if (mentor) {
    return (
      <Card>
        <p className="text-ink-soft">
          <strong className="text-ink">{mentor.displayName}</strong> is your mentor. They see your tank’s
          tests and can answer your questions.
        </p>
      </Card>
    );
  }
  return (
    <Card>
      <h2 className="text-lg font-extrabold text-ink">
        {request?.state === 'open' ? 'Your mentor request' : 'Ask for a mentor'}
      </h2>
      {request?.state === 'open' ? (
        <div className="mt-2 space-y-2 text-ink-soft">
          <Notice tone="info">
            Sent <RelativeTime at={request.createdAt} />. A club admin will pair you with a mentor; you’ll get
            a notification.
          </Notice>
          {request.preferredMentor ? (
            <p className="text-sm">You asked for {request.preferredMentor.displayName}.</p>
          ) : null}
          {request.note ? <p className="text-sm">“{request.note}”</p> : null}
        </div>
      ) : (
        <>
          {request?.state === 'declined' ? (
            <div className="mt-2">
              <Notice tone="warning">
                Your last request was declined{request.declineReason ? `: ${request.declineReason}` : '.'} You
                can ask again.
              </Notice>
            </div>
          ) : (
            <p className="mt-1 text-ink-muted">
              An experienced keeper from the club watches your tests with you and answers your questions.
            </p>
          )}
          <AskForm clubId={clubId} userId={userId} />
        </>
      )}
    </Card>
  );
}
