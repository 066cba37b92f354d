import { useId, useState } from 'react';
import { MAX_MENTOR_CAPACITY } from '@shared/constants/mentorship';
import { Button } from '@client/components/ui/button';
import { Card, Notice } from '@client/components/ui/card';
import { Input } from '@client/components/ui/field';
import { useToast } from '@client/components/ui/toast';
import { ApiError } from '@client/lib/api-client';
import { useMembers } from '../api/club';
import { useSetCapacity } from '../api/mentor-requests';

/** A mentor's own setting: how many mentees they take on in this club. */
export function MentorCapacityCard({ clubId, userId }: { clubId: string; userId: string }) {
  const members = useMembers(clubId);
  const me = members.data?.members.find((m) => m.userId === userId);
  if (!me || me.mentorCapacity === undefined) return null;
  return (
    <CapacityForm clubId={clubId} userId={userId} capacity={me.mentorCapacity} load={me.menteeCount ?? 0} />
  );
}

function CapacityForm(p: { clubId: string; userId: string; capacity: number; load: number }) {
  const save = useSetCapacity(p.clubId);
  const toast = useToast();
  const [value, setValue] = useState(String(p.capacity));
  const id = useId();
  const error =
    save.error instanceof ApiError
      ? (save.error.fieldMessage('capacity') ?? save.error.message)
      : save.error
        ? 'Could not save.'
        : undefined;
  return (
    <Card>
      <form
        className="flex flex-wrap items-end gap-3"
        onSubmit={(e) => {
          e.preventDefault();
          save.mutate(
            { userId: p.userId, capacity: Number(value) },
            { onSuccess: () => toast.success(`Saved: you can take on ${value} mentees.`) },
          );
        }}
      >
        <div>
          <label htmlFor={id} className="block text-sm font-bold text-ink-soft">
            Mentees I can take on
          </label>
          <Input
            id={id}
            type="number"
            inputMode="numeric"
            min={0}
            max={MAX_MENTOR_CAPACITY}
            step={1}
            value={value}
            onChange={(e) => setValue(e.target.value)}
            aria-describedby={`${id}-hint`}
            className="mt-1 w-28"
          />
        </div>
        <Button type="submit" variant="secondary" busy={save.isPending}>
          Save
        </Button>
        <p id={`${id}-hint`} className="w-full text-sm text-ink-muted">
          You mentor {p.load} now. Lowering the number keeps your current mentees; it only stops new ones. 0
          to {MAX_MENTOR_CAPACITY}.
        </p>
      </form>
      {error ? (
        <div className="mt-2">
          <Notice tone="error">{error}</Notice>
        </div>
      ) : null}
    </Card>
  );
}
