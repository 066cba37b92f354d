import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import type { CreateWaterTestInput, UpdateWaterTestInput } from '@shared/schemas/water-test.schema';
import type { Page, WaterTestDetailView, WaterTestSaved, WaterTestView } from '@shared/schemas/tank-views';
import { api } from '@client/lib/api-client';
import { useUploadPhotos } from '@client/lib/photos';
import type { SavedNotice } from '@client/lib/saved-notice';
import { useSaveWithPhotos } from '@client/lib/save-with-photos';
import { tankKeys, useTankRecordsChanged } from '@client/lib/tank-keys';
import { saveEntryMemory } from '../lib/entry-memory';
import { waterTestNotice } from '../lib/saved-notices';
import { draftToPatch, type WaterTestDraft } from '../lib/water-test-draft';

const base = (clubId: string, tankId: string) => `/clubs/${clubId}/tanks/${tankId}/water-tests`;
/** The largest page the server gives. */
const PAGE = 1000;

/** Every test since `from` (all of them when null), newest first, read page by page. */
export const testsSinceQuery = (clubId: string, tankId: string, from: string | null) =>
  queryOptions({
    queryKey: tankKeys.testsSince(clubId, tankId, from),
    queryFn: async ({ signal }) => {
      const items: WaterTestView[] = [];
      let before: string | null = null;
      do {
        const qs = new URLSearchParams({ limit: String(PAGE) });
        if (from) qs.set('from', from);
        if (before) qs.set('before', before);
        const page: Page<WaterTestView> = await api.get<Page<WaterTestView>>(
          `${base(clubId, tankId)}?${qs}`,
          signal,
        );
        items.push(...page.items);
        before = page.nextCursor;
      } while (before);
      return items;
    },
  });

export const waterTestQuery = (clubId: string, tankId: string, testId: string) =>
  queryOptions({
    queryKey: tankKeys.test(clubId, tankId, testId),
    queryFn: ({ signal }) => api.get<WaterTestDetailView>(`${base(clubId, tankId)}/${testId}`, signal),
  });

export const useTestsSince = (clubId: string, tankId: string, from: string | null) =>
  useQuery(testsSinceQuery(clubId, tankId, from));
export const useWaterTest = (clubId: string, tankId: string, testId: string) =>
  useQuery(waterTestQuery(clubId, tankId, testId));

/** The fetchers: what goes over the wire for a test. */
export const postWaterTest = (clubId: string, tankId: string, input: CreateWaterTestInput) =>
  api.post<WaterTestSaved>(base(clubId, tankId), input);
export const patchWaterTest = (clubId: string, tankId: string, testId: string, input: UpdateWaterTestInput) =>
  api.patch<WaterTestSaved>(`${base(clubId, tankId)}/${testId}`, input);
export const deleteWaterTest = (clubId: string, tankId: string, testId: string) =>
  api.delete(`${base(clubId, tankId)}/${testId}`);

/*
 * A saved or deleted test changes the charts, the table, the timeline, the tank's last known values, the list
 * cards, and the tank's care summary and concerns (the server re-judged the tank before answering).
 */

export function useCreateWaterTest(clubId: string, tankId: string) {
  const changed = useTankRecordsChanged(clubId);
  return useMutation({
    mutationFn: (input: CreateWaterTestInput) => postWaterTest(clubId, tankId, input),
    onSuccess: () => changed(tankId),
  });
}

export function useUpdateWaterTest(clubId: string, tankId: string, testId: string) {
  const changed = useTankRecordsChanged(clubId);
  return useMutation({
    mutationFn: (input: UpdateWaterTestInput) => patchWaterTest(clubId, tankId, testId, input),
    onSuccess: () => changed(tankId),
  });
}

export function useDeleteWaterTest(clubId: string, tankId: string) {
  const changed = useTankRecordsChanged(clubId);
  return useMutation({
    mutationFn: (testId: string) => deleteWaterTest(clubId, tankId, testId),
    // The deleted test itself is left alone: it would only answer 404 now.
    onSuccess: (_done, testId) => changed(tankId, tankKeys.test(clubId, tankId, testId)),
  });
}

/**
 * The water-test form's save, new (`editing` absent) or changed: the test is stored once however often the form is
 * sent (a double tap, or a retry after a failed upload, which sends only the photos again); a new test's units and
 * methods are remembered on the device for next time. Resolves to the notice the tank page shows.
 */
export function useSaveWaterTest({
  clubId,
  tankId,
  editing,
}: {
  clubId: string;
  tankId: string;
  editing?: WaterTestView;
}) {
  const create = useCreateWaterTest(clubId, tankId);
  const update = useUpdateWaterTest(clubId, tankId, editing?.id ?? '');
  const upload = useUploadPhotos(clubId);
  const save = useSaveWithPhotos(
    async ({ input, draft }: { input: CreateWaterTestInput; draft: WaterTestDraft }) => {
      if (editing) return update.mutateAsync(draftToPatch(input, editing));
      const saved = await create.mutateAsync(input);
      saveEntryMemory(tankId, draft);
      return saved;
    },
    (saved, files) =>
      upload.mutateAsync({ tankId, files, waterTestId: saved.waterTest.id, caption: 'Test colours' }),
  );
  return async (input: CreateWaterTestInput, photos: File[], draft: WaterTestDraft): Promise<SavedNotice> =>
    waterTestNotice(await save({ input, draft }, photos), Boolean(editing));
}
