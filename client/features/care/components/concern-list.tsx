import { Can } from '@casl/react';
import { useState } from 'react';
import { asSubject, type AppAbility } from '@shared/abilities';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/card';
import { ApiError } from '@client/lib/api-client';
import { useConcernAction, useConcernHistory, type ConcernView } from '../api/care';
import { SeverityBadge } from '@client/components/ui/severity-badge';
import { Input } from '@client/components/ui/field';

const when = new Intl.DateTimeFormat(undefined, {
  day: 'numeric',
  month: 'short',
  hour: '2-digit',
  minute: '2-digit',
});

function ConcernItem({
  concern,
  clubId,
  ownerId,
}: {
  concern: ConcernView;
  clubId: string;
  ownerId: string;
}) {
  const action = useConcernAction(clubId, concern.tankId);
  const [note, setNote] = useState('');
  const [error, setError] = useState<string>();
  const subject = asSubject('Concern', { clubId, ownerId });
  const run = async (kind: 'acknowledge' | 'resolve') => {
    setError(undefined);
    try {
      await action.mutateAsync({ concernId: concern.id, action: kind, note });
      setNote('');
    } catch (e) {
      setError(e instanceof ApiError ? e.message : 'Could not save. Try again.');
    }
  };
  const live = concern.status !== 'resolved';
  return (
    <li className="py-3">
      <div className="flex flex-wrap items-center gap-2">
        <SeverityBadge severity={concern.severity} />
        {concern.status === 'acknowledged' ? (
          <span className="text-xs font-bold text-ink-muted">seen by a mentor</span>
        ) : null}
        {concern.status === 'resolved' ? (
          <span className="text-xs font-bold text-ok">
            resolved {concern.resolved?.byTest ? 'by a later test' : ''}
          </span>
        ) : null}
        <span className="text-xs text-ink-muted">{when.format(new Date(concern.raisedAt))}</span>
      </div>
      <p className="mt-1 font-bold text-ink">{concern.reason}</p>
      {live && concern.nextSteps.length ? (
        <ul className="mt-1 list-disc pl-5 text-sm text-ink-soft">
          {concern.nextSteps.map((s) => (
            <li key={s}>{s}</li>
          ))}
        </ul>
      ) : null}
      {concern.acknowledged?.note ? (
        <p className="mt-1 text-sm text-ink-muted">Mentor’s note: {concern.acknowledged.note}</p>
      ) : null}
      {concern.resolved?.note && !concern.resolved.byTest ? (
        <p className="mt-1 text-sm text-ink-muted">Note: {concern.resolved.note}</p>
      ) : null}
      {live ? (
        <div className="mt-2 flex flex-wrap items-center gap-2">
          <Can<AppAbility> I="resolve" this={subject}>
            <label className="sr-only" htmlFor={`note-${concern.id}`}>
              Note
            </label>
            <Input
              id={`note-${concern.id}`}
              value={note}
              onChange={(e) => setNote(e.target.value)}
              placeholder="Add a note (optional)"
              className="flex-1 text-sm"
            />
          </Can>
          {concern.status === 'open' ? (
            <Can<AppAbility> I="acknowledge" this={subject}>
              <Button
                variant="secondary"
                busy={action.isPending && action.variables?.action === 'acknowledge'}
                onClick={() => void run('acknowledge')}
              >
                I’ve seen it
              </Button>
            </Can>
          ) : null}
          <Can<AppAbility> I="resolve" this={subject}>
            <Button
              variant="secondary"
              busy={action.isPending && action.variables?.action === 'resolve'}
              onClick={() => void run('resolve')}
            >
              Mark resolved
            </Button>
          </Can>
        </div>
      ) : null}
      {error ? (
        <div className="mt-2">
          <Notice tone="error">{error}</Notice>
        </div>
      ) : null}
    </li>
  );
}

/** Open concerns first; resolved ones stay available as history. */
export function ConcernList({
  concerns,
  clubId,
  tankId,
  ownerId,
}: {
  concerns: ConcernView[];
  clubId: string;
  tankId: string;
  ownerId: string;
}) {
  const [showHistory, setShowHistory] = useState(false);
  const history = useConcernHistory(clubId, tankId, showHistory);
  const resolved = (history.data?.concerns ?? []).filter((c) => c.status === 'resolved');
  return (
    <section aria-labelledby="concerns-heading">
      <h3 id="concerns-heading" className="text-sm font-extrabold uppercase tracking-wide text-ink-muted">
        What needs attention
      </h3>
      {concerns.length === 0 ? (
        <p className="mt-2 text-ink-soft">
          Nothing flagged from the latest tests. Keep watching how the animals feed and behave too.
        </p>
      ) : (
        <ul className="divide-y divide-line">
          {concerns.map((c) => (
            <ConcernItem key={c.id} concern={c} clubId={clubId} ownerId={ownerId} />
          ))}
        </ul>
      )}
      <button
        type="button"
        className="mt-2 text-sm font-bold text-link underline"
        onClick={() => setShowHistory((v) => !v)}
      >
        {showHistory ? 'Hide resolved concerns' : 'Show resolved concerns'}
      </button>
      {showHistory ? (
        history.isPending ? (
          <p className="text-sm text-ink-muted">Loading…</p>
        ) : resolved.length === 0 ? (
          <p className="text-sm text-ink-muted">None resolved yet.</p>
        ) : (
          <ul aria-label="Resolved concerns" className="divide-y divide-line">
            {resolved.map((c) => (
              <ConcernItem key={c.id} concern={c} clubId={clubId} ownerId={ownerId} />
            ))}
          </ul>
        )
      ) : null}
    </section>
  );
}
