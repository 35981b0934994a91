import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { IMPORT_KINDS, type ImportCounts, type ImportHistoryItem, type ImportKind, type ImportOutcome, type ImportPlannedRow, type ImportRowError, type ImportRun } from '@/shared/contract/imports';
import type { Page } from '@/shared/contract/records';
import { api, ApiError } from '../api/client';
import { saveFile } from '../api/download';
import { appendFile, upload, type PickedFile } from '../api/upload';

export { IMPORT_KINDS };
export type { ImportCounts, ImportHistoryItem, ImportKind, ImportOutcome, ImportPlannedRow, ImportRowError, ImportRun };

export const importKeys = {
  all: ['imports'] as const,
  history: ['imports', 'history'] as const,
};

export function useImportHistoryQuery(options: { enabled?: boolean } = {}) {
  return useQuery({ queryKey: importKeys.history, queryFn: () => api<Page<ImportHistoryItem>>('/imports'), ...options });
}

export interface ImportRunInput {
  kind: ImportKind;
  file: PickedFile;
  dryRun: boolean;
  onProgress?: (fraction: number) => void;
}

/**
 * Sends the file for a dry run or a commit. Every run is recorded, so the history is refreshed either way;
 * a commit also refreshes the table it wrote to.
 */
export function useImportRunMutation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ kind, file, dryRun, onProgress }: ImportRunInput) => {
      const form = new FormData();
      form.append('kind', kind);
      form.append('dryRun', String(dryRun));
      appendFile(form, 'file', file);
      return upload<ImportRun>('/imports', form, { onProgress });
    },
    onSettled: (_data, _error, input) => {
      void qc.invalidateQueries({ queryKey: importKeys.all });
      if (!input.dryRun) void qc.invalidateQueries({ queryKey: [input.kind] });
    },
  });
}

/** A commit refused for rejected rows answers 422 with the whole run in its details. */
export function refusedRun(error: unknown): ImportRun | null {
  if (!(error instanceof ApiError) || error.status !== 422) return null;
  const details = error.details as ImportRun | null;
  return details && typeof details === 'object' && 'counts' in details ? details : null;
}

/** The empty spreadsheet of one kind, with its columns and an example row. */
export const downloadImportTemplate = (kind: ImportKind) => saveFile(`/imports/templates/${kind}`, `bungwise-${kind}-template.csv`);
