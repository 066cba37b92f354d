import { useState } from 'react';
import { Link } from 'react-router';
import { parameterInfo, isParameterKey } from '@shared/care';
import { CYCLE_STAGE_WORDS } from '@shared/constants/tank-labels';
import type { DeskRow as Row } from '@shared/schemas/desk.schema';
import { Button, ButtonLink } from '@client/components/ui/button';
import { Input } from '@client/components/ui/field';
import { SeverityBadge } from '@client/components/ui/severity-badge';
import { Sparkline } from './sparkline';

export interface ConcernActions {
  act(concernId: string, action: 'acknowledge' | 'resolve', note: string): Promise<void>;
  busy: boolean;
}

function since(days: number | null): { text: string; stale: boolean } {
  if (days === null) return { text: 'never tested', stale: true };
  if (days === 0) return { text: 'tested today', stale: false };
  return { text: `${days} day${days === 1 ? '' : 's'} since a test`, stale: days > 7 };
}

/** One tank on the desk: why it is where it is, and what the mentor can do about it without leaving the list. */
export function DeskRow({
  row,
  highlighted,
  actions,
}: {
  row: Row;
  highlighted: boolean;
  actions: ConcernActions;
}) {
  const [note, setNote] = useState('');
  const [error, setError] = useState<string>();
  const worst = row.worstConcern;
  const last = since(row.daysSinceTest);
  const run = async (action: 'acknowledge' | 'resolve') => {
    if (!worst) return;
    setError(undefined);
    try {
      await actions.act(worst.id, action, note);
      setNote('');
    } catch (e) {
      setError(e instanceof Error ? e.message : 'Could not save.');
    }
  };
  return (
    <li
      data-tank-id={row.tankId}
      className={`rounded-card bg-surface p-4 shadow-card transition-shadow duration-700 ${highlighted ? 'ring-4 ring-watch/60' : 'ring-0'}`}
    >
      <div className="flex flex-wrap items-start justify-between gap-3">
        <div className="min-w-0">
          <h2 className="text-lg font-extrabold text-ink">
            <Link to={`/tanks/${row.tankId}`} className="hover:underline">
              {row.name}
            </Link>
            <span className="ml-2 text-sm font-semibold text-ink-muted">{row.owner.displayName}</span>
          </h2>
          <p className="mt-0.5 text-sm text-ink-muted">
            {row.phase === 'established' && row.cycleStage !== 'setback'
              ? 'established'
              : CYCLE_STAGE_WORDS[row.cycleStage]}{' '}
            · <span className={last.stale ? 'font-bold text-danger' : ''}>{last.text}</span>
            {row.unansweredQuestions ? (
              <>
                {' · '}
                <Link to={`/questions?tankId=${row.tankId}`} className="font-bold text-ink-soft underline">
                  {row.unansweredQuestions} unanswered question{row.unansweredQuestions === 1 ? '' : 's'}
                </Link>
              </>
            ) : null}
          </p>
        </div>
        {row.sparkline ? (
          <div className="text-right">
            <Sparkline
              points={row.sparkline.points}
              label={`${isParameterKey(row.sparkline.parameter) ? parameterInfo(row.sparkline.parameter).label : row.sparkline.parameter} over two weeks`}
            />
            <p className="text-[11px] text-ink-muted">
              {isParameterKey(row.sparkline.parameter) ? parameterInfo(row.sparkline.parameter).label : ''},
              14 days
            </p>
          </div>
        ) : null}
      </div>
      {worst ? (
        <div className="mt-3 space-y-2">
          <p className="flex flex-wrap items-center gap-2">
            <SeverityBadge severity={worst.severity} />
            {worst.status === 'acknowledged' ? (
              <span className="text-xs font-bold text-ink-muted">seen</span>
            ) : null}
            <span className="font-bold text-ink">{worst.reason}</span>
          </p>
          <div className="flex flex-wrap items-center gap-2">
            <label className="sr-only" htmlFor={`desk-note-${row.tankId}`}>
              Note for {row.owner.displayName}
            </label>
            <Input
              id={`desk-note-${row.tankId}`}
              value={note}
              onChange={(e) => setNote(e.target.value)}
              placeholder="Note for the keeper (optional)"
              className="min-w-40 flex-1 text-sm"
            />
            {worst.status === 'open' ? (
              <Button variant="secondary" busy={actions.busy} onClick={() => void run('acknowledge')}>
                I’ve seen it
              </Button>
            ) : null}
            <Button variant="secondary" busy={actions.busy} onClick={() => void run('resolve')}>
              Resolve
            </Button>
            <ButtonLink variant="ghost" to={`/tanks/${row.tankId}`}>
              Open tank
            </ButtonLink>
          </div>
          {error ? (
            <p role="alert" className="text-sm font-semibold text-danger">
              {error}
            </p>
          ) : null}
        </div>
      ) : (
        <p className="mt-3 text-sm text-ok">✔ Nothing flagged.</p>
      )}
      <details className="mt-2 text-xs text-ink-muted">
        <summary className="cursor-pointer">Why here (score {row.score})</summary>
        <ul className="mt-1 list-disc pl-5">
          {row.why.map((p) => (
            <li key={p.label}>
              {p.label}: {p.points}
            </li>
          ))}
        </ul>
      </details>
    </li>
  );
}
