import { useState } from 'react';
import type { AttendanceRowView } from '@shared/schemas/meetup-views';
import type { CreateWaterTestInput } from '@shared/schemas/water-test.schema';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/card';
import { TextField } from '@client/components/ui/field';
import { ApiError } from '@client/lib/api-client';
import { useRecordClinicResult } from '../api/meetups';

/** What a clinic bench usually measures, each in the unit a liquid kit reads. */
const BENCH = [
  { key: 'ammonia', label: 'Ammonia (mg/L NH3)', unit: 'mg/L NH3' },
  { key: 'nitrite', label: 'Nitrite (mg/L NO2)', unit: 'mg/L NO2' },
  { key: 'nitrate', label: 'Nitrate (mg/L NO3)', unit: 'mg/L NO3' },
  { key: 'pH', label: 'pH', unit: 'pH' },
] as const;

type Bench = Record<(typeof BENCH)[number]['key'], string>;

function toInput(values: Bench): CreateWaterTestInput {
  const entries: Record<string, { value: number; unit: string }> = {};
  for (const b of BENCH)
    if (values[b.key].trim() !== '') entries[b.key] = { value: Number(values[b.key]), unit: b.unit };
  return {
    takenAt: new Date().toISOString(),
    entries: entries as CreateWaterTestInput['entries'],
    note: 'Tested at the club’s water-testing clinic.',
  };
}

/** The clinic mentor's quick form for one sample; it is saved as a water test on the member's tank. */
export function ClinicResultForm({
  clubId,
  meetupId,
  row,
}: {
  clubId: string;
  meetupId: string;
  row: AttendanceRowView;
}) {
  const record = useRecordClinicResult(clubId, meetupId);
  const [open, setOpen] = useState(false);
  const [values, setValues] = useState<Bench>({ ammonia: '', nitrite: '', nitrate: '', pH: '' });
  if (!row.tank) return null;
  if (!open) {
    return (
      <Button variant="ghost" className="px-0" onClick={() => setOpen(true)}>
        {row.waterTestId ? '✓ Results saved · record again' : `Record results for ${row.tank.name}`}
      </Button>
    );
  }
  const issue = (key: string) =>
    record.error instanceof ApiError
      ? record.error.issues.find((i) => i.path.startsWith(`entries.${key}`))?.message
      : undefined;
  return (
    <form
      aria-label={`Results for ${row.displayName}`}
      className="my-2 w-full space-y-3 rounded-xl bg-tint p-3"
      onSubmit={(e) => {
        e.preventDefault();
        record.mutate(
          { userId: row.userId, tankId: row.tank!.id, input: toInput(values) },
          { onSuccess: () => setOpen(false) },
        );
      }}
    >
      <p className="text-sm font-bold text-ink-soft">Water from {row.tank.name}: fill in what you tested.</p>
      <div className="grid grid-cols-2 gap-3">
        {BENCH.map((b) => (
          <TextField
            key={b.key}
            label={b.label}
            type="number"
            inputMode="decimal"
            step="any"
            value={values[b.key]}
            error={issue(b.key)}
            onChange={(e) => setValues((v) => ({ ...v, [b.key]: e.target.value }))}
          />
        ))}
      </div>
      {record.isError && !BENCH.some((b) => issue(b.key)) ? (
        <Notice tone="error">{record.error.message}</Notice>
      ) : null}
      <div className="flex gap-2">
        <Button type="submit" busy={record.isPending}>
          Save on their tank
        </Button>
        <Button variant="ghost" onClick={() => setOpen(false)}>
          Close
        </Button>
      </div>
    </form>
  );
}
