import { useState } from 'react';
import { Button, buttonClass } from '@client/components/ui/button';
import { Card, Notice } from '@client/components/ui/card';
import { ConfirmDialog } from '@client/components/ui/confirm-dialog';
import { Input } from '@client/components/ui/field';
import { useCalendarFeed, useResetCalendarFeed } from '../api/meetups';

/** The personal, read-only calendar link: meetups you are going to or waiting for show up in your calendar app. */
export function CalendarFeedCard() {
  const feed = useCalendarFeed();
  const reset = useResetCalendarFeed();
  const [copied, setCopied] = useState(false);
  const [confirm, setConfirm] = useState(false);
  if (!feed.data) return null;
  const url = feed.data.url;
  return (
    <Card>
      <h2 className="text-lg font-extrabold text-ink">In your calendar</h2>
      <p className="mt-1 text-sm text-ink-muted">
        Subscribe to this link in your calendar app: meetups you are going to (or waiting for) appear there
        and follow every change. It is yours alone: anyone with it can see those meetups.
      </p>
      <Input
        readOnly
        value={url}
        aria-label="Your calendar link"
        onFocus={(e) => e.currentTarget.select()}
        className="mt-3 w-full truncate text-sm"
      />
      <div className="mt-3 flex flex-wrap gap-2">
        <Button
          variant="secondary"
          onClick={() => void navigator.clipboard?.writeText(url).then(() => setCopied(true))}
        >
          {copied ? '✓ Copied' : 'Copy the link'}
        </Button>
        <a href={url.replace(/^https?:/, 'webcal:')} className={buttonClass('ghost')}>
          Open in calendar app
        </a>
        <Button variant="ghost" onClick={() => setConfirm(true)}>
          Make a new link
        </Button>
      </div>
      {reset.isError ? (
        <div className="mt-3">
          <Notice tone="error">{reset.error.message}</Notice>
        </div>
      ) : null}
      <ConfirmDialog
        open={confirm}
        title="Make a new calendar link?"
        confirmLabel="Make a new link"
        busy={reset.isPending}
        onCancel={() => setConfirm(false)}
        onConfirm={() =>
          reset.mutate(undefined, {
            onSuccess: () => {
              setConfirm(false);
              setCopied(false);
            },
          })
        }
      >
        <p>
          The old link stops working at once: calendars subscribed to it stop updating until you add the new
          one.
        </p>
      </ConfirmDialog>
    </Card>
  );
}
