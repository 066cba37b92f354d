import { useState } from 'react';
import { ROLE_LABELS } from '@shared/constants/roles';
import { Card, Notice } from '@client/components/ui/card';
import { Loading } from '@client/components/ui/skeleton';
import { Select } from '@client/components/ui/select';
import { ConfirmButton } from '@client/components/ui/confirm-dialog';
import { ApiError } from '@client/lib/api-client';
import { useAssignMentor, useAssignments, useEndAssignment, useMembers, type ClubMember } from '../api/club';

/** The club's people; admins also pair mentors with mentees here. */
export function MembersPanel({ clubId, isAdmin }: { clubId: string; isAdmin: boolean }) {
  const members = useMembers(clubId);
  const assignments = useAssignments(clubId);
  const assign = useAssignMentor(clubId);
  const end = useEndAssignment(clubId);
  const [error, setError] = useState<string>();
  if (members.isPending || assignments.isPending)
    return (
      <Card>
        <Loading label="Loading…" />
      </Card>
    );
  if (members.isError) return <Notice tone="error">{members.error.message}</Notice>;
  const people = members.data.members;
  const byId = new Map(people.map((p) => [p.userId, p]));
  const current = (assignments.data?.assignments ?? []).filter((a) => !a.endedAt);
  const mentors = people.filter((p) => p.role !== 'member' && p.status === 'active');
  const mentorOf = (userId: string) => current.find((a) => a.menteeId === userId);

  const pair = async (mentee: ClubMember, mentorId: string) => {
    setError(undefined);
    try {
      await assign.mutateAsync({ mentorId, menteeId: mentee.userId });
    } catch (e) {
      setError(e instanceof ApiError ? e.message : 'Could not save the pairing.');
    }
  };

  return (
    <Card>
      <h2 className="text-lg font-extrabold text-ink">Members ({people.length})</h2>
      {error ? (
        <div className="mt-3">
          <Notice tone="error">{error}</Notice>
        </div>
      ) : null}
      <ul className="mt-3 divide-y divide-line">
        {people.map((p) => {
          const a = mentorOf(p.userId);
          return (
            <li key={p.membershipId} className="flex flex-wrap items-center justify-between gap-2 py-3">
              <div>
                <p className="font-bold text-ink">
                  {p.displayName}{' '}
                  {p.status === 'suspended' ? (
                    <span className="ml-1 rounded-full bg-danger-soft px-2 text-xs text-danger">
                      suspended
                    </span>
                  ) : null}
                </p>
                <p className="text-sm text-ink-muted">
                  {ROLE_LABELS[p.role]}
                  {p.email ? ` · ${p.email}` : ''}
                  {p.menteeCount !== undefined ? ` · mentoring ${p.menteeCount} of ${p.mentorCapacity}` : ''}
                  {a ? ` · mentor: ${byId.get(a.mentorId)?.displayName ?? 'someone'}` : ''}
                </p>
              </div>
              {isAdmin && p.role === 'member' && p.status === 'active' ? (
                <div className="flex items-center gap-2">
                  <label className="sr-only" htmlFor={`mentor-${p.userId}`}>
                    Mentor for {p.displayName}
                  </label>
                  <Select
                    id={`mentor-${p.userId}`}
                    className=""
                    value={a?.mentorId ?? ''}
                    onChange={(e) => e.target.value && void pair(p, e.target.value)}
                  >
                    <option value="">{a ? 'Change mentor…' : 'Choose a mentor…'}</option>
                    {mentors
                      .filter((m) => m.userId !== p.userId)
                      .map((m) => (
                        <option key={m.userId} value={m.userId}>
                          {m.displayName} ({m.menteeCount ?? 0}/{m.mentorCapacity})
                        </option>
                      ))}
                  </Select>
                  {a ? (
                    <ConfirmButton
                      title="End this mentoring?"
                      question={`${byId.get(a.mentorId)?.displayName ?? 'The mentor'} stops mentoring ${p.displayName}. They keep read-only access for 30 days.`}
                      confirmLabel="End mentoring"
                      busy={end.isPending && end.variables === a.id}
                      onConfirm={() => end.mutateAsync(a.id)}
                    >
                      End
                    </ConfirmButton>
                  ) : null}
                </div>
              ) : null}
            </li>
          );
        })}
      </ul>
    </Card>
  );
}
