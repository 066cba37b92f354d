import type { CsvImportInput } from '@shared/schemas/csv-import.schema';
import type { ImportCommitResult, ImportPreview } from '@shared/schemas/tank-views';
import { useTankRecordsChanged } from '@client/lib/tank-keys';
import { postJsonWithProgress, type UploadProgress } from '@client/lib/upload';

const base = (clubId: string, tankId: string) => `/clubs/${clubId}/tanks/${tankId}/imports`;

/** What the server would save from the file, row by row, without saving anything. */
export const previewImport = (
  clubId: string,
  tankId: string,
  input: CsvImportInput,
  onProgress?: UploadProgress,
  signal?: AbortSignal,
) => postJsonWithProgress<ImportPreview>(`${base(clubId, tankId)}/preview`, input, onProgress, signal);

/** Saves the valid rows of (part of) a file in one transaction. */
export const commitImport = (
  clubId: string,
  tankId: string,
  input: CsvImportInput,
  onProgress?: UploadProgress,
  signal?: AbortSignal,
) => postJsonWithProgress<ImportCommitResult>(`${base(clubId, tankId)}/commit`, input, onProgress, signal);

/** Saves the rows, then refreshes every view of the tank: its charts, cards and care now include the imported tests. */
export function useCommitImport(clubId: string, tankId: string) {
  const changed = useTankRecordsChanged(clubId);
  return async (input: CsvImportInput, onProgress?: UploadProgress): Promise<ImportCommitResult> => {
    const result = await commitImport(clubId, tankId, input, onProgress);
    void changed(tankId);
    return result;
  };
}
