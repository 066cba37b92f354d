import { useQueryClient } from '@tanstack/react-query';
import { useId, useState } from 'react';
import { DECLINE_REASON_MAX } from '@shared/constants/mentorship';
import type { MentorRequestView } from '@shared/schemas/notification-views';
import { Button } from '@client/components/ui/button';
import { Card, Notice } from '@client/components/ui/card';
import { Spinner } from '@client/components/ui/spinner';
import { ApiError } from '@client/lib/api-client';
import { relativeTime } from '@client/lib/relative-time';
import { useSocketEvent } from '@client/lib/socket';
import { useMembers, type ClubMember } from '../api/club';
import { mentorRequestKeys, useAcceptRequest, useDeclineRequest, useOpenRequests } from '../api/mentor-requests';
import { mentorOptions, MentorSelect } from './mentor-choice';

const messageOf = (e: unknown) => (e instanceof ApiError ? e.message : 'Something went wrong. Check your connection and try again.');

function RequestRow({ clubId, request, members }: { clubId: string; request: MentorRequestView; members: ClubMember[] }) {
  const options = mentorOptions(members, request.requester.userId);
  const preferredFree = options.find((o) => o.userId === request.preferredMentor?.userId && !o.full);
  const [mentorId, setMentorId] = useState(preferredFree?.userId ?? options.find((o) => !o.full)?.userId ?? '');
  const [declining, setDeclining] = useState(false);
  const [reason, setReason] = useState('');
  const accept = useAcceptRequest(clubId);
  const decline = useDeclineRequest(clubId);
  const id = useId();
  const name = request.requester.displayName;
  const error = accept.error ?? decline.error;

  return (
    <li className="py-4">
      <p className="font-bold text-tide-900">{name}</p>
      <p className="text-sm text-tide-600">
        Asked {relativeTime(request.createdAt)}
        {request.preferredMentor ? ` · would like ${request.preferredMentor.displayName}` : ''}
      </p>
      {request.note ? <p className="mt-1 text-tide-800">“{request.note}”</p> : null}
      {error ? <div className="mt-2"><Notice tone="error">{messageOf(error)}</Notice></div> : null}
      {!declining ? (
        <div className="mt-3 grid gap-2 sm:grid-cols-[1fr_auto_auto] sm:items-end">
          <MentorSelect id={`${id}-mentor`} label={`Pair ${name} with`} placeholder="Choose a mentor…" value={mentorId} onChange={setMentorId} options={options} />
          <Button disabled={!mentorId} busy={accept.isPending} onClick={() => accept.mutate({ id: request.id, mentorId })}>Accept</Button>
          <Button variant="secondary" onClick={() => setDeclining(true)}>Decline…</Button>
        </div>
      ) : (
        <form
          className="mt-3 space-y-2"
          onSubmit={(e) => {
            e.preventDefault();
            decline.mutate({ id: request.id, reason: reason.trim() });
          }}
        >
          <label htmlFor={`${id}-reason`} className="block text-sm font-bold text-tide-800">Why? {name} will see this.</label>
          <textarea
            id={`${id}-reason`}
            required
            maxLength={DECLINE_REASON_MAX}
            rows={2}
            value={reason}
            onChange={(e) => setReason(e.target.value)}
            placeholder="e.g. Every mentor is full until March; please ask again then."
            className="block w-full rounded-xl border border-tide-200 bg-white px-3 py-2 text-base text-tide-950 shadow-sm focus:border-tide-500 focus:ring-2 focus:ring-tide-200 focus:outline-none"
          />
          <div className="flex flex-wrap gap-2">
            <Button type="submit" variant="danger" disabled={!reason.trim()} busy={decline.isPending}>Decline {name}’s request</Button>
            <Button type="button" variant="ghost" onClick={() => setDeclining(false)}>Keep it open</Button>
          </div>
        </form>
      )}
    </li>
  );
}

/** For admins on the club page: members waiting for a mentor, oldest first; live when a new request arrives. */
export function MentorRequestsPanel({ clubId }: { clubId: string }) {
  const qc = useQueryClient();
  const requests = useOpenRequests(clubId);
  const members = useMembers(clubId);
  useSocketEvent('notification', ({ notification }) => {
    if (notification.clubId === clubId && notification.kind === 'mentor-request') void qc.invalidateQueries({ queryKey: mentorRequestKeys.open(clubId) });
  });
  const open = requests.data?.requests ?? [];
  return (
    <Card>
      <h2 className="text-lg font-extrabold text-tide-900">Open mentor requests{open.length ? ` (${open.length})` : ''}</h2>
      {requests.isPending || members.isPending ? (
        <div className="mt-3"><Spinner /></div>
      ) : requests.isError ? (
        <div className="mt-3"><Notice tone="error">{requests.error.message}</Notice></div>
      ) : open.length === 0 ? (
        <p className="mt-2 text-tide-700">No one is waiting. When a member asks for a mentor, the request shows up here.</p>
      ) : (
        <ul className="mt-1 divide-y divide-tide-100">
          {open.map((r) => (
            <RequestRow key={r.id} clubId={clubId} request={r} members={members.data?.members ?? []} />
          ))}
        </ul>
      )}
    </Card>
  );
}
