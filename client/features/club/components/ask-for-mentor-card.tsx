import { useQueryClient } from '@tanstack/react-query';
import { useId, useState } from 'react';
import { MENTOR_REQUEST_NOTE_MAX } from '@shared/constants/mentorship';
import { Button } from '@client/components/ui/button';
import { Card, Notice } from '@client/components/ui/card';
import { Spinner } from '@client/components/ui/spinner';
import { ApiError } from '@client/lib/api-client';
import { relativeTime } from '@client/lib/relative-time';
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
      {ask.isError ? <Notice tone="error">{error?.message ?? 'Could not send your request. Check your connection and try again.'}</Notice> : null}
      <div>
        <label htmlFor={noteId} className="block text-sm font-bold text-tide-800">What would you like help with? (optional)</label>
        <textarea
          id={noteId}
          value={note}
          maxLength={MENTOR_REQUEST_NOTE_MAX}
          onChange={(e) => setNote(e.target.value)}
          rows={3}
          placeholder="e.g. My first tropical tank, 60 litres, cycling since last week."
          aria-invalid={error?.fieldMessage('note') ? true : undefined}
          className="mt-1 block w-full rounded-xl border border-tide-200 bg-white px-3 py-2 text-base text-tide-950 shadow-sm focus:border-tide-500 focus:ring-2 focus:ring-tide-200 focus:outline-none"
        />
        {error?.fieldMessage('note') ? <p role="alert" className="mt-1 text-sm font-semibold text-ember-700">{error.fieldMessage('note')}</p> : null}
      </div>
      {options.length ? (
        <MentorSelect id={`${noteId}-mentor`} label="Someone in mind? (optional)" placeholder="Let the admins choose" value={preferred} onChange={setPreferred} options={options} />
      ) : null}
      <Button type="submit" busy={ask.isPending}>Ask for a mentor</Button>
    </form>
  );
}

/** On a member's home: ask for a mentor, see the request waiting or answered, or who their mentor is. */
export function AskForMentorCard({ clubId, userId }: { clubId: string; userId: string }) {
  const qc = useQueryClient();
  const mine = useMyRequest(clubId);
  useSocketEvent('notification', ({ notification }) => {
    if (notification.clubId === clubId && (notification.kind === 'assignment' || notification.kind === 'mentor-request')) {
      void qc.invalidateQueries({ queryKey: mentorRequestKeys.mine(clubId) });
    }
  });
  if (mine.isPending) return <Card><Spinner label="Checking your mentoring…" /></Card>;
  if (mine.isError) return <Notice tone="error">{mine.error.message}</Notice>;
  const { request, mentor } = mine.data;
  if (mentor) {
    return (
      <Card>
        <p className="text-tide-800"><strong className="text-tide-950">{mentor.displayName}</strong> is your mentor. They see your tank’s tests and can answer your questions.</p>
      </Card>
    );
  }
  return (
    <Card>
      <h2 className="text-lg font-extrabold text-tide-900">{request?.state === 'open' ? 'Your mentor request' : 'Ask for a mentor'}</h2>
      {request?.state === 'open' ? (
        <div className="mt-2 space-y-2 text-tide-800">
          <Notice tone="info">Sent {relativeTime(request.createdAt)}. A club admin will pair you with a mentor; you’ll get a notification.</Notice>
          {request.preferredMentor ? <p className="text-sm">You asked for {request.preferredMentor.displayName}.</p> : null}
          {request.note ? <p className="text-sm">“{request.note}”</p> : null}
        </div>
      ) : (
        <>
          {request?.state === 'declined' ? (
            <div className="mt-2">
              <Notice tone="warning">Your last request was declined{request.declineReason ? `: ${request.declineReason}` : '.'} You can ask again.</Notice>
            </div>
          ) : (
            <p className="mt-1 text-tide-700">An experienced keeper from the club watches your tests with you and answers your questions.</p>
          )}
          <AskForm clubId={clubId} userId={userId} />
        </>
      )}
    </Card>
  );
}
