import type { CsvImportInput } from '../../../../shared/schemas/csv-import.schema';
import type { ImportCommitResult, ImportPreview } from '../../../../shared/schemas/tank-views';
import { postJsonWithProgress, type UploadProgress } from '../../../lib/upload';

const base = (clubId: string, tankId: string) => `/clubs/${clubId}/tanks/${tankId}/imports`;

/** What the server would save from the file, row by row, without saving anything. */
export const previewImport = (clubId: string, tankId: string, input: CsvImportInput, onProgress?: UploadProgress, signal?: AbortSignal) =>
  postJsonWithProgress<ImportPreview>(`${base(clubId, tankId)}/preview`, input, onProgress, signal);

/** Saves the valid rows of (part of) a file in one transaction. */
export const commitImport = (clubId: string, tankId: string, input: CsvImportInput, onProgress?: UploadProgress, signal?: AbortSignal) =>
  postJsonWithProgress<ImportCommitResult>(`${base(clubId, tankId)}/commit`, input, onProgress, signal);
