import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { Card, Notice } from '@client/components/ui/card';
import { PageHeader } from '@client/components/ui/page-header';
import { Loading } from '@client/components/ui/skeleton';
import { useSession } from '@client/features/auth/components/session-provider';
import { useConcernAction } from '@client/features/care/api/care';
import { careKeys } from '@client/lib/tank-keys';
import { deskKeys, useDesk, type DeskFilters } from '@client/features/desk/api/desk';
import { useDeskAlerts } from '@client/features/desk/components/desk-alerts';
import { DeskRow } from '@client/features/desk/components/desk-row';
import { useSocketEvent, useSocketReconnect } from '@client/lib/socket';

const FILTERS: { key: keyof DeskFilters; label: string }[] = [
  { key: 'urgentOnly', label: 'Urgent only' },
  { key: 'cycling', label: 'Cycling tanks' },
  { key: 'unanswered', label: 'Unanswered questions' },
];

/** The mentor's home: mentees' tanks, most in need first, kept live over the socket. */
export function Component() {
  const { activeClub } = useSession();
  const clubId = activeClub?.clubId ?? '';
  const qc = useQueryClient();
  const [filters, setFilters] = useState<DeskFilters>({
    urgentOnly: false,
    cycling: false,
    unanswered: false,
  });
  const [highlight, setHighlight] = useState<Record<string, number>>({});
  const desk = useDesk(clubId, filters);
  const alerts = useDeskAlerts();
  const [actingTank, setActingTank] = useState<string>('');
  const concernAction = useConcernAction(clubId, actingTank);

  const refresh = () => void qc.invalidateQueries({ queryKey: deskKeys.all(clubId) });
  useSocketEvent('tankChanged', (p) => {
    if (p.clubId !== clubId) return;
    refresh();
    void qc.invalidateQueries({ queryKey: careKeys.tank(p.tankId) });
  });
  useSocketEvent('concern', (p) => {
    if (p.clubId !== clubId || !p.worst) return;
    const stamp = Date.now();
    setHighlight((h) => ({ ...h, [p.tankId]: stamp }));
    setTimeout(
      () =>
        setHighlight((h) =>
          h[p.tankId] === stamp ? Object.fromEntries(Object.entries(h).filter(([k]) => k !== p.tankId)) : h,
        ),
      4_000,
    );
    if (p.worst === 'urgent') {
      const row = desk.data?.rows.find((r) => r.tankId === p.tankId);
      alerts.alert(
        'Urgent water concern',
        row ? `${row.name} (${row.owner.displayName})` : 'A mentee’s tank needs a look.',
      );
    }
  });
  // Back after a server restart or a dropped connection: fetch what was missed.
  useSocketReconnect(refresh);

  if (!activeClub) return <Notice tone="warning">You are not an active member of a club.</Notice>;
  if (activeClub.role === 'member')
    return (
      <Notice>The mentor desk is for mentors and club admins. Your own tanks are under My tanks.</Notice>
    );

  return (
    <>
      <PageHeader
        title="Mentor desk"
        subtitle="Your mentees’ tanks, the most worrying first. It updates by itself."
      />
      <div className="mb-4 flex flex-wrap items-center gap-2">
        {FILTERS.map((f) => (
          <button
            key={f.key}
            type="button"
            aria-pressed={filters[f.key]}
            onClick={() => setFilters((s) => ({ ...s, [f.key]: !s[f.key] }))}
            className={`min-h-touch rounded-full px-4 text-sm font-bold ring-1 ${filters[f.key] ? 'bg-accent text-on-accent ring-accent' : 'bg-surface text-ink-soft ring-line-strong'}`}
          >
            {f.label}
          </button>
        ))}
        <span className="grow" />
        <label className="flex min-h-touch items-center gap-2 text-sm text-ink-soft">
          <input
            type="checkbox"
            className="size-5 accent-accent"
            checked={alerts.prefs.sound}
            onChange={(e) => alerts.setSound(e.target.checked)}
          />
          Chime on urgent
        </label>
        {alerts.desktopSupported ? (
          <label className="flex min-h-touch items-center gap-2 text-sm text-ink-soft">
            <input
              type="checkbox"
              className="size-5 accent-accent"
              checked={alerts.prefs.desktop}
              onChange={(e) => void alerts.setDesktop(e.target.checked)}
            />
            Desktop notice
          </label>
        ) : null}
      </div>
      {desk.isPending ? (
        <Card>
          <Loading label="Gathering your mentees’ tanks…" />
        </Card>
      ) : desk.isError ? (
        <Notice tone="error">{desk.error.message}</Notice>
      ) : desk.data.total === 0 ? (
        <Card>
          <p className="text-ink-soft">
            No mentees’ tanks yet. When a club admin pairs you with a beginner, their tanks appear here.
          </p>
        </Card>
      ) : desk.data.rows.length === 0 ? (
        <Card>
          <p className="text-ink-soft">No tank matches these filters ({desk.data.total} in all).</p>
        </Card>
      ) : (
        <>
          <p className="mb-2 text-sm text-ink-muted">
            {desk.data.rows.length} of {desk.data.total} tanks
          </p>
          <ol className="space-y-3" aria-label="Tanks by need">
            {desk.data.rows.map((row) => (
              <DeskRow
                key={row.tankId}
                row={row}
                highlighted={row.tankId in highlight}
                actions={{
                  busy: concernAction.isPending && actingTank === row.tankId,
                  act: async (concernId, action, note) => {
                    setActingTank(row.tankId);
                    await concernAction.mutateAsync({ concernId, action, note });
                    refresh();
                  },
                }}
              />
            ))}
          </ol>
        </>
      )}
    </>
  );
}
