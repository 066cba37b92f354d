import { QueryClient, QueryClientProvider, QueryObserver } from '@tanstack/react-query';
import { act, renderHook, waitFor } from '@testing-library/react';
import type { ReactNode } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { AttendanceListView, AttendanceRowView } from '@shared/schemas/meetup-views';
import { attendanceQuery, meetupKeys, useCheckIn } from '@client/features/meetups/api/meetups';

const CLUB = 'club-1';
const MEETUP = 'meetup-1';
const LIST = `/api/clubs/${CLUB}/meetups/${MEETUP}/attendance`;

const json = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });
const row = (userId: string, checkedIn = false): AttendanceRowView => ({
  userId,
  displayName: userId,
  status: 'going',
  waitlistPosition: null,
  checkedIn,
  checkedInAt: checkedIn ? '2027-04-01T18:05:00.000Z' : null,
  slotStartsAt: null,
  tank: null,
  waterTestId: null,
});
const list = (rows: AttendanceRowView[]): AttendanceListView => ({
  meetup: { id: MEETUP } as AttendanceListView['meetup'],
  rows,
});

/** A stand-in server holding who is ticked in; `refuse` answers 409 for those people, `gate` holds answers back (for `gated`, or everyone). */
function server(p: { refuse?: string[]; gate?: Promise<void>; gated?: string } = {}) {
  const here = new Set<string>();
  const puts: string[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (path: string, init?: RequestInit) => {
      if (path === '/api/csrf') return json(200, { token: 't' });
      if (path === LIST) return json(200, list(['ana', 'ben'].map((u) => row(u, here.has(u)))));
      const userId = path.split('/').pop()!;
      puts.push(userId);
      if (!p.gated || p.gated === userId) await p.gate;
      if (p.refuse?.includes(userId))
        return json(409, { error: { code: 'conflict', message: 'This meetup was cancelled.' } });
      const { present } = JSON.parse(String(init?.body)) as { present: boolean };
      if (present) here.add(userId);
      else here.delete(userId);
      return json(200, { row: row(userId, present) });
    }),
  );
  return { here, puts };
}

function setUp() {
  const qc = new QueryClient({ defaultOptions: { queries: { retry: false, staleTime: Infinity } } });
  qc.setQueryData(meetupKeys.attendance(CLUB, MEETUP), list([row('ana'), row('ben')]));
  // The list is being watched, as on the check-in screen, so the reconcile refetch really runs.
  const unwatch = new QueryObserver(qc, attendanceQuery(CLUB, MEETUP)).subscribe(() => undefined);
  const wrapper = ({ children }: { children: ReactNode }) => (
    <QueryClientProvider client={qc}>{children}</QueryClientProvider>
  );
  const { result } = renderHook(() => useCheckIn(CLUB, MEETUP), { wrapper });
  const rows = () =>
    qc
      .getQueryData<AttendanceListView>(meetupKeys.attendance(CLUB, MEETUP))!
      .rows.map((r) => [r.userId, r.checkedIn]);
  return { qc, tick: () => result.current, rows, unwatch };
}

describe('ticking people in at the door (useCheckIn)', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('when a name is tapped, then it shows ticked before the server answers, and keeps the server’s row after', async () => {
    let open!: () => void;
    const net = server({ gate: new Promise<void>((r) => (open = r)) });
    const { tick, rows, unwatch } = setUp();
    act(() => tick().mutate({ userId: 'ana', present: true }));
    await waitFor(() =>
      expect(rows()).toEqual([
        ['ana', true],
        ['ben', false],
      ]),
    );
    expect(net.here.has('ana')).toBe(false);
    open();
    await waitFor(() => expect(net.here.has('ana')).toBe(true));
    await waitFor(() => expect(tick().isIdle || tick().isSuccess).toBe(true));
    expect(rows()).toEqual([
      ['ana', true],
      ['ben', false],
    ]);
    unwatch();
  });

  it('when one of two ticks is refused, then only that row turns back; the other stays, and the list matches the server', async () => {
    let open!: () => void;
    const net = server({ refuse: ['ben'], gate: new Promise<void>((r) => (open = r)), gated: 'ana' });
    const { tick, rows, unwatch } = setUp();
    await act(async () => {
      const a = tick().mutateAsync({ userId: 'ana', present: true });
      const b = tick()
        .mutateAsync({ userId: 'ben', present: true })
        .catch((e: Error) => e.message);
      expect(await b).toBe('This meetup was cancelled.');
      // Ana's answer is still on its way: Ben's row alone went back, before any refetch.
      expect(rows()).toEqual([
        ['ana', true],
        ['ben', false],
      ]);
      open();
      await a;
    });
    await waitFor(() =>
      expect(rows()).toEqual([
        ['ana', true],
        ['ben', false],
      ]),
    );
    // A refusal is final: it is not sent again.
    expect(net.puts.filter((u) => u === 'ben')).toHaveLength(1);
    expect([...net.here]).toEqual(['ana']);
    unwatch();
  });

  it('when the server had someone else ticked in from another phone, then the list reconciles to it after the last tick', async () => {
    const net = server();
    net.here.add('ben');
    const { tick, rows, unwatch } = setUp();
    await act(() => tick().mutateAsync({ userId: 'ana', present: true }));
    await waitFor(() =>
      expect(rows()).toEqual([
        ['ana', true],
        ['ben', true],
      ]),
    );
    unwatch();
  });
});
