import { useState } from 'react';
import type { LivestockView } from '@shared/schemas/tank-views';
import { Button } from '@client/components/ui/button';
import { formatDate } from '@client/lib/date-format';
import { useAddLivestock, useUpdateLivestock } from '../../api/livestock';
import { AddLivestockForm, LeaveLivestockForm } from './livestock-forms';

/** A calendar date ("2026-03-12") read at local noon, so no time zone moves it to another day. */
const day = (isoDate: string) => formatDate(new Date(`${isoDate}T12:00:00`));

function Animal({ a, editable, onLeave }: { a: LivestockView; editable: boolean; onLeave?: () => void }) {
  return (
    <div className="flex flex-wrap items-start justify-between gap-2">
      <div>
        <p className="font-bold text-ink">
          {a.count} × {a.speciesCommonName}
        </p>
        <p className="text-sm text-ink-muted">
          Added {day(a.addedOn)}
          {a.source ? ` · from ${a.source}` : ''}
          {a.removedOn ? ` · left ${day(a.removedOn)}${a.removalReason ? `: ${a.removalReason}` : ''}` : ''}
        </p>
        {a.quarantineNotes ? <p className="text-sm text-ink-muted">Quarantine: {a.quarantineNotes}</p> : null}
      </div>
      {editable && onLeave ? (
        <Button variant="ghost" onClick={onLeave}>
          They left…
        </Button>
      ) : null}
    </div>
  );
}

/** The animals in the tank now (and those that left), with adding and recording departures for the owner. */
export function LivestockPanel({
  clubId,
  tankId,
  livestock,
  editable,
}: {
  clubId: string;
  tankId: string;
  livestock: LivestockView[];
  editable: boolean;
}) {
  const add = useAddLivestock(clubId, tankId);
  const update = useUpdateLivestock(clubId, tankId);
  const [adding, setAdding] = useState(false);
  const [leaving, setLeaving] = useState<string>();
  const current = livestock.filter((l) => !l.removedOn);
  const past = livestock.filter((l) => l.removedOn);
  return (
    <div className="space-y-3">
      {current.length === 0 ? (
        <p className="text-ink-muted">
          No animals recorded. Cycle the tank fully before the first ones go in.
        </p>
      ) : null}
      <ul className="divide-y divide-line">
        {current.map((a) => (
          <li key={a.id} className="py-3">
            <Animal a={a} editable={editable} onLeave={() => setLeaving(a.id)} />
            {leaving === a.id ? (
              <LeaveLivestockForm
                name={a.speciesCommonName}
                onCancel={() => setLeaving(undefined)}
                onSave={async (v) => {
                  await update.mutateAsync({ id: a.id, ...v });
                  setLeaving(undefined);
                }}
              />
            ) : null}
          </li>
        ))}
      </ul>
      {editable ? (
        adding ? (
          <AddLivestockForm
            onCancel={() => setAdding(false)}
            onSave={async (v) => {
              await add.mutateAsync(v);
              setAdding(false);
            }}
          />
        ) : (
          <Button variant="secondary" onClick={() => setAdding(true)}>
            Add animals
          </Button>
        )
      ) : null}
      {past.length ? (
        <details>
          <summary className="flex min-h-touch cursor-pointer items-center text-sm font-bold text-ink-muted">
            Animals that have left ({past.length})
          </summary>
          <ul className="divide-y divide-line">
            {past.map((a) => (
              <li key={a.id} className="py-2">
                <Animal a={a} editable={false} />
              </li>
            ))}
          </ul>
        </details>
      ) : null}
    </div>
  );
}
