import { useState } from 'react';
import { Button } from '@client/components/ui/button';
import { Card, Notice } from '@client/components/ui/card';
import { ConfirmDialog } from '@client/components/ui/confirm-dialog';
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
      <h2 className="text-lg font-extrabold text-tide-900">In your calendar</h2>
      <p className="mt-1 text-sm text-tide-700">Subscribe to this link in your calendar app: meetups you are going to (or waiting for) appear there and follow every change. It is yours alone: anyone with it can see those meetups.</p>
      <input readOnly value={url} aria-label="Your calendar link" onFocus={(e) => e.currentTarget.select()} className="mt-3 block w-full truncate rounded-xl border border-tide-200 bg-tide-50 px-3 py-2 text-sm text-tide-900" />
      <div className="mt-3 flex flex-wrap gap-2">
        <Button variant="secondary" onClick={() => void navigator.clipboard?.writeText(url).then(() => setCopied(true))}>{copied ? '✓ Copied' : 'Copy the link'}</Button>
        <a href={url.replace(/^https?:/, 'webcal:')} className="inline-flex min-h-touch items-center rounded-full px-4 font-bold text-tide-700 hover:bg-tide-50">Open in calendar app</a>
        <Button variant="ghost" onClick={() => setConfirm(true)}>Make a new link</Button>
      </div>
      {reset.isError ? <div className="mt-3"><Notice tone="error">{reset.error.message}</Notice></div> : null}
      <ConfirmDialog open={confirm} title="Make a new calendar link?" confirmLabel="Make a new link" busy={reset.isPending} onCancel={() => setConfirm(false)} onConfirm={() => reset.mutate(undefined, { onSuccess: () => { setConfirm(false); setCopied(false); } })}>
        <p>The old link stops working at once: calendars subscribed to it stop updating until you add the new one.</p>
      </ConfirmDialog>
    </Card>
  );
}
