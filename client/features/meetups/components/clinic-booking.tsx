import { useState } from 'react';
import type { MeetupDetailView } from '@shared/schemas/meetup-views';
import { Button } from '@client/components/ui/button';
import { Card, Notice } from '@client/components/ui/card';
import { SelectField } from '@client/components/ui/select';
import { useBookSlot, useClearSlot } from '../api/meetups';

export interface TankOption {
  id: string;
  name: string;
}

/** A clinic slot and which tank's water you bring; the mentor records the results straight onto that tank. */
export function ClinicBooking({
  clubId,
  meetup,
  tanks,
}: {
  clubId: string;
  meetup: MeetupDetailView;
  tanks: TankOption[];
}) {
  const book = useBookSlot(clubId, meetup.id);
  const clear = useClearSlot(clubId, meetup.id);
  const mine = meetup.mine;
  const [tankId, setTankId] = useState(mine?.tank?.id ?? tanks[0]?.id ?? '');
  const [slot, setSlot] = useState(mine?.slotStartsAt ?? meetup.slots.find((s) => !s.taken)?.startsAt ?? '');
  if (meetup.status !== 'scheduled') return null;
  if (mine?.status !== 'going') {
    return (
      <Card>
        <h2 className="text-lg font-extrabold text-ink">Bring a water sample</h2>
        <p className="mt-1 text-sm text-ink-muted">Say you are going first; then book a slot here.</p>
      </Card>
    );
  }
  const booked = meetup.slots.find((s) => s.mine);
  return (
    <Card>
      <h2 className="text-lg font-extrabold text-ink">Bring a water sample</h2>
      <p className="mt-1 text-sm text-ink-muted">
        Fill a clean, rinsed container with tank water on the day, and bring it in a bag so it cannot spill.
      </p>
      {booked ? (
        <p className="mt-2 font-bold text-ok">
          ✓ Your slot: {booked.label}, water from {mine.tank?.name}
        </p>
      ) : null}
      {tanks.length === 0 ? (
        <div className="mt-3">
          <Notice tone="warning">Add your tank to Shoalwise first: the results go straight onto it.</Notice>
        </div>
      ) : (
        <div className="mt-3 space-y-3">
          <SelectField
            label="Water from"
            options={tanks.map((t) => ({ value: t.id, label: t.name }))}
            value={tankId}
            onChange={(e) => setTankId(e.target.value)}
          />
          <fieldset>
            <legend className="text-sm font-bold text-ink-soft">Slot</legend>
            <div className="mt-1 flex flex-wrap gap-2">
              {meetup.slots.map((s) => (
                <button
                  key={s.startsAt}
                  type="button"
                  disabled={s.taken && !s.mine}
                  aria-pressed={slot === s.startsAt}
                  onClick={() => setSlot(s.startsAt)}
                  className={`min-h-touch rounded-full px-4 text-sm font-bold ring-1 ${slot === s.startsAt ? 'bg-accent text-on-accent ring-accent' : 'bg-surface text-ink-soft ring-line-strong'} disabled:bg-tint disabled:text-ink-muted disabled:line-through`}
                >
                  {s.label}
                  {s.taken && !s.mine ? <span className="sr-only"> (taken)</span> : null}
                </button>
              ))}
            </div>
          </fieldset>
          <div className="flex flex-wrap gap-2">
            <Button
              busy={book.isPending}
              disabled={!slot || !tankId}
              onClick={() => book.mutate({ slotStartsAt: slot, tankId })}
            >
              {booked ? 'Change my slot' : 'Book this slot'}
            </Button>
            {booked ? (
              <Button variant="ghost" busy={clear.isPending} onClick={() => clear.mutate()}>
                Free my slot
              </Button>
            ) : null}
          </div>
        </div>
      )}
      {book.isError ? (
        <div className="mt-3">
          <Notice tone="error">{book.error.message}</Notice>
        </div>
      ) : null}
    </Card>
  );
}
