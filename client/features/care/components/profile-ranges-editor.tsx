import { useState } from 'react';
import { parameterInfo, provenanceLabel, type AnyParameterKey, type CareProfile } from '@shared/care';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/card';
import { Input, TextField } from '@client/components/ui/field';
import { useToast } from '@client/components/ui/toast';
import { ApiError } from '@client/lib/api-client';
import { useSaveProfile } from '@client/lib/care-profiles';

type Band = [number, number];

/** The profile's bands as a table; a club copy can be adjusted here, each save becoming a new version. */
export function ProfileRangesEditor({
  clubId,
  profile,
  id,
  editable,
}: {
  clubId: string;
  profile: CareProfile;
  id?: string;
  editable: boolean;
}) {
  const save = useSaveProfile(clubId);
  const [draft, setDraft] = useState(() => structuredClone(profile));
  const [note, setNote] = useState('');
  const [message, setMessage] = useState<{ tone: 'success' | 'error'; text: string }>();
  const toast = useToast();
  const keys = Object.keys(draft.ranges) as AnyParameterKey[];
  const setBand = (key: AnyParameterKey, which: 'ideal' | 'caution', i: 0 | 1, value: string) => {
    const n = Number(value);
    setDraft((d) => {
      const next = structuredClone(d);
      const range = next.ranges[key]!;
      const band = [...range[which]] as Band;
      band[i] = Number.isFinite(n) ? n : band[i];
      range[which] = band;
      // A target outside a new ideal band would be refused; it falls back to the band's upper end.
      if (range.target !== undefined && (range.target < range.ideal[0] || range.target > range.ideal[1]))
        delete range.target;
      return next;
    });
  };
  const dirty = JSON.stringify(draft) !== JSON.stringify(profile);
  const cell = (key: AnyParameterKey, which: 'ideal' | 'caution', i: 0 | 1) => (
    <Input
      type="number"
      inputMode="decimal"
      step="any"
      aria-label={`${parameterInfo(key).label} ${which} ${i === 0 ? 'lowest' : 'highest'}`}
      disabled={!editable}
      value={draft.ranges[key]![which][i]}
      onChange={(e) => setBand(key, which, i, e.target.value)}
      className="w-20 px-2 text-right disabled:border-transparent disabled:bg-transparent disabled:text-ink"
    />
  );
  return (
    <div className="space-y-4">
      <div className="overflow-x-auto">
        <table className="w-full text-sm">
          <thead className="text-left text-ink-muted">
            <tr>
              <th className="py-2 pr-3">Parameter</th>
              <th className="pr-3">Fine between</th>
              <th className="pr-3">Worth watching between (act now outside)</th>
              <th>Where the numbers come from</th>
            </tr>
          </thead>
          <tbody className="divide-y divide-line">
            {keys.map((key) => {
              const r = draft.ranges[key]!;
              return (
                <tr key={key}>
                  <th scope="row" className="py-2 pr-3 text-left font-bold text-ink">
                    {parameterInfo(key).label} <span className="font-normal text-ink-muted">({r.unit})</span>
                  </th>
                  <td className="pr-3 whitespace-nowrap">
                    {cell(key, 'ideal', 0)} – {cell(key, 'ideal', 1)}
                  </td>
                  <td className="pr-3 whitespace-nowrap">
                    {cell(key, 'caution', 0)} – {cell(key, 'caution', 1)}
                  </td>
                  <td className="text-ink-muted">{provenanceLabel(r.provenance)}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      {editable ? (
        <div className="flex flex-wrap items-end gap-2">
          <div className="grow">
            <TextField
              label="Why the change (kept in the history)"
              value={note}
              onChange={(e) => setNote(e.target.value)}
            />
          </div>
          <Button
            disabled={!dirty}
            busy={save.isPending}
            onClick={async () => {
              setMessage(undefined);
              try {
                const res = await save.mutateAsync({
                  id: id!,
                  definition: draft,
                  baseVersion: profile.version,
                  note,
                });
                toast.success(
                  `Saved as version ${res.profile.version}: ${res.changes.length} ${res.changes.length === 1 ? 'change' : 'changes'}.`,
                );
              } catch (e) {
                const err = e instanceof ApiError ? e : undefined;
                setMessage({
                  tone: 'error',
                  text: err
                    ? [err.message, ...err.issues.map((i) => `${i.path}: ${i.message}`)].join(' ')
                    : 'Could not save.',
                });
              }
            }}
          >
            Save as a new version
          </Button>
        </div>
      ) : null}
      {message ? <Notice tone={message.tone}>{message.text}</Notice> : null}
    </div>
  );
}
