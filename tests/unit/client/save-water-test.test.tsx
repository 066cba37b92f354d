import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { act, renderHook } from '@testing-library/react';
import type { ReactNode } from 'react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { WaterTestView } from '@shared/schemas/tank-views';
import { useSaveWaterTest } from '@client/features/readings/api/water-tests';
import { loadEntryMemory } from '@client/features/readings/lib/entry-memory';
import { draftToInput, draftToPatch, newDraft } from '@client/features/readings/lib/water-test-draft';
import type { UnitPrefs } from '@client/lib/display-units';
import { PhotoUploadError } from '@client/lib/save-with-photos';
import { careKeys, tankKeys } from '@client/lib/tank-keys';

const PREFS: UnitPrefs = { temperatureUnit: 'C', volumeUnit: 'L', salinityDisplay: 'sg' };
const CLUB = 'club-1';
const TANK = 'tank-1';
const TESTS = `/api/clubs/${CLUB}/tanks/${TANK}/water-tests`;
const PHOTOS = `/api/clubs/${CLUB}/tanks/${TANK}/photos`;

const json = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });
const saved = (values: Record<string, number>) => ({
  waterTest: { id: 'test-1', takenAt: new Date().toISOString(), values },
  warnings: [],
});

/** A stand-in server: answers the CSRF token, the test and the photo upload (failing the first `photoFailures` times). */
function server({ photoFailures = 0 } = {}) {
  let failuresLeft = photoFailures;
  const calls: { method: string; path: string; body: unknown }[] = [];
  const fetch = vi.fn(async (path: string, init?: RequestInit) => {
    const method = init?.method ?? 'GET';
    calls.push({ method, path, body: typeof init?.body === 'string' ? JSON.parse(init.body) : init?.body });
    if (path === '/api/csrf') return json(200, { token: 'token' });
    if (path.startsWith(TESTS)) return json(method === 'POST' ? 201 : 200, saved({ pH: 8.1 }));
    if (path === PHOTOS)
      return failuresLeft-- > 0
        ? json(503, { error: { code: 'unavailable', message: 'Try again.' } })
        : json(201, { photos: [] });
    return json(404, { error: { code: 'not_found', message: path } });
  });
  vi.stubGlobal('fetch', fetch);
  const to = (method: string, path: string) => calls.filter((c) => c.method === method && c.path === path);
  return { calls, to };
}

function setUp(editing?: WaterTestView) {
  const qc = new QueryClient({ defaultOptions: { queries: { retry: false, staleTime: Infinity } } });
  const wrapper = ({ children }: { children: ReactNode }) => (
    <QueryClientProvider client={qc}>{children}</QueryClientProvider>
  );
  const { result } = renderHook(() => useSaveWaterTest({ clubId: CLUB, tankId: TANK, editing }), { wrapper });
  const draft = newDraft(PREFS, {});
  draft.entries.pH.value = '8.1';
  return { qc, save: () => result.current, draft, input: draftToInput(draft, PREFS) };
}

const photo = () => new File(['x'], 'colours.jpg', { type: 'image/jpeg' });

describe('saving a water test (useSaveWaterTest)', () => {
  beforeEach(() => localStorage.clear());
  afterEach(() => vi.unstubAllGlobals());

  it('when the save button is tapped twice before the answer comes, then one test and one copy of its photo are stored', async () => {
    const net = server();
    const { save, draft, input } = setUp();
    const files = [photo()];
    await act(() => Promise.all([save()(input, files, draft), save()(input, files, draft)]));
    expect(net.to('POST', TESTS)).toHaveLength(1);
    expect(net.to('POST', TESTS)[0]!.body).toEqual(input);
    expect(net.to('POST', PHOTOS)).toHaveLength(1);
  });

  it('when the photo fails to upload, then the readings stay saved and trying again sends only the photo', async () => {
    const net = server({ photoFailures: 1 });
    const { save, draft, input } = setUp();
    await act(() => expect(save()(input, [photo()], draft)).rejects.toBeInstanceOf(PhotoUploadError));
    expect(net.to('POST', TESTS)).toHaveLength(1);
    const notice = await act(() => save()(input, [photo()], draft));
    expect(net.to('POST', TESTS)).toHaveLength(1);
    expect(net.to('POST', PHOTOS)).toHaveLength(2);
    expect(notice).toEqual({
      message: 'Test saved: 1 reading. It is on the charts.',
      toCharts: true,
      warnings: [],
    });
  });

  it('when a test is saved, then the tank, its lists and its care are refetched, and its units are remembered', async () => {
    server();
    const { qc, save, draft, input } = setUp();
    const keys = [
      tankKeys.detail(CLUB, TANK),
      tankKeys.testsSince(CLUB, TANK, null),
      tankKeys.list(CLUB, { mine: true, includeArchived: false }),
      careKeys.summary(TANK),
    ];
    for (const key of keys) qc.setQueryData(key, {});
    await act(() => save()(input, [], draft));
    expect(keys.map((key) => qc.getQueryState(key)?.isInvalidated)).toEqual([true, true, true, true]);
    expect(loadEntryMemory(TANK).parameters).toEqual(['pH']);
  });

  it('when a test is changed, then the PATCH carries the form and removes the entries taken off it', async () => {
    const net = server();
    const editing = {
      id: 'test-1',
      entries: { pH: { value: 8, unit: 'pH' }, nitrate: { value: 10, unit: 'mg/L NO3' } },
    } as unknown as WaterTestView;
    const { save, draft, input } = setUp(editing);
    await act(() => save()(input, [], draft));
    expect(net.to('POST', TESTS)).toHaveLength(0);
    const [patch] = net.to('PATCH', `${TESTS}/test-1`);
    expect(patch!.body).toEqual(draftToPatch(input, editing));
    expect(patch!.body).toMatchObject({ entries: { pH: { value: 8.1, unit: 'pH' }, nitrate: null } });
    expect(loadEntryMemory(TANK).parameters).toEqual([]);
  });
});
