import { useState } from 'react';
import type { MeetupDetailView } from '@shared/schemas/meetup-views';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/card';
import { ConfirmDialog } from '@client/components/ui/confirm-dialog';
import { TextAreaField } from '@client/components/ui/field';
import { ApiError } from '@client/lib/api-client';
import { useCancelMeetup } from '../api/meetups';

/** Cancelling asks first and needs a reason: everyone going or waiting is e-mailed it. */
export function CancelMeetup({ clubId, meetup }: { clubId: string; meetup: MeetupDetailView }) {
  const cancel = useCancelMeetup(clubId, meetup.id);
  const [open, setOpen] = useState(false);
  const [reason, setReason] = useState('');
  const expected = meetup.goingCount + meetup.waitlistCount;
  const problem = cancel.error instanceof ApiError ? cancel.error.fieldMessage('reason') : undefined;
  return (
    <>
      <Button variant="danger" onClick={() => setOpen(true)}>
        Cancel the meetup
      </Button>
      <ConfirmDialog
        open={open}
        title={`Cancel “${meetup.title}”?`}
        confirmLabel={
          expected
            ? `Cancel and e-mail ${expected} ${expected === 1 ? 'person' : 'people'}`
            : 'Cancel the meetup'
        }
        tone="danger"
        busy={cancel.isPending}
        onCancel={() => setOpen(false)}
        onConfirm={() => cancel.mutate(reason, { onSuccess: () => setOpen(false) })}
      >
        <p>
          {expected
            ? `${expected === 1 ? 'One person is' : `${expected} people are`} going or waiting. Each is e-mailed your reason and the calendar entry is withdrawn.`
            : 'Nobody has said they are coming yet.'}{' '}
          This cannot be undone.
        </p>
        <TextAreaField
          label="Why (they will read this)"
          value={reason}
          onChange={(e) => setReason(e.target.value)}
          error={problem}
        />
        {cancel.isError && !problem ? <Notice tone="error">{cancel.error.message}</Notice> : null}
      </ConfirmDialog>
    </>
  );
}
