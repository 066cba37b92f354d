import { useQueryClient } from '@tanstack/react-query';
import { useId, useState } from 'react';
import { DECLINE_REASON_MAX } from '@shared/constants/mentorship';
import type { MentorRequestView } from '@shared/schemas/notification-views';
import { Button } from '@client/components/ui/button';
import { Card, Notice } from '@client/components/ui/card';
import { Loading } from '@client/components/ui/skeleton';
import { TextAreaField } from '@client/components/ui/field';
import { RelativeTime } from '@client/components/ui/relative-time';
import { ApiError } from '@client/lib/api-client';
import { useSocketEvent } from '@client/lib/socket';
import { useMembers, type ClubMember } from '../api/club';
import {
  mentorRequestKeys,
  useAcceptRequest,
  useDeclineRequest,
  useOpenRequests,
} from '../api/mentor-requests';
import { mentorOptions, MentorSelect } from './mentor-choice';

const messageOf = (e: unknown) =>
  e instanceof ApiError ? e.message : 'Something went wrong. Check your connection and try again.';

function RequestRow({
  clubId,
  request,
  members,
}: {
  clubId: string;
  request: MentorRequestView;
  members: ClubMember[];
}) {
  const options = mentorOptions(members, request.requester.userId);
  const preferredFree = options.find((o) => o.userId === request.preferredMentor?.userId && !o.full);
  const [mentorId, setMentorId] = useState(
    preferredFree?.userId ?? options.find((o) => !o.full)?.userId ?? '',
  );
  const [declining, setDeclining] = useState(false);
  const [reason, setReason] = useState('');
  const accept = useAcceptRequest(clubId);
  const decline = useDeclineRequest(clubId);
  const id = useId();
  const name = request.requester.displayName;
  const error = accept.error ?? decline.error;

  return (
    <li className="py-4">
      <p className="font-bold text-ink">{name}</p>
      <p className="text-sm text-ink-muted">
        Asked <RelativeTime at={request.createdAt} />
        {request.preferredMentor ? ` · would like ${request.preferredMentor.displayName}` : ''}
      </p>
      {request.note ? <p className="mt-1 text-ink-soft">“{request.note}”</p> : null}
      {error ? (
        <div className="mt-2">
          <Notice tone="error">{messageOf(error)}</Notice>
        </div>
      ) : null}
      {!declining ? (
        <div className="mt-3 grid gap-2 sm:grid-cols-[1fr_auto_auto] sm:items-end">
          <MentorSelect
            id={`${id}-mentor`}
            label={`Pair ${name} with`}
            placeholder="Choose a mentor…"
            value={mentorId}
            onChange={setMentorId}
            options={options}
          />
          <Button
            disabled={!mentorId}
            busy={accept.isPending}
            onClick={() => accept.mutate({ id: request.id, mentorId })}
          >
            Accept
          </Button>
          <Button variant="secondary" onClick={() => setDeclining(true)}>
            Decline…
          </Button>
        </div>
      ) : (
        <form
          className="mt-3 space-y-2"
          onSubmit={(e) => {
            e.preventDefault();
            decline.mutate({ id: request.id, reason: reason.trim() });
          }}
        >
          <TextAreaField
            id={`${id}-reason`}
            label={`Why? ${name} will see this.`}
            required
            maxLength={DECLINE_REASON_MAX}
            rows={2}
            value={reason}
            onChange={(e) => setReason(e.target.value)}
            placeholder="e.g. Every mentor is full until March; please ask again then."
          />
          <div className="flex flex-wrap gap-2">
            <Button type="submit" variant="danger" disabled={!reason.trim()} busy={decline.isPending}>
              Decline {name}’s request
            </Button>
            <Button type="button" variant="ghost" onClick={() => setDeclining(false)}>
              Keep it open
            </Button>
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
    if (notification.clubId === clubId && notification.kind === 'mentor-request')
      void qc.invalidateQueries({ queryKey: mentorRequestKeys.open(clubId) });
  });
  const open = requests.data?.requests ?? [];
  return (
    <Card>
      <h2 className="text-lg font-extrabold text-ink">
        Open mentor requests{open.length ? ` (${open.length})` : ''}
      </h2>
      {requests.isPending || members.isPending ? (
        <div className="mt-3">
          <Loading label="Loading…" />
        </div>
      ) : requests.isError ? (
        <div className="mt-3">
          <Notice tone="error">{requests.error.message}</Notice>
        </div>
      ) : open.length === 0 ? (
        <p className="mt-2 text-ink-muted">
          No one is waiting. When a member asks for a mentor, the request shows up here.
        </p>
      ) : (
        <ul className="mt-1 divide-y divide-line">
          {open.map((r) => (
            <RequestRow key={r.id} clubId={clubId} request={r} members={members.data?.members ?? []} />
          ))}
        </ul>
      )}
    </Card>
  );
}
